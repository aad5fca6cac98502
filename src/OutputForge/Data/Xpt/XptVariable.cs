using System.Buffers.Binary;
using System.Text;

namespace OutputForge.Data.Xpt;

/// <summary>
/// One variable of an XPT version 5 member, from its namestr record (140 bytes, big-endian): type (1 numeric,
/// 2 character), length in the observation, number, name (8), label (40), display format name (8) with width and
/// decimals, and position in the observation. Layout from the published description of the transport format.
/// </summary>
public sealed record XptVariable(string Name, bool IsNumeric, int Length, int Number, string Label, string Format, int FormatWidth, int FormatDecimals, int Position)
{
    public const int RecordLength = 140;

    /// <summary>The display format as usually written (e.g. DATE9., 8.2), or empty when the variable has none.</summary>
    public string DisplayFormat => Format.Length == 0 && FormatWidth == 0 ? string.Empty
        : Format + (FormatWidth > 0 ? FormatWidth.ToString(System.Globalization.CultureInfo.InvariantCulture) : "") + "."
          + (FormatDecimals > 0 ? FormatDecimals.ToString(System.Globalization.CultureInfo.InvariantCulture) : "");

    public TemporalKind Temporal => IsNumeric ? TemporalFormats.Of(Format) : TemporalKind.None;

    /// <summary>Reads a namestr; null with <paramref name="problem"/> when its fields cannot be a variable.</summary>
    public static XptVariable? Parse(ReadOnlySpan<byte> record, out string? problem)
    {
        var type = BinaryPrimitives.ReadInt16BigEndian(record);
        var length = BinaryPrimitives.ReadInt16BigEndian(record[4..]);
        var number = BinaryPrimitives.ReadInt16BigEndian(record[6..]);
        var name = Text(record.Slice(8, 8));
        var label = Text(record.Slice(16, 40));
        var format = Text(record.Slice(56, 8));
        var width = BinaryPrimitives.ReadInt16BigEndian(record[64..]);
        var decimals = BinaryPrimitives.ReadInt16BigEndian(record[66..]);
        var position = BinaryPrimitives.ReadInt32BigEndian(record[84..]);
        problem = null;
        if (type is not (1 or 2))
        {
            problem = $"variable type {type} (expected 1, numeric, or 2, character)";
        }
        else if (name.Length == 0)
        {
            problem = "a variable without a name";
        }
        else if (type == 1 && length is < 2 or > 8)
        {
            problem = $"numeric variable {name} of length {length} (expected 2 to 8 bytes)";
        }
        else if (length < 1)
        {
            problem = $"character variable {name} of length {length}";
        }
        else if (position < 0)
        {
            problem = $"variable {name} at position {position}";
        }
        return problem is null ? new XptVariable(name, type == 1, length, number, label, format, width, decimals, position) : null;
    }

    /// <summary>Blank-padded ASCII text of a header field, without the padding.</summary>
    internal static string Text(ReadOnlySpan<byte> field) => Encoding.Latin1.GetString(field).TrimEnd(' ', '\0');
}
