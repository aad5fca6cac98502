namespace OutputForge.Demo;

/// <summary>
/// Weekly records of the pooled study's further efficacy parameters. As for the itch score, the change
/// at week w is ramp(w) x (arm effect + subject effect) + AR(1) noise, with ramp(w) = min(1, w / 8), so
/// the effect builds over two months and values of one subject are correlated. A subject has a record
/// for every week whose planned day (plus or minus one) falls before the end of study.
/// </summary>
internal static class WeeklyEfficacySimulator
{
    private const double SubjectEffectSd = 1.4;
    private const double NoiseSd = 0.9;
    private const double NoiseCorrelation = 0.6;

    public static void Simulate(DemoSubject subject, int parameterCount, Xoshiro256StarStar random)
    {
        if (subject.TreatmentStart is not { } start) return;
        for (var p = 0; p < parameterCount; p++)
        {
            var parameter = WeeklyEfficacyParameter.All[p];
            var baseline = (int)Math.Round(10 * random.TruncatedNormal(parameter.BaselineMean, parameter.BaselineSd, 1.0, 10.0),
                MidpointRounding.AwayFromZero);
            subject.WeeklyAssessments.Add(new WeeklyAssessment(parameter, 0, subject.RandomizationDate.AddDays(-1), baseline, baseline));
            var subjectEffect = random.Normal(0, SubjectEffectSd);
            var noise = 0.0;
            for (var week = 1; week <= WeeklyEfficacyParameter.Weeks; week++)
            {
                var fresh = random.Normal(0, NoiseSd);
                noise = week == 1 ? fresh : NoiseCorrelation * noise + Math.Sqrt(1 - NoiseCorrelation * NoiseCorrelation) * fresh;
                var date = start.AddDays(WeeklyEfficacyParameter.TargetDay(week) - 1 + random.NextInt(-1, 1));
                if (date > subject.EndOfStudy) break;
                var change = Math.Min(1.0, week / 8.0) * (parameter.Week12MeanChange[subject.Arm.Index] + subjectEffect) + noise;
                var value = Math.Clamp((int)Math.Round(baseline + 10 * change, MidpointRounding.AwayFromZero), 0, 100);
                subject.WeeklyAssessments.Add(new WeeklyAssessment(parameter, week, date, value, baseline));
            }
        }
    }
}
