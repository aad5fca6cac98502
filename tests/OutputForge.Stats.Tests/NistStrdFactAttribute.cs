namespace OutputForge.Stats.Tests;

/// <summary>A theory that is skipped, with a message, where the shared NIST StRD files are absent (a clone elsewhere).</summary>
public sealed class NistStrdTheoryAttribute : TheoryAttribute
{
    public NistStrdTheoryAttribute()
    {
        if (NistAnovaFile.Folder() is null)
        {
            Skip = "NIST StRD files not found at ../shared/reference/nist-strd beside the repository; the ANOVA certification test needs them.";
        }
    }
}
