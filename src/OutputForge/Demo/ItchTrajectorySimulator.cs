namespace OutputForge.Demo;

/// <summary>
/// Weekly mean itch scores after baseline. Change from baseline at a visit is
/// ramp(visit) x (arm effect + subject effect) + AR(1) visit noise, so that the effect builds over
/// the visits and values of one subject are correlated. The arm effects are invented and set so that,
/// after clamping to 0-10 and dropout, the observed Week 12 mean change is about -1.75 placebo,
/// -2.75 10 mg and -3.4 30 mg (SD about 2.0), and about 24%, 41% and 53% of observed subjects have
/// at least a 50% reduction.
/// </summary>
internal static class ItchTrajectorySimulator
{
    private static readonly double[] Week12MeanChange = [-1.75, -2.85, -3.55];
    private static readonly double[] Ramp = [0.40, 0.65, 0.88, 1.0];
    private const double SubjectEffectSd = 1.85;
    private const double VisitNoiseSd = 1.15;
    private const double VisitNoiseCorrelation = 0.5;
    private const double MissedVisitChance = 0.03;
    private const double RepeatAssessmentChance = 0.006;

    public static void Simulate(DemoSubject subject, int[] attendedVisitDays, Xoshiro256StarStar random)
    {
        var baseline = subject.ItchBaselineTenths;
        // Baseline is the mean of the 7 diary days before randomization, dated the day before it.
        subject.ItchAssessments.Add(new ItchAssessment("Baseline", 0, subject.RandomizationDate.AddDays(-1), baseline, true, true));

        var subjectEffect = random.Normal(0, SubjectEffectSd);
        // Subjects who stop for lack of efficacy are, by construction, those responding poorly.
        if (subject.DiscontinuationReason == DispositionSimulator.LackOfEfficacy)
            subjectEffect = Math.Abs(subjectEffect) + 0.5;

        var noise = 0.0;
        for (var v = 0; v < attendedVisitDays.Length; v++)
        {
            var fresh = random.Normal(0, VisitNoiseSd);
            noise = v == 0 ? fresh : VisitNoiseCorrelation * noise + Math.Sqrt(1 - VisitNoiseCorrelation * VisitNoiseCorrelation) * fresh;
            var change = Ramp[v] * (Week12MeanChange[subject.Arm.Index] + subjectEffect) + noise;
            var value = Math.Clamp((int)Math.Round((baseline / 10.0 + change) * 10.0, MidpointRounding.AwayFromZero), 0, 100);

            var missed = random.Chance(MissedVisitChance);
            var repeated = random.Chance(RepeatAssessmentChance);
            if (missed) continue;

            var visit = StudySchedule.PostBaselineVisits[v];
            var date = subject.TreatmentStart!.Value.AddDays(attendedVisitDays[v] - 1);
            subject.ItchAssessments.Add(new ItchAssessment(visit.Name, visit.Number, date, value, false, true));

            var repeatDate = date.AddDays(random.NextInt(1, 4));
            if (repeated && repeatDate <= subject.EndOfStudy)
            {
                var repeatValue = Math.Clamp(value + (int)Math.Round(random.Normal(0, 4.0), MidpointRounding.AwayFromZero), 0, 100);
                subject.ItchAssessments.Add(new ItchAssessment(visit.Name, visit.Number, repeatDate, repeatValue, false, false));
            }
        }
    }
}
