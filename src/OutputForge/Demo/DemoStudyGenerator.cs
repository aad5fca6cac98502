namespace OutputForge.Demo;

/// <summary>
/// Writes the invented study QF217-301 as four ADaM-style CSV datasets (adsl.csv, adeff.csv,
/// adae.csv, adtte.csv). The output depends only on the options: each stage draws from its own seeded
/// xoshiro256** stream (one per subject for the subject-level stages), so the same options give
/// byte-identical files on every run and machine.
/// </summary>
public static class DemoStudyGenerator
{
    private static readonly DateOnly FirstRandomization = new(2025, 2, 10);
    private const int EnrolmentPeriodDays = 420;

    // Stream purposes for SplitMix64.Derive; fixed numbers so that streams never change meaning.
    private const ulong EnrolmentStream = 1;
    private const ulong RandomizationStream = 2;
    private const ulong BaselineStream = 3;
    private const ulong OutcomeStream = 4;
    private const ulong PooledStream = 5;

    public static IReadOnlyList<string> WriteCsv(string folder, DemoStudyOptions? options = null)
    {
        options ??= new DemoStudyOptions();
        if (options.Subjects < 1 || options.Subjects > DemoStudyOptions.MaxSubjects)
            throw new DemoStudyException(
                $"The demo study needs between 1 and {DemoStudyOptions.MaxSubjects} subjects; {options.Subjects} was given.");
        if (string.IsNullOrWhiteSpace(folder))
            throw new DemoStudyException("No output folder was given for the demo study.");

        if (options.LoadCopies < 0 || options.LoadCopies > 99)
            throw new DemoStudyException($"The demo study takes 0 to 99 load copies; {options.LoadCopies} was given.");
        if (options.Pooled is { } scale && (scale.WeeklyParameters < 0 || scale.WeeklyParameters > WeeklyEfficacyParameter.All.Count
                || scale.ExtraEventsPerSubject < 0 || scale.ExtraEventsPerSubject > 100))
            throw new DemoStudyException(
                $"The pooled demo study takes 0 to {WeeklyEfficacyParameter.All.Count} weekly parameters and 0 to 100 extra adverse events per subject.");
        var subjects = Simulate(options);
        try
        {
            Directory.CreateDirectory(folder);
            AdslCsv.Write(Path.Combine(folder, AdslCsv.FileName), subjects);
            AdeffCsv.Write(Path.Combine(folder, AdeffCsv.FileName), subjects, options.LoadCopies);
            AdaeCsv.Write(Path.Combine(folder, AdaeCsv.FileName), subjects);
            AdtteCsv.Write(Path.Combine(folder, AdtteCsv.FileName), subjects);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or NotSupportedException or ArgumentException)
        {
            throw new DemoStudyException($"Cannot write the demo study into '{folder}': {e.Message}", e);
        }
        return [AdslCsv.FileName, AdeffCsv.FileName, AdaeCsv.FileName, AdtteCsv.FileName];
    }

    /// <summary>All subjects, simulated and sorted by USUBJID as the datasets list them.</summary>
    internal static List<DemoSubject> Simulate(DemoStudyOptions options)
    {
        var subjects = Enrol(options);

        for (var i = 0; i < subjects.Count; i++)
            BaselineSimulator.Simulate(subjects[i], new Xoshiro256StarStar(SplitMix64.Derive(options.Seed, BaselineStream, (ulong)i)));

        // Randomization in order of enrolment, within stratum = region (as entered) x severity.
        var randomizer = new StratifiedBlockRandomizer(new Xoshiro256StarStar(SplitMix64.Derive(options.Seed, RandomizationStream, 0)));
        foreach (var subject in subjects)
            subject.Arm = TreatmentArm.All[randomizer.Next(subject.StratumRegion + "|" + subject.Severity)];

        for (var i = 0; i < subjects.Count; i++)
        {
            var subject = subjects[i];
            var random = new Xoshiro256StarStar(SplitMix64.Derive(options.Seed, OutcomeStream, (ulong)i));
            var visitDays = DispositionSimulator.Simulate(subject, random);
            ItchTrajectorySimulator.Simulate(subject, visitDays, random);
            AdverseEventSimulator.Simulate(subject, random);
            subject.ImpressionsOfChange = ImpressionOfChangeSimulator.Simulate(subject, options.Seed, (ulong)i);
            if (options.Pooled is { } pooled)
                PooledStudySimulator.Simulate(subject, pooled, new Xoshiro256StarStar(SplitMix64.Derive(options.Seed, PooledStream, (ulong)i)));
        }

        subjects.Sort((a, b) => string.CompareOrdinal(a.UniqueSubjectId, b.UniqueSubjectId));
        return subjects;
    }

    /// <summary>Site and randomization date of each subject, numbered within site in order of enrolment.</summary>
    private static List<DemoSubject> Enrol(DemoStudyOptions options)
    {
        var random = new Xoshiro256StarStar(SplitMix64.Derive(options.Seed, EnrolmentStream, 0));
        var sites = StudySite.All;
        var weights = sites.Select(s => s.EnrolmentWeight).ToArray();

        var draws = new (int Day, int Site)[options.Subjects];
        for (var i = 0; i < draws.Length; i++)
        {
            // Recruitment accelerates as sites open: day = period x sqrt(u) gives a rising rate.
            var day = (int)(EnrolmentPeriodDays * Math.Sqrt(random.NextDouble()));
            draws[i] = (day, random.WeightedIndex(weights));
        }
        var order = Enumerable.Range(0, draws.Length).OrderBy(i => draws[i].Day).ThenBy(i => i).ToArray();

        var countAtSite = new int[sites.Count];
        var subjects = new List<DemoSubject>(draws.Length);
        foreach (var i in order)
        {
            var site = draws[i].Site;
            subjects.Add(new DemoSubject
            {
                Site = sites[site],
                NumberAtSite = ++countAtSite[site],
                RandomizationDate = FirstRandomization.AddDays(draws[i].Day),
            });
        }
        return subjects;
    }
}
