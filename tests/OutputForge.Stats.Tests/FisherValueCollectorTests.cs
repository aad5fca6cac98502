namespace OutputForge.Stats.Tests;

/// <summary>The merging of network values on the 1e-10 grid (common practice of network algorithms: equal values are one node entry).</summary>
public class FisherValueCollectorTests
{
    [Fact]
    public void MergesValuesOfOneCellAndSortsTheRest()
    {
        var collector = new FisherValueCollector(2);
        var random = new Random(7);
        var expected = new SortedDictionary<long, double>();
        for (int k = 0; k < 5000; k++)
        {
            // Values on a coarse grid, each arriving several times with a rounding-sized wobble.
            double value = -random.Next(0, 1500) * 0.01 - 3;
            double wobble = (random.NextDouble() - 0.5) * 1e-12;
            collector.Add(value + wobble, 1 + k % 3);
            long key = (long)Math.Round(value * 100);
            expected[key] = expected.GetValueOrDefault(key) + 1 + k % 3;
        }
        var result = collector.ToPastValues();
        Assert.Equal(expected.Count, collector.Count);
        Assert.Equal(expected.Keys.Select(key => key / 100.0), result.Values, (a, b) => Math.Abs(a - b) < 1e-9);
        Assert.Equal(expected.Values, result.Counts);
        for (int i = 1; i < result.Values.Length; i++)
        {
            Assert.True(result.Values[i - 1] < result.Values[i]);
        }
        double direct = Math.Log(result.Values.Zip(result.Counts, (v, c) => c * Math.Exp(v)).Sum());
        Assert.Equal(direct, result.LogPrefix[^1], 1e-12);
    }

    [Fact]
    public void KeepsTheFirstExactValueOfACell()
    {
        var collector = new FisherValueCollector();
        collector.Add(-1.5, 1);
        collector.Add(-1.5 + 2e-12, 4);
        var result = collector.ToPastValues();
        Assert.Equal([-1.5], result.Values);
        Assert.Equal([5.0], result.Counts);
    }
}
