using System.Text;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.BadInput;

/// <summary>
/// One malformed input: how it spoils the mini study (spec text replacements, or new file
/// contents), and the fragments the one-line error must contain (file, location, what was expected).
/// </summary>
public sealed record BadInputCase(string Name, string[] Expect)
{
    public (string From, string To)[] Study { get; init; } = [];
    public (string From, string To)[] Table { get; init; } = [];
    public string? TableText { get; init; }
    public string? StudyText { get; init; }
    public byte[]? Adsl { get; init; }
    public byte[]? Adeff { get; init; }
    public string[] ExtraArguments { get; init; } = [];

    /// <summary>Changes to the study's files that text edits cannot make (links, named pipes, new files).</summary>
    public Action<MiniStudy>? Prepare { get; init; }

    /// <summary>The output folder of the failing run, when it is not the study's usual one.</summary>
    public Func<MiniStudy, string>? Out { get; init; }

    public override string ToString() => Name;

    public static byte[] Utf8(string text) => Encoding.UTF8.GetBytes(text);

    /// <summary>Writes the spoiled files over a working mini study.</summary>
    public void Apply(MiniStudy study)
    {
        if (StudyText is not null || Study.Length > 0)
        {
            File.WriteAllText(study.StudyFile, Replace(StudyText ?? MiniStudy.StudyJson, Study, "study.json"));
        }
        if (TableText is not null || Table.Length > 0)
        {
            File.WriteAllText(Path.Combine(study.Folder, "t1.json"), Replace(TableText ?? MiniStudy.TableJson, Table, "t1.json"));
        }
        if (Adsl is not null)
        {
            File.WriteAllBytes(Path.Combine(study.DataFolder, "adsl.csv"), Adsl);
        }
        if (Adeff is not null)
        {
            File.WriteAllBytes(Path.Combine(study.DataFolder, "adeff.csv"), Adeff);
        }
        Prepare?.Invoke(study);
    }

    private string Replace(string text, (string From, string To)[] edits, string file)
    {
        foreach (var (from, to) in edits)
        {
            if (!text.Contains(from, StringComparison.Ordinal))
            {
                throw new InvalidOperationException($"case '{Name}': '{from}' is not in {file}");
            }
            text = text.Replace(from, to, StringComparison.Ordinal);
        }
        return text;
    }
}
