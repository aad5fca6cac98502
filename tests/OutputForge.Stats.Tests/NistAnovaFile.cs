using System.Globalization;
using System.Text.RegularExpressions;

namespace OutputForge.Stats.Tests;

/// <summary>
/// One NIST StRD analysis-of-variance file (../shared/reference/nist-strd, public domain, NIST ITL):
/// its certified values and its data, read from the line ranges its header names.
/// </summary>
internal sealed record NistAnovaFile(
    int DfBetween, double SsBetween, double MsBetween, double F,
    int DfWithin, double SsWithin, double MsWithin,
    double RSquared, double ResidualSd, IReadOnlyList<IReadOnlyList<double>> Groups)
{
    public static string? Folder()
    {
        var path = System.IO.Path.GetFullPath(System.IO.Path.Combine(RepositoryRoot.Path, "..", "shared", "reference", "nist-strd"));
        return Directory.Exists(path) ? path : null;
    }

    public static NistAnovaFile Read(string path)
    {
        var lines = File.ReadAllLines(path);
        var text = string.Join("\n", lines);
        var certified = Range(text, @"Certified Values\s+\(lines (\d+) to (\d+)\)");
        var data = Range(text, @"Data\s+\(lines (\d+) to (\d+)\)");
        // Some files end the range one line early (AtmWtAg), so read up to the data.
        var block = lines[(certified.From - 1)..(data.From - 1)];
        var between = Numbers(block.First(l => l.TrimStart().StartsWith("Between", StringComparison.Ordinal)));
        var within = Numbers(block.First(l => l.TrimStart().StartsWith("Within", StringComparison.Ordinal)));
        var rSquared = Numbers(block.First(l => l.Contains("R-Squared", StringComparison.Ordinal)))[^1];
        var sd = Numbers(block.First(l => l.Contains("Standard Deviation", StringComparison.Ordinal)))[^1];
        var groups = new SortedDictionary<int, List<double>>();
        foreach (var line in lines[(data.From - 1)..data.To])
        {
            var parts = line.Split(' ', StringSplitOptions.RemoveEmptyEntries);
            var group = int.Parse(parts[0], CultureInfo.InvariantCulture);
            if (!groups.TryGetValue(group, out var values))
            {
                groups[group] = values = [];
            }
            values.Add(double.Parse(parts[1], CultureInfo.InvariantCulture));
        }
        return new NistAnovaFile((int)between[0], between[1], between[2], between[3], (int)within[0], within[1], within[2],
            rSquared, sd, groups.Values.Select(g => (IReadOnlyList<double>)g).ToList());
    }

    private static (int From, int To) Range(string text, string pattern)
    {
        var match = Regex.Match(text, pattern);
        return (int.Parse(match.Groups[1].Value, CultureInfo.InvariantCulture), int.Parse(match.Groups[2].Value, CultureInfo.InvariantCulture));
    }

    private static double[] Numbers(string line) =>
        line.Split(' ', StringSplitOptions.RemoveEmptyEntries)
            .Where(p => double.TryParse(p, NumberStyles.Float, CultureInfo.InvariantCulture, out _))
            .Select(p => double.Parse(p, CultureInfo.InvariantCulture))
            .ToArray();
}
