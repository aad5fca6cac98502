namespace OutputForge.Demo;

/// <summary>The pooled study's additions for one subject, drawn from the subject's own pooled stream after the ordinary stages.</summary>
internal static class PooledStudySimulator
{
    public static void Simulate(DemoSubject subject, PooledStudyOptions options, Xoshiro256StarStar random)
    {
        WeeklyEfficacySimulator.Simulate(subject, options.WeeklyParameters, random);
        PooledAdverseEventSimulator.Simulate(subject, options.ExtraEventsPerSubject, random);
    }
}
