using System.Globalization;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.Workflow;

/// <summary>
/// A QC file for table 14.2.1.1 programmed independently of OutputForge, from the demo CSV files
/// with the tests' own reader and formulas (Wilson 1927 as in Newcombe 1998 method 3; Newcombe
/// 1998 method 10; Pearson chi-square as z squared), written as a QC statistician would: keys for
/// some rows, displayed labels for others, values at full precision.
/// </summary>
public static class IndependentQcFile
{
    private static readonly (string Value, string Key)[] Arms = [("Placebo", "placebo"), ("QF-217 10 mg", "qf-217-10-mg"), ("QF-217 30 mg", "qf-217-30-mg")];

    public static List<string> Lines(string dataFolder)
    {
        var adsl = SimpleCsv.Read(Path.Combine(dataFolder, "adsl.csv"));
        var itt = adsl.Where(s => s["ITTFL"] == "Y").ToDictionary(s => s["USUBJID"], s => s["TRT01P"]);
        var response = SimpleCsv.Read(Path.Combine(dataFolder, "adeff.csv"))
            .Where(r => r["PARAMCD"] == "ITCHR50" && r["AVISIT"] == "Week 12" && r["ANL01FL"] == "Y")
            .ToDictionary(r => r["USUBJID"], r => r["AVALC"] == "Y");
        var counts = Arms.ToDictionary(a => a.Key, a =>
        {
            var subjects = itt.Where(s => s.Value == a.Value).Select(s => s.Key).ToList();
            return (N: subjects.Count, R: subjects.Count(s => response.TryGetValue(s, out var y) && y));
        });
        var lines = new List<string> { "table,row,column,statistic,value" };
        void Add(string row, string column, string statistic, double value) =>
            lines.Add($"14.2.1.1,\"{row}\",{column},{statistic},{value.ToString("R", CultureInfo.InvariantCulture)}");
        var (controlN, controlR) = counts["placebo"];
        foreach (var (value, key) in Arms)
        {
            var (n, r) = counts[key];
            Add("header", key, "N", n);
            Add("Responders, n (%)", value, "n", r);
            Add("responders", key, "percent", 100.0 * r / n);
            var (lower, upper) = IndependentFormulas.Wilson(r, n);
            Add("95% CI [a]", key, "lower", 100 * lower);
            Add("responders-ci", key, "upper", 100 * upper);
            Add("nonresponders", key, "n", n - r);
            if (key == "placebo")
            {
                continue;
            }
            Add("difference", key, "estimate", 100.0 * ((double)r / n - (double)controlR / controlN));
            var (dl, du) = IndependentFormulas.Newcombe(r, n, controlR, controlN);
            Add("difference-ci", key, "lower", 100 * dl);
            Add("difference-ci", key, "upper", 100 * du);
            Add("p-value", key, "pValue", IndependentFormulas.PearsonPValue(r, n, controlR, controlN));
        }
        return lines;
    }
}
