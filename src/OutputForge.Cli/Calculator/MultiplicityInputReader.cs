using System.Globalization;
using System.Text;
using OutputForge.Files;

namespace OutputForge.Cli.Calculator;

/// <summary>
/// Reads the hypotheses of `calc multiplicity` from the command line (--p "0.01,0.04", --weights "0.5,0.5",
/// --transitions "0,1;1,0": rows separated by ';') or from a small CSV file with a header line: a column
/// "hypothesis" (the names), "p", optionally "weight", and for the graphical approach one column per hypothesis,
/// headed by its name, holding the share of the row's level passed to that hypothesis.
/// </summary>
public static class MultiplicityInputReader
{
    /// <summary>A p-value file is a few lines; anything larger is not one (common practice).</summary>
    private const long FileLimit = 1 << 20;

    public static MultiplicityHypotheses FromOptions(string p, string? weights, string? transitions)
    {
        var pValues = Numbers(p, "--p");
        var names = Enumerable.Range(1, pValues.Count).Select(i => string.Create(CultureInfo.InvariantCulture, $"H{i}")).ToList();
        return new MultiplicityHypotheses(names, pValues, weights is null ? null : Numbers(weights, "--weights"),
            transitions?.Split(';').Select((row, r) => Numbers(row, string.Create(CultureInfo.InvariantCulture, $"--transitions row {r + 1}"))).ToList());
    }

    public static MultiplicityHypotheses FromFile(string path)
    {
        var name = Path.GetFileName(path);
        if (!File.Exists(path))
        {
            throw new CalcFileException($"{path}: no such file");
        }
        string text;
        try
        {
            var bytes = RegularFile.ReadAllBytes(path, FileLimit, "allowed for a p-value file", reason => new CalcFileException($"{name}: {reason}"));
            text = new UTF8Encoding(false, true).GetString(bytes);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or DecoderFallbackException)
        {
            throw new CalcFileException(e is DecoderFallbackException ? $"{name}: the file is not UTF-8 text" : $"{name}: cannot be read ({e.Message})");
        }
        var lines = text.TrimStart('\uFEFF').ReplaceLineEndings("\n").Split('\n')
            .Select((text, i) => (Text: text.Trim(), Line: i + 1)).Where(l => l.Text.Length > 0).ToList();
        if (lines.Count < 2)
        {
            throw new CalcFileException($"{name}: expected a header line (hypothesis,p[,weight][,one column per hypothesis]) and one line per hypothesis");
        }
        var header = lines[0].Text.Split(',').Select(h => h.Trim()).ToList();
        int Column(string title) => header.FindIndex(h => string.Equals(h, title, StringComparison.OrdinalIgnoreCase));
        var (nameColumn, pColumn, weightColumn) = (Column("hypothesis"), Column("p"), Column("weight"));
        if (nameColumn < 0 || pColumn < 0)
        {
            throw new CalcFileException($"{name} line {lines[0].Line}: the header must name the columns 'hypothesis' and 'p'");
        }
        var rows = lines.Skip(1).Select(l => (Cells: l.Text.Split(',').Select(c => c.Trim()).ToArray(), l.Line)).ToList();
        foreach (var (cells, line) in rows.Where(r => r.Cells.Length != header.Count))
        {
            throw new CalcFileException($"{name} line {line}: {cells.Length} values but the header has {header.Count} columns");
        }
        var names = rows.Select(r => r.Cells[nameColumn]).ToList();
        foreach (var duplicate in names.GroupBy(n => n, StringComparer.Ordinal).Where(g => g.Count() > 1 || g.Key.Length == 0))
        {
            throw new CalcFileException($"{name}: hypothesis name '{duplicate.Key}' is {(duplicate.Key.Length == 0 ? "empty" : "given twice")}; each hypothesis needs its own name");
        }
        double Cell((string[] Cells, int Line) row, int column) =>
            double.TryParse(row.Cells[column], NumberStyles.Float, CultureInfo.InvariantCulture, out var value) && double.IsFinite(value)
                ? value
                : throw new CalcFileException($"{name} line {row.Line}: '{row.Cells[column]}' in column '{header[column]}' is not a number");
        var targetColumns = names.Select(n => header.FindIndex(h => h == n)).ToList();
        var anyTarget = targetColumns.Any(c => c >= 0);
        if (anyTarget && targetColumns.FirstOrDefault(c => c < 0, 0) < 0)
        {
            var missing = names[targetColumns.IndexOf(-1)];
            throw new CalcFileException($"{name} line {lines[0].Line}: the transition matrix has no column for hypothesis '{missing}'; give one column per hypothesis, headed by its name");
        }
        return new MultiplicityHypotheses(names, rows.Select(r => Cell(r, pColumn)).ToList(),
            weightColumn < 0 ? null : rows.Select(r => Cell(r, weightColumn)).ToList(),
            anyTarget ? rows.Select(r => (IReadOnlyList<double>)targetColumns.Select(c => Cell(r, c)).ToList()).ToList() : null);
    }

    private static List<double> Numbers(string text, string option) =>
        text.Split(',', StringSplitOptions.TrimEntries).Select(v =>
            double.TryParse(v, NumberStyles.Float, CultureInfo.InvariantCulture, out var d) && double.IsFinite(d)
                ? d
                : throw new CalcInputException($"{option}: '{v}' is not a number (values are separated by ',')")).ToList();
}
