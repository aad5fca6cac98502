using System.Globalization;

namespace OutputForge.Stats.Tests;

/// <summary>
/// Reads a NIST StRD analysis-of-variance file (https://www.itl.nist.gov/div898/strd/, e.g. SiRstv.dat)
/// from ../shared/reference/nist-strd beside the repository root: the certified values from the
/// "Between"/"Within"/"R-Squared"/"Standard Deviation" lines and the data from the line range named
/// in the file's own header ("Data (lines 61 to 85)").
/// </summary>
internal sealed class NistStrdAnovaFile
{
    public static string Folder => System.IO.Path.GetFullPath(System.IO.Path.Combine(RepositoryRoot.Path, "..", "shared", "reference", "nist-strd"));

    public required int BetweenDf { get; init; }
    public required double BetweenSs { get; init; }
    public required double BetweenMs { get; init; }
    public required double F { get; init; }
    public required int WithinDf { get; init; }
    public required double WithinSs { get; init; }
    public required double WithinMs { get; init; }
    public required double RSquared { get; init; }
    public required double ResidualSd { get; init; }
    public required List<List<double>> Groups { get; init; }

    public static NistStrdAnovaFile Read(string name)
    {
        var lines = File.ReadAllLines(System.IO.Path.Combine(Folder, name));
        string[] between = Fields(lines.First(l => l.TrimStart().StartsWith("Between", StringComparison.Ordinal)));
        string[] within = Fields(lines.First(l => l.TrimStart().StartsWith("Within", StringComparison.Ordinal)));
        double rSquared = Number(Fields(lines.First(l => l.Contains("Certified R-Squared", StringComparison.Ordinal)))[^1]);
        double sd = Number(Fields(lines.First(l => l.Contains("Standard Deviation", StringComparison.Ordinal)))[^1]);
        var range = Fields(lines.First(l => l.Trim().StartsWith("Data ", StringComparison.Ordinal) && l.Contains("lines", StringComparison.Ordinal)));
        int first = int.Parse(range[^3].TrimStart('('), CultureInfo.InvariantCulture);
        int last = int.Parse(range[^1].TrimEnd(')'), CultureInfo.InvariantCulture);
        var groups = new SortedDictionary<int, List<double>>();
        for (int i = first - 1; i < last; i++)
        {
            var f = Fields(lines[i]);
            int group = int.Parse(f[0], CultureInfo.InvariantCulture);
            if (!groups.TryGetValue(group, out var values))
            {
                groups[group] = values = new List<double>();
            }
            values.Add(Number(f[1]));
        }
        return new NistStrdAnovaFile
        {
            BetweenDf = int.Parse(between[^4], CultureInfo.InvariantCulture),
            BetweenSs = Number(between[^3]),
            BetweenMs = Number(between[^2]),
            F = Number(between[^1]),
            WithinDf = int.Parse(within[^3], CultureInfo.InvariantCulture),
            WithinSs = Number(within[^2]),
            WithinMs = Number(within[^1]),
            RSquared = rSquared,
            ResidualSd = sd,
            Groups = groups.Values.ToList(),
        };
    }

    private static string[] Fields(string line) => line.Split(' ', StringSplitOptions.RemoveEmptyEntries);

    private static double Number(string text) => double.Parse(text, NumberStyles.Float, CultureInfo.InvariantCulture);
}

/// <summary>A theory that is skipped, with the reason, when the NIST StRD files are not beside the repository.</summary>
public sealed class NistStrdTheoryAttribute : TheoryAttribute
{
    public NistStrdTheoryAttribute()
    {
        if (!Directory.Exists(NistStrdAnovaFile.Folder))
        {
            Skip = "NIST StRD files not found in ../shared/reference/nist-strd beside the repository root.";
        }
    }
}
