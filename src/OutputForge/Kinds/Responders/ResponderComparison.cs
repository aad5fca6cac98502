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
    /// <summary>The test as <see cref="TableTests"/> runs the spec's choice (auto: Cochran's rule).</summary>
    public static ResponderComparison Compute(TreatmentArm arm, ResponderCounts active, ResponderCounts control,
        DifferenceCiMethod method, double level, TableTest testChoice)
    {
        var difference = ProportionDifferenceInterval.Compute(
            active.Responders, active.Denominator, control.Responders, control.Denominator, method, level);
        var table = new int[,]
        {
            { active.Responders, active.NonResponders },
            { control.Responders, control.NonResponders },
        };
        var expected = ContingencyTable.Diagnose(table);
        var test = TableTests.Compute(table, testChoice);
        if (active.Denominator == 0 || control.Denominator == 0)
        {
            // A table with an empty row admits only itself, so an exact test gives p = 1: a number that says nothing
            // about an arm without subjects, shown as NE instead.
            test = TestResult.NotEstimable(test.Method, $"no subjects in {(active.Denominator == 0 ? arm.Label : "the control arm")}");
        }
        return new ResponderComparison(arm, difference, test, expected);
    }
}
