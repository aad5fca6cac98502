using OutputForge.Demo;

namespace OutputForge.Tests.Demo;

public sealed class RandomSourceTests
{
    [Fact]
    public void SplitMix64_matches_the_published_sequence()
    {
        // Source: Rosetta Code task "Pseudo-random numbers/Splitmix64", first five outputs for seed 1234567.
        var generator = new SplitMix64(1234567);
        ulong[] expected = [6457827717110365317, 3203168211198807973, 9817491932198370423, 4593380528125082431, 16408922859458223821];
        foreach (var value in expected) Assert.Equal(value, generator.Next());
    }

    [Theory]
    [InlineData(1e-300)]
    [InlineData(1.1102230246251565e-16)]
    [InlineData(0.001)]
    [InlineData(0.5)]
    [InlineData(0.70710678)]
    [InlineData(1.0)]
    [InlineData(1.4142)]
    [InlineData(2.718281828459045)]
    [InlineData(12345.678)]
    [InlineData(1e300)]
    public void Portable_log_agrees_with_the_runtime_log(double x)
    {
        // Reference: .NET Math.Log (platform libm, correctly rounded or within 1 ulp); we allow 4 ulp.
        var expected = Math.Log(x);
        Assert.True(Math.Abs(PortableMath.Log(x) - expected) <= 4 * Math.Max(double.Epsilon, Math.BitIncrement(Math.Abs(expected)) - Math.Abs(expected)),
            $"Log({x}) = {PortableMath.Log(x):R}, runtime {expected:R}");
    }

    [Theory]
    [InlineData(-700)]
    [InlineData(-20.5)]
    [InlineData(-1)]
    [InlineData(-1e-10)]
    [InlineData(0)]
    [InlineData(0.3465)]
    [InlineData(1)]
    [InlineData(3.2)]
    [InlineData(250.25)]
    [InlineData(700)]
    public void Portable_exp_agrees_with_the_runtime_exp(double x)
    {
        // Reference: .NET Math.Exp; relative error allowed 4 x 2^-52.
        var expected = Math.Exp(x);
        Assert.True(Math.Abs(PortableMath.Exp(x) - expected) <= 4 * Math.Pow(2, -52) * expected,
            $"Exp({x}) = {PortableMath.Exp(x):R}, runtime {expected:R}");
    }

    [Fact]
    public void Normal_draws_have_mean_zero_and_variance_one()
    {
        // 200,000 draws: the standard error of the mean is 0.0022 and of the variance about 0.0032
        // (var of s^2 = 2/n for a normal sample, common practice); we allow 5 standard errors.
        var random = new Xoshiro256StarStar(2024);
        const int n = 200_000;
        double sum = 0, sumSquares = 0;
        for (var i = 0; i < n; i++)
        {
            var z = random.Normal();
            sum += z;
            sumSquares += z * z;
        }
        var mean = sum / n;
        var variance = sumSquares / n - mean * mean;
        Assert.InRange(mean, -5 * 0.0022, 5 * 0.0022);
        Assert.InRange(variance, 1 - 5 * 0.0032, 1 + 5 * 0.0032);
    }

    [Fact]
    public void Bounded_integers_cover_the_range_evenly()
    {
        // 60,000 draws on 0..5: each count is Binomial(60000, 1/6), sd 91; we allow 5 sd.
        var random = new Xoshiro256StarStar(7);
        var counts = new int[6];
        for (var i = 0; i < 60_000; i++) counts[random.NextInt(6)]++;
        Assert.All(counts, c => Assert.InRange(c, 10_000 - 5 * 91, 10_000 + 5 * 91));
    }
}
