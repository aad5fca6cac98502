using System.Reflection;

namespace OutputForge.Stats.Tests;

/// <summary>
/// Every stratified method says which strata it left out as data (<see cref="StratumRemark"/>: index and reason), never
/// as prose that a caller would have to read back to find the stratum: the caller names the stratum by its values.
/// The methods are found by reflection, so a new stratified method is held to the same rule.
/// </summary>
public sealed class StratumRemarkStructureTests
{
    // Invented strata, one of each kind the selection leaves out, between two that every method can use:
    // index 1 has no subjects, index 2 none in group 1, index 3 none in group 2, index 5 no events (zero margin).
    private static readonly StratumCounts[] Strata =
    [
        new(4, 10, 2, 10), new(0, 0, 0, 0), new(0, 0, 3, 8), new(2, 6, 0, 0), new(5, 12, 3, 11), new(0, 5, 0, 6),
    ];

    private static readonly StratumRemark[] Skipped =
    [
        new(1, StratumRemarkReason.NoSubjects), new(2, StratumRemarkReason.EmptyGroup, Group: 1), new(3, StratumRemarkReason.EmptyGroup, Group: 2),
    ];

    public static TheoryData<string> StratifiedMethods()
    {
        var data = new TheoryData<string>();
        foreach (var type in Methods().Select(m => m.DeclaringType!.Name).Distinct(StringComparer.Ordinal).Order(StringComparer.Ordinal))
        {
            data.Add(type);
        }
        return data;
    }

    [Theory]
    [MemberData(nameof(StratifiedMethods))]
    public void A_stratified_method_returns_the_strata_it_left_out_as_remarks_and_words_none(string type)
    {
        var method = Methods().Single(m => m.DeclaringType!.Name == type);
        var arguments = method.GetParameters().Select(p => p.Position == 0 ? Strata : p.DefaultValue).ToArray();
        var (notes, remarks) = method.Invoke(null, arguments) switch
        {
            TestResult t => (t.Notes, t.StratumRemarks),
            IntervalResult i => (i.Notes, i.StratumRemarks),
            var other => throw new InvalidOperationException($"{type}.Compute returns {other?.GetType().Name}"),
        };
        Assert.Equal(Skipped, remarks.Take(Skipped.Length));
        Assert.DoesNotContain(notes, n => n.Contains("stratum", StringComparison.OrdinalIgnoreCase));
    }

    [Fact]
    public void The_generalized_CMH_statistics_return_the_strata_they_skipped_as_remarks()
    {
        // Invented: a 2 x 3 stratum with one subject (index 1) and an empty one (index 2) between two full ones.
        var strata = new List<int[,]>
        {
            new[,] { { 3, 2, 4 }, { 1, 5, 2 } }, new[,] { { 0, 1, 0 }, { 0, 0, 0 } }, new int[2, 3], new[,] { { 2, 2, 2 }, { 4, 1, 3 } },
        };
        var result = GeneralizedCochranMantelHaenszel.Compute(strata);
        StratumRemark[] skipped = [new(1, StratumRemarkReason.SingleSubject), new(2, StratumRemarkReason.NoSubjects)];
        foreach (var test in new[] { result.GeneralAssociation, result.RowMeanScores, result.NonzeroCorrelation })
        {
            Assert.Equal(skipped, test.StratumRemarks);
            Assert.DoesNotContain(test.Notes, n => n.Contains("stratum", StringComparison.OrdinalIgnoreCase));
        }
    }

    [Fact]
    public void Breslow_Day_names_itself_in_the_remark_on_a_stratum_without_variability()
    {
        var result = BreslowDayTest.Compute(Strata, taroneCorrection: false);
        Assert.Equal(new StratumRemark(5, StratumRemarkReason.NoEvents, BreslowDayTest.MethodName), result.StratumRemarks[^1]);
    }

    /// <summary>The public Compute methods of the Stratified area that take 2 x 2 x K strata first.</summary>
    private static IEnumerable<MethodInfo> Methods() =>
        typeof(StratumCounts).Assembly.GetTypes()
            .Where(t => t.IsPublic && t.Namespace == typeof(StratumCounts).Namespace)
            .SelectMany(t => t.GetMethods(BindingFlags.Public | BindingFlags.Static))
            .Where(m => m.Name == "Compute" && m.GetParameters() is [var first, ..] && first.ParameterType == typeof(IReadOnlyList<StratumCounts>)
                && m.GetParameters().Skip(1).All(p => p.HasDefaultValue));
}
