using OutputForge.Spec;
using OutputForge.Stats.Exact;

namespace OutputForge.Analysis;

/// <summary>
/// The Monte Carlo settings Fisher's exact test falls back to beyond exact enumeration, from the study's "exactTests";
/// null when the study asks for NE instead. Without "exactTests" the estimate is used with the default samples and seed
/// (docs/methods.md): a p-value with a stated 99% interval tells a reader more than NE, and the footnote says what it is.
/// </summary>
public static class ExactTestFallback
{
    public static FisherMonteCarloSettings? For(StudySpec study)
    {
        var settings = study.ExactTests ?? new ExactTestSettings();
        if (settings.Fallback == ExactTestSettings.NotEstimable)
        {
            return null;
        }
        return new FisherMonteCarloSettings(settings.Samples ?? FisherMonteCarloSettings.DefaultSamples,
            settings.Seed is { } seed ? (ulong)seed : FisherMonteCarloSettings.DefaultSeed);
    }
}
