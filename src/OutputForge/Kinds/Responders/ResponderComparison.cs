using OutputForge.Analysis;
using OutputForge.Stats;

namespace OutputForge.Kinds.Responders;

/// <summary>
/// One active arm against the control: the difference in proportions with its interval, and the
/// test of no association in the 2 x 2 table, chosen as the spec says.
/// </summary>
public sealed record ResponderComparison(
    TreatmentArm Arm,
    IntervalResult Difference,
    TestResult Test,
    ExpectedCountDiagnostics Expected)
{
    /// <summary>
    /// "auto" follows Cochran's rule (common practice): Pearson's chi-square unless an expected
    /// count is below 5, then Fisher's exact test.
    /// </summary>
    public static ResponderComparison Compute(TreatmentArm arm, ResponderCounts active, ResponderCounts control,
        DifferenceCiMethod method, double level, string testChoice)
    {
        var difference = ProportionDifferenceInterval.Compute(
            active.Responders, active.Denominator, control.Responders, control.Denominator, method, level);
        var table = new int[,]
        {
            { active.Responders, active.NonResponders },
            { control.Responders, control.NonResponders },
        };
        var expected = ContingencyTable.Diagnose(table);
        var test = testChoice switch
        {
            "fisher" => FisherExactTest.Compute(table),
            "chi-square" => PearsonChiSquareTest.Compute(table),
            "yates" => YatesChiSquareTest.Compute(table),
            "likelihood-ratio" => LikelihoodRatioChiSquareTest.Compute(table),
            _ => expected.CellsBelowFive > 0 ? FisherExactTest.Compute(table) : PearsonChiSquareTest.Compute(table),
        };
        return new ResponderComparison(arm, difference, test, expected);
    }
}
