using OutputForge.Tests.Support;

namespace OutputForge.Tests.Data.Formats;

/// <summary>
/// A fact that needs the CDISC pilot study's XPT, Dataset-JSON and CSV files in ../shared/data/cdiscpilot01; skipped
/// with a message when they are absent.
/// </summary>
public sealed class PilotFormatsFactAttribute : FactAttribute
{
    public const string Folder = "data/cdiscpilot01";

    public PilotFormatsFactAttribute()
    {
        if (RepositoryRoot.Shared(Folder + "/xpt/adsl.xpt") is null || RepositoryRoot.Shared(Folder + "/dataset-json/adsl.json") is null
            || RepositoryRoot.Shared(Folder + "/csv/adsl.csv") is null)
        {
            Skip = $"../shared/{Folder} (xpt, dataset-json, csv) is not present, so the checks against the CDISC pilot files were not run.";
        }
    }

    public static string PathOf(string relative) => RepositoryRoot.Shared(Folder + "/" + relative)!;
}
