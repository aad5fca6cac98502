namespace OutputForge.Demo;

/// <summary>
/// The subject global impression of change in itch (7 points) at Weeks 4, 8 and 12, answered at each
/// attended visit with an itch score used for analysis. The latent impression follows the subject's
/// own relative itch change: 4 + 4 x (value - baseline) / baseline plus normal noise (SD 0.7), rounded
/// half away from zero and kept within 1-7, so that it agrees with the itch trajectory but not
/// perfectly. Subjects who leave the study early get LOCF records at the later impression visits,
/// carrying their last observed impression. Draws come from a stream of their own, so the other
/// stages of the demo study are unchanged by this one.
/// </summary>
internal static class ImpressionOfChangeSimulator
{
    /// <summary>Stream purpose for SplitMix64.Derive; the generator's own stages use 1 to 4.</summary>
    private const ulong Stream = 5;
    private const double NoiseSd = 0.7;
    private const double SlopePerRelativeChange = 4.0;

    public static readonly int[] VisitNumbers = [4, 8, 12];

    public static List<ImpressionOfChange> Simulate(DemoSubject subject, ulong seed, ulong index)
    {
        var random = new Xoshiro256StarStar(SplitMix64.Derive(seed, Stream, index));
        var baseline = subject.ItchBaselineTenths;
        var impressions = new List<ImpressionOfChange>(VisitNumbers.Length);
        foreach (var number in VisitNumbers)
        {
            var assessment = subject.ItchAssessments.Find(a => !a.IsBaseline && a.IsAnalysisRecord && a.VisitNumber == number);
            // One draw per visit whether or not it is used, so each visit's draw does not depend on the others' attendance.
            var noise = random.Normal(0, NoiseSd);
            if (assessment is null)
            {
                continue;
            }
            var relativeChange = baseline == 0 ? 0.0 : (assessment.ValueTenths - baseline) / (double)baseline;
            var latent = 4.0 + SlopePerRelativeChange * relativeChange + noise;
            var category = Math.Clamp((int)Math.Round(latent, MidpointRounding.AwayFromZero), 1, 7);
            impressions.Add(new ImpressionOfChange(assessment.VisitName, number, assessment.Date, category, false));
        }
        if (!subject.Completed && impressions.Count > 0)
        {
            var last = impressions[^1];
            foreach (var number in VisitNumbers.Where(n => n > last.VisitNumber))
            {
                impressions.Add(last with { VisitName = StudySchedule.PostBaselineVisits.First(v => v.Number == number).Name, VisitNumber = number, Imputed = true });
            }
        }
        return impressions;
    }
}
