using OutputForge.Tests.Support;

namespace OutputForge.Tests.Validation;

/// <summary>
/// A test that needs the public CDISC pilot data and its published values beside the repository
/// (../shared/data/cdiscpilot01/csv and ../shared/reference/cdiscpilot01-demographics.md); it is
/// skipped, with a message saying so, where they are absent. The data is never copied into the repository.
/// </summary>
public sealed class CdiscPilotDataFactAttribute : FactAttribute
{
    public CdiscPilotDataFactAttribute()
    {
        if (CdiscPilotFiles.DataFolder is null || CdiscPilotFiles.ReferenceFile is null)
        {
            Skip = "CDISC pilot data or its published values not found at ../shared/data/cdiscpilot01/csv and " +
                   "../shared/reference/cdiscpilot01-demographics.md beside the repository; the validation against the published study report is skipped.";
        }
    }
}

/// <summary>Where the shared CDISC pilot files are, or null.</summary>
public static class CdiscPilotFiles
{
    public static string? DataFolder => RepositoryRoot.Shared("data/cdiscpilot01/csv/adsl.csv") is null ? null : RepositoryRoot.Shared("data/cdiscpilot01/csv");
    public static string? ReferenceFile => RepositoryRoot.Shared("reference/cdiscpilot01-demographics.md");
    public static string Specs => Path.Combine(RepositoryRoot.Path, "specs", "validation", "cdiscpilot01");
}
