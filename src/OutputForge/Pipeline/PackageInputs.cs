using OutputForge.Spec;

namespace OutputForge.Pipeline;

/// <summary>
/// Where a package's inputs come from, decided by one code path for `run` and `check`, so that check
/// applies every rule a run applies: the data folder is --data as given, or the study's data.folder
/// when it lies inside the spec's folder tree or a folder allowed with --allow-folder.
/// </summary>
public static class PackageInputs
{
    /// <summary>The data folder a run reads; a spec problem (located in the study spec) when there is none it may read.</summary>
    public static string DataFolder(SpecPackage package, string? given) =>
        TryDataFolder(package, given, out var folder) is { } problem ? throw new SpecException(problem) : folder!;

    /// <summary>The data folder, or the problem that stops a run from reading one (null when there is none).</summary>
    public static SpecProblem? TryDataFolder(SpecPackage package, string? given, out string? folder)
    {
        folder = given;
        if (folder is not null)
        {
            return null;
        }
        var study = package.Study;
        if (study.Data.Folder is null)
        {
            return study.Source.Problem("/data", "no data folder: give --data on the command line or data.folder in the study spec");
        }
        var candidate = Path.GetFullPath(Path.Combine(study.Folder, study.Data.Folder));
        if (!package.Folders.Allows(candidate))
        {
            return study.Source.Problem("/data/folder", package.Folders.Explain(study.Data.Folder) + ", or give --data");
        }
        folder = candidate;
        return null;
    }
}
