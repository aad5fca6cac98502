using MathNet.Numerics.Distributions;

namespace OutputForge.Stats.Survival;

/// <summary>
/// The Kaplan-Meier product-limit estimate (Kaplan and Meier, JASA 53, 1958) with Greenwood's variance
/// and pointwise confidence limits on the log-log scale, S^exp(+-z se/log S) (Kalbfleisch and Prentice,
/// The Statistical Analysis of Failure Time Data, 2002, section 1.4; R survival's conf.type = "log-log").
/// Censored subjects at an event time are counted at risk at that time.
/// </summary>
public sealed class KaplanMeierEstimate
{
    private KaplanMeierEstimate(IReadOnlyList<KaplanMeierStep> steps, double level, double lastTime, int count, int events)
    {
        Steps = steps;
        Level = level;
        LastTime = lastTime;
        Count = count;
        EventCount = events;
    }

    /// <summary>One step per distinct observed time (event or censoring), in increasing time.</summary>
    public IReadOnlyList<KaplanMeierStep> Steps { get; }
    public double Level { get; }

    /// <summary>The largest observed time (event or censoring); the curve is not defined beyond it.</summary>
    public double LastTime { get; }
    public int Count { get; }
    public int EventCount { get; }

    public static KaplanMeierEstimate Compute(SurvivalData data, double level = 0.95)
    {
        if (level <= 0 || level >= 1)
        {
            throw new ArgumentOutOfRangeException(nameof(level), level, "confidence level must be between 0 and 1");
        }
        var z = Normal.InvCDF(0, 1, 1 - (1 - level) / 2);
        var groups = Enumerable.Range(0, data.Count)
            .GroupBy(i => data.Times[i])
            .OrderBy(g => g.Key)
            .Select(g => (Time: g.Key, Events: g.Count(i => data.Events[i]), Total: g.Count()))
            .ToList();
        var steps = new List<KaplanMeierStep>(groups.Count);
        var atRisk = data.Count;
        var survival = 1.0;
        var sum = 0.0;
        foreach (var (time, events, total) in groups)
        {
            if (events > 0)
            {
                survival *= 1.0 - (double)events / atRisk;
                sum = events == atRisk ? double.PositiveInfinity : sum + (double)events / ((double)atRisk * (atRisk - events));
            }
            var se = Math.Sqrt(sum);
            var (lower, upper) = LogLogLimits(survival, se, z);
            steps.Add(new KaplanMeierStep(time, atRisk, events, total - events, survival, se, lower, upper));
            atRisk -= total;
        }
        return new KaplanMeierEstimate(steps, level, groups.Count == 0 ? 0 : groups[^1].Time, data.Count, data.EventCount);
    }

    /// <summary>
    /// S^exp(-z se/log S) and S^exp(z se/log S); at S = 1 (no event yet) both limits are 1, and at
    /// S = 0 they are undefined (NaN), as in R survival.
    /// </summary>
    private static (double Lower, double Upper) LogLogLimits(double s, double se, double z)
    {
        if (s <= 0)
        {
            return (double.NaN, double.NaN);
        }
        if (s >= 1)
        {
            return (1, 1);
        }
        var log = Math.Log(s);
        return (Math.Pow(s, Math.Exp(-z * se / log)), Math.Pow(s, Math.Exp(z * se / log)));
    }

    /// <summary>
    /// S(t) and its limits at time t: the last step at or before t. Not estimable beyond the last
    /// observed time, where the curve is unknown.
    /// </summary>
    public IntervalResult At(double time)
    {
        if (time < 0)
        {
            throw new ArgumentOutOfRangeException(nameof(time), time, "time must not be negative");
        }
        if (Count == 0)
        {
            return IntervalResult.NotEstimable("no subjects");
        }
        if (time > LastTime)
        {
            return IntervalResult.NotEstimable($"time {time.ToString(System.Globalization.CultureInfo.InvariantCulture)} is beyond the last observed time");
        }
        var step = Steps.LastOrDefault(s => s.Time <= time);
        if (step is null)
        {
            return new IntervalResult(1, 1, 1);
        }
        if (step.Survival <= 0)
        {
            return IntervalResult.NotEstimable("the estimate has reached 0, where log-log confidence limits are undefined");
        }
        return new IntervalResult(step.Survival, step.Lower, step.Upper);
    }

    /// <summary>The median and its Brookmeyer-Crowley interval; see <see cref="KaplanMeierQuantile"/>.</summary>
    public KaplanMeierQuantile Median() => KaplanMeierQuantile.Compute(this, 0.5);
}
