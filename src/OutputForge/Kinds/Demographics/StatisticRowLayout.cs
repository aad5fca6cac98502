using System.Text.RegularExpressions;
using OutputForge.Results;
using OutputForge.Spec;

namespace OutputForge.Kinds.Demographics;

/// <summary>
/// One row of a continuous block as the spec writes it: statistic names with any separators
/// between them ("mean (sd)", "q1, q3", "min - max"). The cell pattern and the default label
/// follow from it: "{mean} ({sd})" and "Mean (SD)".
/// </summary>
public sealed partial record StatisticRowLayout(string Text, string Pattern, string Label, IReadOnlyList<string> Statistics)
{
    public static readonly IReadOnlyList<string> DefaultRows = ["n", "mean (sd)", "median", "q1, q3", "min, max"];

    private static readonly Dictionary<string, (string Name, string Label)> Known = new(StringComparer.OrdinalIgnoreCase)
    {
        ["n"] = (StatisticNames.SubjectCount, "n"),
        ["mean"] = (StatisticNames.Mean, "Mean"),
        ["sd"] = (StatisticNames.StandardDeviation, "SD"),
        ["median"] = (StatisticNames.Median, "Median"),
        ["q1"] = (StatisticNames.FirstQuartile, "Q1"),
        ["q3"] = (StatisticNames.ThirdQuartile, "Q3"),
        ["min"] = (StatisticNames.Minimum, "Min"),
        ["max"] = (StatisticNames.Maximum, "Max"),
        ["geometric-mean"] = (StatisticNames.GeometricMean, "Geometric mean"),
        ["cv"] = (StatisticNames.CoefficientOfVariation, "CV%"),
    };

    /// <summary>"geomean" is one statistics program's function name; the row statistic is called "geometric-mean".</summary>
    private static readonly IReadOnlyList<RetiredName> Retired = [new("geomean", "geometric-mean")];

    // A statistic's name is a word; "geometric-mean" is the one hyphenated name, matched whole before the separators.
    [GeneratedRegex(@"(?i:geometric-mean)|[A-Za-z][A-Za-z0-9]*")]
    private static partial Regex Word();

    public static StatisticRowLayout Parse(string text, SpecSource source, string pointer)
    {
        var statistics = new List<string>();
        foreach (Match word in Word().Matches(text))
        {
            if (!Known.TryGetValue(word.Value, out var known))
            {
                var retired = Retired.FirstOrDefault(r => string.Equals(r.Old, word.Value, StringComparison.OrdinalIgnoreCase));
                throw new SpecException(source.Problem(pointer, retired is not null
                    ? $"the statistic '{word.Value}' in row \"{text}\" is now called '{retired.New}'"
                    : $"unknown statistic '{word.Value}' in row \"{text}\" (known: {string.Join(", ", Known.Keys)})"));
            }
            if (statistics.Contains(known.Name))
            {
                throw new SpecException(source.Problem(pointer, $"row \"{text}\" names {word.Value} twice"));
            }
            statistics.Add(known.Name);
        }
        if (statistics.Count == 0)
        {
            throw new SpecException(source.Problem(pointer, $"row \"{text}\" names no statistic (known: {string.Join(", ", Known.Keys)})"));
        }
        var pattern = Word().Replace(text, m => "{" + Known[m.Value].Name + "}");
        var label = Word().Replace(text, m => Known[m.Value].Label);
        return new StatisticRowLayout(text, pattern, label, statistics);
    }
}
