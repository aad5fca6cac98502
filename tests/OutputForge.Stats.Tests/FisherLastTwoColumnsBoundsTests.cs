using MathNet.Numerics;

namespace OutputForge.Stats.Tests;

/// <summary>
/// The closed-form bounds of the last two columns of the r x c Fisher network (greedy maximum, vertex
/// minimum) against listing every split of the column: an independent computation of the same numbers.
/// </summary>
public class FisherLastTwoColumnsBoundsTests
{
    private static readonly double[] LogFactorial = Enumerable.Range(0, 200).Select(k => SpecialFunctions.FactorialLn(k)).ToArray();

    public static IEnumerable<object[]> Nodes()
    {
        var random = new Random(20261202);
        for (int k = 0; k < 60; k++)
        {
            int rows = 2 + k % 4;
            var capacities = Enumerable.Range(0, rows).Select(_ => random.Next(0, 30)).ToArray();
            int total = random.Next(0, capacities.Sum() + 1);
            yield return [capacities, total];
        }
        yield return [new[] { 0, 0, 5 }, 5];
        yield return [new[] { 7, 7, 7 }, 0];
        yield return [new[] { 7, 7, 7 }, 21];
        yield return [new[] { 1, 40, 2, 3 }, 20];
    }

    [Theory]
    [MemberData(nameof(Nodes))]
    public void MatchListingEverySplit(int[] capacities, int total)
    {
        double max = double.NegativeInfinity;
        double min = double.PositiveInfinity;
        foreach (var split in Splits(capacities, total, 0))
        {
            double value = 0;
            for (int i = 0; i < capacities.Length; i++)
            {
                value -= LogFactorial[split[i]] + LogFactorial[capacities[i] - split[i]];
            }
            max = Math.Max(max, value);
            min = Math.Min(min, value);
        }
        var (closedMax, closedMin) = FisherLastTwoColumnsBounds.Of(capacities, total, LogFactorial);
        Assert.Equal(max, closedMax, 1e-12 * Math.Max(1, Math.Abs(max)));
        Assert.Equal(min, closedMin, 1e-12 * Math.Max(1, Math.Abs(min)));
    }

    private static IEnumerable<int[]> Splits(int[] capacities, int left, int row)
    {
        if (row == capacities.Length - 1)
        {
            if (left <= capacities[row])
            {
                var last = new int[capacities.Length];
                last[row] = left;
                yield return last;
            }
            yield break;
        }
        for (int x = 0; x <= Math.Min(left, capacities[row]); x++)
        {
            foreach (var rest in Splits(capacities, left - x, row + 1))
            {
                rest[row] = x;
                yield return rest;
            }
        }
    }
}
