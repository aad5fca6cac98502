namespace OutputForge.Stats.Survival;

/// <summary>
/// A quantile of the Kaplan-Meier curve (the median for p = 0.5) with the Brookmeyer-Crowley
/// confidence interval (Brookmeyer and Crowley, Biometrics 38, 1982): the interval is read off the
/// pointwise log-log confidence curves, its lower bound as the time the lower curve falls to 1 - p and
/// its upper bound as the time the upper curve does. Ties follow R survival 3.x (quantile.survfit):
/// where a curve equals 1 - p on a flat stretch, the quantile is the midpoint of that stretch; where
/// it stays exactly at 1 - p to the end, the midpoint with the last observed time. A quantile the
/// curve never reaches is not estimable (NE).
/// </summary>
public sealed record KaplanMeierQuantile(double Probability, double? Estimate, double? Lower, double? Upper)
{
    /// <summary>R survival's tolerance for "equal to 1 - p": sqrt(machine epsilon).</summary>
    private static readonly double Tolerance = Math.Sqrt(Math.Pow(2, -52));

    public static KaplanMeierQuantile Compute(KaplanMeierEstimate curve, double probability)
    {
        if (probability <= 0 || probability >= 1)
        {
            throw new ArgumentOutOfRangeException(nameof(probability), probability, "probability must be between 0 and 1");
        }
        var times = curve.Steps.Select(s => s.Time).ToList();
        return new KaplanMeierQuantile(probability,
            Find(times, curve.Steps.Select(s => s.Survival).ToList(), probability, curve.LastTime),
            Find(times, curve.Steps.Select(s => s.Lower).ToList(), probability, curve.LastTime),
            Find(times, curve.Steps.Select(s => s.Upper).ToList(), probability, curve.LastTime));
    }

    /// <summary>
    /// The time at which the cumulative curve 1 - S first reaches p. The curve starts at (0, 0);
    /// repeated values keep their first time, undefined values (NaN) are skipped.
    /// </summary>
    private static double? Find(IReadOnlyList<double> times, IReadOnlyList<double> survival, double p, double lastTime)
    {
        var x = new List<double> { 0 };
        var y = new List<double> { 0 };
        for (var i = 0; i < times.Count; i++)
        {
            var value = double.IsNaN(survival[i]) ? double.NaN : 1 - survival[i];
            if (y.Exists(v => v.Equals(value)))
            {
                continue;
            }
            x.Add(times[i]);
            y.Add(value);
        }
        var defined = Enumerable.Range(0, y.Count).Where(i => !double.IsNaN(y[i])).ToList();
        if (defined.Count == 0 || defined.Max(i => y[i]) < p)
        {
            return null;
        }
        int? first = defined.Cast<int?>().FirstOrDefault(i => y[i!.Value] + Tolerance >= p);
        int? beyond = defined.Cast<int?>().FirstOrDefault(i => y[i!.Value] - Tolerance >= p);
        if (first is null)
        {
            return null;
        }
        if (beyond is not null)
        {
            return (x[first.Value] + x[beyond.Value]) / 2;
        }
        var last = y[^1];
        return !double.IsNaN(last) && Math.Abs(p - last) < Tolerance ? (x[first.Value] + lastTime) / 2 : null;
    }
}
