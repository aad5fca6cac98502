using OutputForge.Tests.Support;

namespace OutputForge.Tests.Validation;

/// <summary>
/// A test that needs the public CDISC pilot ADSL and ADQSCIBC beside the repository
/// (../shared/data/cdiscpilot01/csv); skipped, with a message saying so, where they are absent.
/// </summary>
public sealed class CdiscPilotCibicFactAttribute : FactAttribute
{
    public static string? DataFolder =>
        RepositoryRoot.Shared("data/cdiscpilot01/csv/adqscibc.csv") is null || RepositoryRoot.Shared("data/cdiscpilot01/csv/adsl.csv") is null
            ? null
            : RepositoryRoot.Shared("data/cdiscpilot01/csv");

    public CdiscPilotCibicFactAttribute()
    {
        if (DataFolder is null)
        {
            Skip = "CDISC pilot adsl.csv and adqscibc.csv not found at ../shared/data/cdiscpilot01/csv beside the repository; " +
                   "the stratified responder check against R's mantelhaen.test is skipped.";
        }
    }
}
