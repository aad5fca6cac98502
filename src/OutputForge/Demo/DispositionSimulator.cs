namespace OutputForge.Demo;

/// <summary>
/// Dosing, completion and reason for discontinuation. Invented rates: about 1% never dosed and about
/// 13% of dosed subjects discontinuing within 12 weeks, with more adverse-event discontinuations at
/// 30 mg and more lack of efficacy on placebo.
/// </summary>
internal static class DispositionSimulator
{
    public const string AdverseEvent = "ADVERSE EVENT";
    public const string LackOfEfficacy = "LACK OF EFFICACY";
    public const string Withdrawal = "WITHDRAWAL BY SUBJECT";
    public const string LostToFollowUp = "LOST TO FOLLOW-UP";
    public const string PhysicianDecision = "PHYSICIAN DECISION";

    private static readonly string[] Reasons = [AdverseEvent, LackOfEfficacy, Withdrawal, LostToFollowUp, PhysicianDecision];

    // Percent of dosed subjects discontinuing for each reason (Reasons order), by arm index.
    private static readonly double[][] ReasonPercents =
    [
        [1.8, 5.0, 4.0, 2.0, 1.0],
        [3.0, 2.5, 3.5, 1.5, 0.6],
        [7.0, 1.4, 3.5, 2.0, 0.9],
    ];

    /// <summary>Fills dosing and disposition and returns the study days of the visits the subject will attend.</summary>
    public static int[] Simulate(DemoSubject subject, Xoshiro256StarStar random)
    {
        var visitDays = new int[StudySchedule.PostBaselineVisits.Count];
        for (var v = 0; v < visitDays.Length; v++)
        {
            var visit = StudySchedule.PostBaselineVisits[v];
            visitDays[v] = visit.TargetDay + random.NextInt(-visit.WindowDays, visit.WindowDays);
        }

        if (random.Chance(0.01))
        {
            subject.Dosed = false;
            subject.Completed = false;
            subject.DiscontinuationReason = random.Chance(0.65) ? Withdrawal : PhysicianDecision;
            subject.EndOfStudy = subject.RandomizationDate.AddDays(random.NextInt(0, 3));
            return [];
        }

        subject.Dosed = true;
        var start = subject.RandomizationDate.AddDays(random.Chance(0.85) ? 0 : 1);
        subject.TreatmentStart = start;
        var week12Day = visitDays[^1];

        var percents = ReasonPercents[subject.Arm.Index];
        var draw = random.NextDouble() * 100.0;
        var reasonIndex = -1;
        for (var r = 0; r < percents.Length && reasonIndex < 0; r++)
        {
            draw -= percents[r];
            if (draw < 0) reasonIndex = r;
        }

        if (reasonIndex < 0)
        {
            subject.Completed = true;
            subject.TreatmentEnd = start.AddDays(week12Day - 2);
            subject.EndOfStudy = start.AddDays(week12Day - 1 + StudySchedule.FollowUpDays + random.NextInt(-2, 2));
            return visitDays;
        }

        var reason = Reasons[reasonIndex];
        var lastDay = week12Day - 1;
        var discontinuationDay = reason switch
        {
            // Adverse-event dropouts cluster early in treatment; lack of efficacy is judged after a month.
            AdverseEvent => Math.Min(lastDay, 2 + (int)random.Exponential(1.0 / 25.0)),
            LackOfEfficacy => random.NextInt(Math.Min(26, lastDay), lastDay),
            _ => random.NextInt(2, lastDay),
        };

        subject.Completed = false;
        subject.DiscontinuationReason = reason;
        subject.EndOfStudy = start.AddDays(discontinuationDay - 1);
        var lastDose = subject.EndOfStudy.AddDays(-random.NextInt(0, 2));
        subject.TreatmentEnd = lastDose < start ? start : lastDose;
        return visitDays.Where(day => day <= discontinuationDay).ToArray();
    }
}
