using OutputForge.Tests.Support;

namespace OutputForge.Tests.Oracles;

/// <summary>A fact that needs the CDISC pilot study in ../shared/data/cdiscpilot01/csv; skipped with a message when absent.</summary>
public sealed class PilotDataFactAttribute : FactAttribute
{
    public const string Folder = "data/cdiscpilot01/csv";

    public PilotDataFactAttribute()
    {
        if (RepositoryRoot.Shared(Folder + "/adsl.csv") is null)
        {
            Skip = $"../shared/{Folder} is not present, so the check against the CDISC pilot study was not run.";
        }
    }
}
