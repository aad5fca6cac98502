namespace OutputForge.Tests.Validation;

/// <summary>
/// The check values of ../shared/reference/cdiscpilot01-demographics.md, read from its Markdown
/// tables: published Table 14-1.01 (populations) and Table 14-2.01 (demographics) of the CDISC
/// pilot study report, with the race rows recomputed from the updated ADSL (see the file's note).
/// </summary>
public static class PublishedValues
{
    /// <summary>One check value: the reference's variable (or flag), statistic or level, column, and text as displayed.</summary>
    public sealed record Value(string Section, string Variable, string Stat, string Column, string Text);

    public static readonly string[] Columns = ["placebo", "xanomeline-low-dose", "xanomeline-high-dose", "total", "p-value"];

    public static List<Value> Read(string file)
    {
        var values = new List<Value>();
        string section = string.Empty;
        foreach (var raw in File.ReadLines(file))
        {
            var line = raw.Trim();
            if (line.StartsWith("## ", StringComparison.Ordinal))
            {
                section = line[3..];
                continue;
            }
            if (!line.StartsWith('|') || line.StartsWith("| ---", StringComparison.Ordinal) || line.StartsWith("| flag", StringComparison.Ordinal)
                || line.StartsWith("| variable", StringComparison.Ordinal))
            {
                continue;
            }
            var cells = line.Trim('|').Split('|').Select(c => c.Trim()).ToList();
            var populations = section.StartsWith("Table 14-1.01", StringComparison.Ordinal);
            var (variable, stat, numbers) = populations ? (cells[0], string.Empty, cells[1..]) : (cells[0], cells[1], cells[2..]);
            for (var i = 0; i < numbers.Count; i++)
            {
                if (numbers[i].Length > 0)
                {
                    values.Add(new Value(populations ? "populations" : "demographics", variable, stat, Columns[i], numbers[i]));
                }
            }
        }
        return values;
    }
}
