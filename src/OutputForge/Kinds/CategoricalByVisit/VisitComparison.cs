using OutputForge.Analysis;
using OutputForge.Stats;

namespace OutputForge.Kinds.CategoricalByVisit;

/// <summary>
/// One generalized Cochran-Mantel-Haenszel test at one visit: the arms compared (rows, in display
/// order), the strata that contributed, those left out for having fewer than two subjects, and the
/// chosen statistic.
/// </summary>
internal sealed record VisitComparison(
    string ColumnKey,
    IReadOnlyList<TreatmentArm> Arms,
    TestResult Test,
    int StrataUsed,
    IReadOnlyList<(StratumKey Stratum, int Subjects)> StrataLeftOut,
    int WithoutStratum)
{
    /// <summary>True for one test over all arms, false for an active arm against the control.</summary>
    public bool OverAllArms => ColumnKey == CategoricalByVisitAnalysis.PValueColumn;

    /// <summary>
    /// Builds the I x J table of each stratum (I arms, J categories) from the subjects' responses and
    /// computes the statistic the spec chose; row scores are 1, 2, ... in arm order.
    /// </summary>
    public static VisitComparison Compute(string columnKey, IReadOnlyList<TreatmentArm> arms,
        IReadOnlyList<(TreatmentArm Arm, int Category, StratumKey? Stratum)> responses, int categories,
        IReadOnlyList<double> columnScores, GeneralizedCmhStatistic test)
    {
        var rowOf = arms.Select((a, i) => (a, i)).ToDictionary(p => p.a, p => p.i);
        var used = responses.Where(r => rowOf.ContainsKey(r.Arm)).ToList();
        var withoutStratum = used.Count(r => r.Stratum is null);
        var byStratum = used.Where(r => r.Stratum is not null)
            .GroupBy(r => r.Stratum!)
            .OrderBy(g => g.Key.Text, StringComparer.Ordinal)
            .ToList();
        var leftOut = byStratum.Where(g => g.Count() < 2).Select(g => (g.Key, g.Count())).ToList();
        var tables = new List<int[,]>();
        foreach (var group in byStratum.Where(g => g.Count() >= 2))
        {
            var table = new int[arms.Count, categories];
            foreach (var r in group)
            {
                table[rowOf[r.Arm], r.Category]++;
            }
            tables.Add(table);
        }
        TestResult result;
        if (tables.Count == 0)
        {
            result = TestResult.NotEstimable(MethodName(test), "no stratum has two or more subjects with a response");
        }
        else
        {
            var rowScores = Enumerable.Range(1, arms.Count).Select(i => (double)i).ToArray();
            // No fixed scores means modified ridit scores, computed within each stratum.
            var all = columnScores.Count == 0
                ? GeneralizedCochranMantelHaenszel.Compute(tables, rowScores, ModifiedRiditScores.Of)
                : GeneralizedCochranMantelHaenszel.Compute(tables, rowScores, columnScores);
            result = test switch
            {
                GeneralizedCmhStatistic.Correlation => all.NonzeroCorrelation,
                GeneralizedCmhStatistic.GeneralAssociation => all.GeneralAssociation,
                _ => all.RowMeanScores,
            };
        }
        return new VisitComparison(columnKey, arms, result, tables.Count, leftOut, withoutStratum);
    }

    public static string MethodName(GeneralizedCmhStatistic test) => test switch
    {
        GeneralizedCmhStatistic.Correlation => GeneralizedCochranMantelHaenszel.CorrelationName,
        GeneralizedCmhStatistic.GeneralAssociation => GeneralizedCochranMantelHaenszel.GeneralAssociationName,
        _ => GeneralizedCochranMantelHaenszel.RowMeanScoresName,
    };

    /// <summary>The degrees of freedom of the statistic when the covariance matrix has full rank.</summary>
    public static int NominalDf(GeneralizedCmhStatistic test, int arms, int categories) => test switch
    {
        GeneralizedCmhStatistic.Correlation => 1,
        GeneralizedCmhStatistic.GeneralAssociation => (arms - 1) * (categories - 1),
        _ => arms - 1,
    };
}
