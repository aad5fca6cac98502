namespace OutputForge.Stats.Tests;

/// <summary>
/// Fisher's exact test for r x c tables. 2 x 2 tables must agree with <see cref="FisherExactTest.TwoByTwo"/>
/// (itself checked against R); larger tables against R 4.2.2's fisher.test, values in
/// Oracles/fisher_rxc_oracles.R with its output recorded beside each table.
/// </summary>
public sealed class FisherExactRxCTests
{
    [Theory]
    [InlineData(3, 1, 1, 3)]
    [InlineData(10, 2, 3, 15)]
    [InlineData(0, 5, 5, 0)]
    [InlineData(12, 74, 20, 64)]
    public void Two_by_two_tables_agree_with_the_two_by_two_test(int a, int b, int c, int d)
    {
        var expected = FisherExactTest.TwoByTwo(a, b, c, d).PValue;
        Assert.Equal(expected, FisherExactRxC.Compute(new[,] { { a, b }, { c, d } }).PValue, 12);
    }

    public static TheoryData<string> RTableNames => new() { "job", "disposition", "twobythree", "sparse", "race" };

    [Theory]
    [MemberData(nameof(RTableNames))]
    public void Agrees_with_r_fisher_test(string name)
    {
        // Oracles/fisher_rxc_oracles.txt: "name|rows|cells by row|p" as written by fisher_rxc_oracles.R (R 4.2.2).
        var line = File.ReadLines(Path.Combine(RepositoryRoot.Path, "tests", "OutputForge.Stats.Tests", "Oracles", "fisher_rxc_oracles.txt"))
            .Single(l => l.StartsWith(name + "|", StringComparison.Ordinal)).Split('|');
        var rows = int.Parse(line[1], System.Globalization.CultureInfo.InvariantCulture);
        var cells = line[2].Split(',').Select(v => int.Parse(v, System.Globalization.CultureInfo.InvariantCulture)).ToArray();
        var table = new int[rows, cells.Length / rows];
        for (var i = 0; i < cells.Length; i++)
        {
            table[i / table.GetLength(1), i % table.GetLength(1)] = cells[i];
        }
        var expected = double.Parse(line[3], System.Globalization.CultureInfo.InvariantCulture);
        Assert.Equal(expected, FisherExactRxC.Compute(table).PValue, 9);
    }

    [Fact]
    public void A_larger_table_transposed_gives_the_same_p_value()
    {
        var table = new[,] { { 2, 7, 1 }, { 5, 1, 6 } };
        var transposed = new[,] { { 2, 5 }, { 7, 1 }, { 1, 6 } };
        Assert.Equal(FisherExactRxC.Compute(table).PValue, FisherExactRxC.Compute(transposed).PValue, 12);
    }

    [Fact]
    public void Empty_lines_are_dropped_with_a_note()
    {
        var result = FisherExactRxC.Compute(new[,] { { 2, 0, 3 }, { 0, 0, 0 }, { 4, 0, 1 } });
        Assert.Equal(FisherExactTest.TwoByTwo(2, 3, 4, 1).PValue, result.PValue, 12);
        Assert.Equal(2, result.Notes.Count);
    }
}
