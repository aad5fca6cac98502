namespace OutputForge.Stats.Tests;

public class FisherRationalOracleTests
{
    public static IEnumerable<object[]> Cases() => ReferenceOracles.FisherRational.Select((row, index) => new object[] { index });

    /// <summary>
    /// Exact p-values in rational arithmetic (Python 3.11.7 fractions, every table with the margins
    /// listed; Oracles/generate_fisher_rational_oracles.py): the floating-point network must agree to
    /// 1e-11 relative, i.e. its rounding stays about a thousand times below the 1e-7 tie tolerance.
    /// </summary>
    [Theory]
    [MemberData(nameof(Cases))]
    public void MatchesExactRationalValue(int index)
    {
        var row = ReferenceOracles.FisherRational.ElementAt(index);
        var result = FisherExactTest.Compute(ReferenceOracles.Table(row.GetProperty("table")));
        double expected = row.GetProperty("p").GetDouble();
        Assert.Equal(expected, result.PValue, expected * 1e-11);
    }
}
