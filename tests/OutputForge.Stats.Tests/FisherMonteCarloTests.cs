using OutputForge.Stats.Exact;

namespace OutputForge.Stats.Tests;

/// <summary>
/// The Monte Carlo estimate of Fisher's exact p-value (Agresti, Wackerly and Boyett 1979) and its sampler of tables with
/// fixed margins (Patefield 1981, AS 159). The sampler is checked against the multiple hypergeometric probabilities
/// themselves (every table with the margins listed), the estimate against the exact p-values of the network algorithm
/// (which FisherExactRxcTests check against R's fisher.test and a brute-force listing).
/// </summary>
public sealed class FisherMonteCarloTests
{
    private static double LogFactorial(int k) => Enumerable.Range(2, Math.Max(0, k - 1)).Sum(i => Math.Log(i));

    [Fact]
    public void Sampled_tables_have_the_multiple_hypergeometric_probabilities()
    {
        // Margins rows (4, 5), columns (3, 3, 3): the 2 x 3 tables are fixed by their first row (a, b, 4 - a - b).
        int[] rows = [4, 5], columns = [3, 3, 3];
        var sampler = new RandomTableWithMargins(rows, columns);
        var uniform = new SplitMixUniform(7);
        var counts = new Dictionary<(int, int), int>();
        const int samples = 200_000;
        var table = new int[2, 3];
        for (var k = 0; k < samples; k++)
        {
            sampler.Draw(table, uniform);
            Assert.Equal(rows, new[] { table[0, 0] + table[0, 1] + table[0, 2], table[1, 0] + table[1, 1] + table[1, 2] });
            Assert.Equal(columns, new[] { table[0, 0] + table[1, 0], table[0, 1] + table[1, 1], table[0, 2] + table[1, 2] });
            counts[(table[0, 0], table[0, 1])] = counts.GetValueOrDefault((table[0, 0], table[0, 1])) + 1;
        }
        // P(table) = prod r_i! prod c_j! / (n! prod n_ij!) (Agresti 2013, Categorical Data Analysis, 3rd ed., section 3.5.7).
        double constant = rows.Sum(LogFactorial) + columns.Sum(LogFactorial) - LogFactorial(9);
        var total = 0.0;
        for (var a = 0; a <= 3; a++)
        {
            for (var b = 0; b <= 3 && a + b <= 4; b++)
            {
                var c = 4 - a - b;
                if (c > 3)
                {
                    continue;
                }
                var p = Math.Exp(constant - LogFactorial(a) - LogFactorial(b) - LogFactorial(c) - LogFactorial(3 - a) - LogFactorial(3 - b) - LogFactorial(3 - c));
                total += p;
                var observed = counts.GetValueOrDefault((a, b)) / (double)samples;
                // Within 5 binomial standard errors (a failure here is a wrong sampler, not chance: about 6e-7 per table).
                Assert.True(Math.Abs(observed - p) <= 5 * Math.Sqrt(p * (1 - p) / samples) + 1e-9, $"table ({a}, {b}, {c}): sampled {observed}, probability {p}");
            }
        }
        Assert.Equal(1.0, total, 12);
        Assert.Equal(samples, counts.Values.Sum());
    }

    public static TheoryData<string> Tables() => new()
    {
        "5,8,2,6;3,9,7,4;8,2,5,6",
        "3,1,0;1,4,2;0,2,5;2,0,3",
        "10,12,8;6,14,9;9,5,13",
        "2,0,1,4,1;0,3,2,0,2;3,1,0,1,2",
    };

    [Theory]
    [MemberData(nameof(Tables))]
    public void The_estimate_agrees_with_the_exact_p_value_within_its_interval(string counts)
    {
        var table = Parse(counts);
        var exact = FisherExactTest.Compute(table);
        Assert.True(exact.IsEstimable);

        var estimate = FisherMonteCarlo.Estimate(table, FisherMonteCarloSettings.Default);

        Assert.InRange(exact.PValue, estimate.Lower, estimate.Upper);
        Assert.True(Math.Abs(estimate.PValue - exact.PValue) <= estimate.Upper - estimate.Lower, $"estimate {estimate.PValue}, exact {exact.PValue}");
        Assert.True(estimate.Upper - estimate.Lower < 0.01);
        Assert.Equal(FisherMonteCarloSettings.DefaultSamples, estimate.Samples);
    }

    [Fact]
    public void A_seed_gives_the_same_estimate_and_another_seed_another_sample()
    {
        var table = Parse("5,8,2,6;3,9,7,4;8,2,5,6");
        var settings = new FisherMonteCarloSettings(20_000, 12345);

        var first = FisherMonteCarlo.Estimate(table, settings);
        var again = FisherMonteCarlo.Estimate(table, settings);
        var other = FisherMonteCarlo.Estimate(table, settings with { Seed = 54321 });

        Assert.Equal(first, again);
        Assert.NotEqual(first.AtMostAsProbable, other.AtMostAsProbable);
    }

    [Fact]
    public void A_table_beyond_exact_enumeration_is_NE_without_the_fallback_and_an_estimate_with_a_note_with_it()
    {
        // 5 x 3, n = 3,000, counts spread evenly: beyond the network's work limit.
        var table = Parse("200,210,190;205,195,200;198,202,200;210,190,200;187,213,200");

        var exact = FisherExactTest.Compute(table);
        var estimated = FisherExactTest.Compute(table, FisherMonteCarloSettings.Default);

        Assert.False(exact.IsEstimable);
        Assert.True(estimated.IsEstimable);
        Assert.Equal(FisherExactTest.MonteCarloMethodName, estimated.Method);
        var note = Assert.Single(estimated.Notes);
        Assert.Contains("Monte Carlo estimate (Agresti, Wackerly and Boyett 1979)", note);
        Assert.Contains("99% CI", note);
        Assert.Contains("from 100,000 tables sampled with the observed margins (Patefield 1981), seed 20261201", note);
        // For n = 3,000 the exact p-value is close to Pearson's chi-square p-value (the large-sample limit, Agresti 2013
        // section 3.5): a loose check that the estimate is of the right quantity.
        var pearson = OutputForge.Stats.Contingency.PearsonChiSquareTest.Compute(table);
        Assert.True(Math.Abs(estimated.PValue - pearson.PValue) < 0.05, $"estimate {estimated.PValue}, Pearson {pearson.PValue}");
    }

    private static int[,] Parse(string counts)
    {
        var rows = counts.Split(';').Select(r => r.Split(',').Select(int.Parse).ToArray()).ToArray();
        var table = new int[rows.Length, rows[0].Length];
        for (var i = 0; i < rows.Length; i++)
        {
            for (var j = 0; j < rows[0].Length; j++)
            {
                table[i, j] = rows[i][j];
            }
        }
        return table;
    }
}
