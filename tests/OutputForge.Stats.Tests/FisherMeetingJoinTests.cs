namespace OutputForge.Stats.Tests;

/// <summary>
/// The join of the two halves of the Fisher network against summing every qualifying pair directly
/// (an independent computation of the same sum), with weights in linear scale and, for lists wider
/// than the linear range, with running log-sums.
/// </summary>
public class FisherMeetingJoinTests
{
    public static IEnumerable<object[]> Cases()
    {
        for (int seed = 1; seed <= 20; seed++)
        {
            yield return [seed, 8.0];
        }
        yield return [101, 700.0];
        yield return [102, 900.0];
    }

    [Theory]
    [MemberData(nameof(Cases))]
    public void EqualsTheSumOverEveryQualifyingPair(int seed, double spread)
    {
        var random = new Random(seed);
        var pasts = List(random, 1 + random.Next(60), spread);
        var completions = List(random, 1 + random.Next(60), spread);
        int from = random.Next(pasts.Values.Length);
        int to = from + 1 + random.Next(pasts.Values.Length - from);
        double limit = -spread + (random.NextDouble() - 0.5) * spread;
        double logConstant = spread / 2;

        double expected = 0;
        for (int i = from; i < to; i++)
        {
            for (int j = 0; j < completions.Values.Length; j++)
            {
                if (pasts.Values[i] + completions.Values[j] <= limit)
                {
                    expected += pasts.Counts[i] * completions.Counts[j] * Math.Exp(logConstant + pasts.Values[i] + completions.Values[j]);
                }
            }
        }
        double joined = FisherMeetingJoin.Sum(pasts, FisherMeetingJoin.Scale.Of(pasts), from, to, completions, FisherMeetingJoin.Scale.Of(completions), limit, logConstant);
        Assert.Equal(expected, joined, Math.Max(expected * 1e-12, 1e-300));
    }

    [Fact]
    public void WideListsFallBackToLogSums()
    {
        var wide = FisherPastValues.Sorted([-800, -1], [1, 1]);
        Assert.Null(FisherMeetingJoin.Scale.Of(wide));
        Assert.NotNull(FisherMeetingJoin.Scale.Of(FisherPastValues.Sorted([-500, -1], [1, 1])));
    }

    private static FisherPastValues List(Random random, int length, double spread)
    {
        var values = Enumerable.Range(0, length).Select(_ => -random.NextDouble() * spread).Distinct().Order().ToArray();
        var counts = values.Select(_ => (double)(1 + random.Next(5))).ToArray();
        return FisherPastValues.Sorted(values, counts);
    }
}
