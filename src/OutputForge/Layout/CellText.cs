using System.Globalization;
using System.Text.RegularExpressions;
using OutputForge.Results;

namespace OutputForge.Layout;

/// <summary>Formats single statistics and composes a cell's text from its pattern.</summary>
public static partial class CellText
{
    /// <summary>Text shown for a number that could not be estimated; the reason goes to the footnotes.</summary>
    public const string NotEstimable = "NE";

    [GeneratedRegex(@"\{([A-Za-z0-9]+)\}")]
    private static partial Regex Placeholder();

    public static string Format(StatisticValue value, TableResult table)
    {
        if (value.Value is not { } number)
        {
            return NotEstimable;
        }
        return value.Format switch
        {
            ValueFormat.Count => NumberText.Count(number),
            ValueFormat.Percent => (table.PercentStyle ?? PercentStyle.Default).EdgeMarks
                ? NumberText.PercentWithEdges(number, value.Decimals)
                : NumberText.Fixed(number, value.Decimals),
            ValueFormat.PValue => NumberText.PValue(number, table.PValueFloor),
            _ => NumberText.Fixed(number, value.Decimals),
        };
    }

    private static bool IsCountPercent(string pattern) =>
        pattern.StartsWith("{n} ({percent}", StringComparison.Ordinal);

    /// <summary>
    /// A placeholder showing the value's display precision, from its format alone (so every table
    /// kind gets it): "x" for a count, "xx.x" for a percentage with one decimal, "x.xx" for a
    /// two-decimal estimate, "0.xxx" for a p-value with the table's p-value decimals.
    /// </summary>
    public static string PlaceholderText(StatisticValue value, TableResult table) => value.Format switch
    {
        ValueFormat.Count => "x",
        ValueFormat.Percent => "xx" + Decimals(value.Decimals),
        ValueFormat.PValue => "0" + Decimals(NumberText.PValueDecimals(table.PValueFloor)),
        _ => "x" + Decimals(value.Decimals),
    };

    private static string Decimals(int decimals) => decimals <= 0 ? string.Empty : "." + new string('x', decimals);

    /// <summary>The cell's pattern with every statistic replaced by its <see cref="PlaceholderText"/>, e.g. "x (xx.x)" or "(x.x, x.x)".</summary>
    public static LayoutCell ComposePlaceholder(ResultCell cell, TableResult table)
    {
        if (cell.Pattern.Length == 0)
        {
            return LayoutCell.Empty;
        }
        var byName = cell.Values.ToDictionary(v => v.Statistic, StringComparer.Ordinal);
        return new LayoutCell(Placeholder().Replace(cell.Pattern, m =>
            byName.TryGetValue(m.Groups[1].Value, out var value) ? PlaceholderText(value, table) : "x"));
    }

    public static LayoutCell Compose(ResultCell cell, TableResult table)
    {
        if (cell.Pattern.Length == 0)
        {
            return LayoutCell.Empty;
        }
        var byName = cell.Values.ToDictionary(v => v.Statistic, StringComparer.Ordinal);
        var names = Placeholder().Matches(cell.Pattern).Select(m => m.Groups[1].Value).ToList();
        if (names.Any(n => !byName.TryGetValue(n, out var v) || v.Value is null))
        {
            return new LayoutCell(NotEstimable);
        }
        // A zero count shows as "0", not "0 (0.0)" (common practice), unless the table asks for the percentage;
        // this holds for every "n (%)" pattern, with or without a percent sign or an event count.
        if (IsCountPercent(cell.Pattern) && byName["n"].Value == 0 && (table.PercentStyle ?? PercentStyle.Default).ZeroAsCountOnly)
        {
            return new LayoutCell("0", 0, "0");
        }
        var text = Placeholder().Replace(cell.Pattern, m => Format(byName[m.Groups[1].Value], table));
        if (names.Count != 1 || cell.Pattern != "{" + names[0] + "}")
        {
            return new LayoutCell(text);
        }
        var single = byName[names[0]];
        if (text.StartsWith('<') || text.StartsWith('>'))
        {
            return new LayoutCell(text);
        }
        var decimals = single.Format switch
        {
            ValueFormat.Count => 0,
            ValueFormat.PValue => text.Length - text.IndexOf('.') - 1,
            _ => single.Decimals,
        };
        var number = (double)decimal.Parse(text, NumberStyles.Float, CultureInfo.InvariantCulture);
        return new LayoutCell(text, number, decimals == 0 ? "0" : "0." + new string('0', decimals));
    }
}
