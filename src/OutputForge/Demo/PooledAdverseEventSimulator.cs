namespace OutputForge.Demo;

/// <summary>
/// The pooled study's further adverse events of a dosed subject: a Poisson process over the subject's
/// participation with the given mean over the full 98 days, each event's term drawn with weights equal
/// to the arm's catalogue incidences, its details drawn as for the ordinary events.
/// </summary>
internal static class PooledAdverseEventSimulator
{
    private const double PlannedParticipationDays = 98.0;

    public static void Simulate(DemoSubject subject, double eventsPerSubject, Xoshiro256StarStar random)
    {
        if (!subject.Dosed || eventsPerSubject <= 0) return;
        var start = subject.TreatmentStart!.Value;
        var windowDays = subject.EndOfStudy.DayNumber - start.DayNumber + 1;
        var dailyRate = eventsPerSubject / PlannedParticipationDays;
        var day = random.Exponential(dailyRate);
        while (day < windowDays)
        {
            var term = AdverseEventSimulator.PickTerm(subject.Arm.Index, random, boostDrugRelated: false);
            AdverseEventSimulator.AddEvent(subject, term, start.AddDays((int)day), random, forcedSevere: false);
            day += random.Exponential(dailyRate);
        }
    }
}
