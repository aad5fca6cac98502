using System.Globalization;
using OutputForge.Analysis;
using OutputForge.Spec;

namespace OutputForge.Kinds.CategoricalByVisit;

/// <summary>
/// The footnotes of a categorical-by-visit table: the record selection (with the DTYPE rule and the
/// imputed responses counted), the test (statistic, degrees of freedom, scores, strata, comparison) and
/// the issues of single tests (strata left out, subjects without a stratum, a singular covariance matrix).
/// </summary>
internal static class VisitTableNotes
{
    /// <summary>Strata left out, subjects without a stratum and a singular covariance matrix, for the footnotes and the log.</summary>
    public static void ReportIssues(string visit, VisitComparison comparison, CategoricalByVisitSettings settings, List<string> issues)
    {
        var where = comparison.Where(visit);
        if (comparison.StrataLeftOut.Count > 0)
        {
            issues.Add($"{where}: left out of the test for having fewer than 2 subjects with a response: " +
                string.Join("; ", comparison.StrataLeftOut.Select(s => $"{s.Stratum.Text} ({s.Subjects} subject)")) + ".");
        }
        if (comparison.WithoutStratum > 0)
        {
            issues.Add($"{where}: {comparison.WithoutStratum} subject{(comparison.WithoutStratum == 1 ? " has" : "s have")} no value of {string.Join(", ", settings.Strata)} and {(comparison.WithoutStratum == 1 ? "is" : "are")} left out of the test.");
        }
        issues.AddRange(comparison.Test.Notes.Select(note => $"{where}: {note.TrimEnd('.')}; the covariance matrix of the statistic is singular."));
    }

    public static string Records(EndpointSpec endpoint, CategoricalByVisitSettings settings, List<string> imputedByVisit)
    {
        var selection = new List<string>();
        if (endpoint.Parameter is not null)
        {
            selection.Add($"PARAMCD = '{endpoint.Parameter}'");
        }
        if (endpoint.Where is not null)
        {
            selection.Add(endpoint.Where);
        }
        var records = selection.Count > 0 ? $"Records with {string.Join(" and ", selection)}; " : string.Empty;
        return settings.Imputation is null
            ? records + "observed responses only (DTYPE empty), no imputation of missing values."
            : records + $"observed responses (DTYPE empty) and, for visits without one, responses imputed by {settings.Imputation} (DTYPE = '{settings.Imputation}'); " +
              $"imputed responses counted: {string.Join("; ", imputedByVisit)}.";
    }

    public static string Test(CategoricalByVisitSettings settings, ResponseCategories categories, double[] scores,
        IReadOnlyList<RecordVariable> strata, PopulationSelection selection, bool allArms,
        IReadOnlyList<(string Visit, IReadOnlyList<VisitComparison> Comparisons)> byVisit)
    {
        var arms = allArms ? selection.Arms.Count : 2;
        var df = VisitComparison.NominalDf(settings.Test, arms, categories.Count);
        var name = VisitComparison.MethodName(settings.Test);
        var scoreText = settings.Scores switch
        {
            ColumnScores.EqualSpacing => $"equally spaced column scores 1 to {categories.Count} in the order listed",
            ColumnScores.ModifiedRidit => "modified ridit column scores (standardized midranks) computed within each stratum",
            _ => "table scores (column scores " + string.Join(", ", scores.Select(s => s.ToString("0.###", CultureInfo.InvariantCulture))) + " for the categories in the order listed)",
        };
        if (settings.Test == GeneralizedCmhStatistic.GeneralAssociation)
        {
            scoreText = "the categories taken as nominal (no scores)";
        }
        var rowScores = settings.Test == GeneralizedCmhStatistic.Correlation ? $"; row scores 1 to {arms} for the arms in column order" : string.Empty;
        var compared = allArms
            ? $"one test over all {selection.Arms.Count} arms"
            : $"each active arm with {selection.Control.Label}, those two arms only";
        string strataText;
        if (strata.Count == 0)
        {
            strataText = "unstratified";
        }
        else
        {
            var counts = byVisit.SelectMany(v => v.Comparisons.Select(c => c.StrataUsed)).ToList();
            var range = counts.Count == 0 ? string.Empty : counts.Min() == counts.Max() ? $"; {counts.Min()} strata" : $"; {counts.Min()} to {counts.Max()} strata by visit and comparison";
            strataText = $"stratified by {string.Join(" x ", strata.Select(s => s.Name))}{(strata.Count > 1 ? " (cross-classified)" : string.Empty)}{range}";
        }
        return $"{name} (chi-square with {df} degree{(df == 1 ? "" : "s")} of freedom), {scoreText}{rowScores}; {strataText}; at each visit separately, {compared}. " +
            "Strata with fewer than 2 subjects with a response are left out of a test.";
    }
}
