using OutputForge.Analysis;
using OutputForge.Results;
using OutputForge.Spec;

namespace OutputForge.Kinds.CategoricalByVisit;

/// <summary>
/// The notes of a categorical-by-visit table as data (Layout words them): the denominators, the record selection (with
/// the DTYPE rule and the imputed responses counted), the test (statistic, degrees of freedom, scores, strata,
/// comparison) and the issues of single tests (strata left out, subjects without a stratum, a singular covariance
/// matrix), each issue both a footnote and a warning.
/// </summary>
internal static class VisitTableNotes
{
    public const string TestNote = "test";

    /// <summary>What a note on one test is about: the visit, and the comparison when there is one per active arm.</summary>
    public static NoteSubject About(string visit, VisitComparison comparison) => comparison.OverAllArms
        ? new NoteSubject(Visit: visit)
        : new NoteSubject(Visit: visit, Arm: comparison.Arms.First(a => !a.IsControl).Label, Control: comparison.Arms.First(a => a.IsControl).Label);

    /// <summary>Strata left out, subjects without a stratum and a singular covariance matrix, as warnings (the kind also prints them as footnotes).</summary>
    public static void ReportIssues(string visit, VisitComparison comparison, CategoricalByVisitSettings settings, int nominalDf, List<ResultNote> issues)
    {
        var about = About(visit, comparison);
        if (comparison.StrataLeftOut.Count > 0)
        {
            issues.Add(ResultNote.Warning(NoteKind.StrataTooSmall, about,
                ("strata", comparison.StrataLeftOut.Select(s => s.Stratum.Text).ToList()), ("subjects", comparison.StrataLeftOut.Select(s => s.Subjects).ToList())));
        }
        if (comparison.WithoutStratum > 0)
        {
            issues.Add(ResultNote.Warning(NoteKind.NoStratumValue, about,
                ("subjects", comparison.WithoutStratum), ("variables", settings.Strata.ToList()), ("leftOutOf", "test")));
        }
        // The statistic's degrees of freedom are the rank of its covariance matrix (Stats' GeneralizedCochranMantelHaenszel).
        if (comparison.Test.IsEstimable && comparison.Test.DegreesOfFreedom is { } rank && rank < nominalDf)
        {
            issues.Add(ResultNote.Warning(NoteKind.SingularCovariance, about, ("rank", (int)rank), ("nominalDf", nominalDf)));
        }
    }

    public static ResultNote Denominators(PopulationSelection selection, CategoricalByVisitSettings settings) =>
        ResultNote.Footnote("denominators", NoteKind.VisitResponseDenominators, ("population", selection.Label), ("missingRow", settings.MissingRow));

    public static ResultNote Records(EndpointSpec endpoint, CategoricalByVisitSettings settings, IReadOnlyList<(string Visit, int Imputed)> imputedByVisit)
    {
        var values = new List<(string, object)>
        {
            ("visits", imputedByVisit.Select(v => v.Visit).ToList()),
            ("imputedCounts", imputedByVisit.Select(v => v.Imputed).ToList()),
        };
        if (endpoint.Parameter is not null)
            values.Add(("parameter", endpoint.Parameter));
        if (endpoint.Where is not null)
            values.Add(("where", endpoint.Where));
        if (settings.Imputation is not null)
            values.Add(("imputation", settings.Imputation));
        return ResultNote.Footnote("records", NoteKind.VisitRecordSelection, [.. values]);
    }

    public static ResultNote Test(CategoricalByVisitSettings settings, ResponseCategories categories, double[] scores,
        IReadOnlyList<RecordVariable> strata, PopulationSelection selection, bool allArms,
        IReadOnlyList<(string Visit, IReadOnlyList<VisitComparison> Comparisons)> byVisit)
    {
        var arms = allArms ? selection.Arms.Count : 2;
        var scoreCode = settings.Test == GeneralizedCmhStatistic.GeneralAssociation ? "nominal" : settings.Scores switch
        {
            ColumnScores.EqualSpacing => "equal-spacing",
            ColumnScores.ModifiedRidit => "modified-ridit",
            _ => "table",
        };
        var values = new List<(string, object)>
        {
            ("method", VisitComparison.MethodName(settings.Test)),
            ("df", VisitComparison.NominalDf(settings.Test, arms, categories.Count)),
            ("scores", scoreCode),
            ("categories", categories.Count),
            ("columnScores", scores.ToList()),
            ("rowScores", settings.Test == GeneralizedCmhStatistic.Correlation),
            ("arms", arms),
            ("allArms", allArms),
            ("control", selection.Control.Label),
            ("strata", strata.Select(s => s.Name).ToList()),
        };
        var counts = byVisit.SelectMany(v => v.Comparisons.Select(c => c.StrataUsed)).ToList();
        if (counts.Count > 0)
        {
            values.Add(("fewestStrata", counts.Min()));
            values.Add(("mostStrata", counts.Max()));
        }
        return ResultNote.Footnote(TestNote, NoteKind.VisitCmhTest, [.. values]);
    }
}
