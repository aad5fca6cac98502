namespace OutputForge.Tests.Support;

/// <summary>Finds the repository root (the folder with OutputForge.sln) from the test's run folder.</summary>
public static class RepositoryRoot
{
    public static string Path { get; } = Find();

    private static string Find()
    {
        var folder = new DirectoryInfo(AppContext.BaseDirectory);
        while (folder is not null && !File.Exists(System.IO.Path.Combine(folder.FullName, "OutputForge.sln")))
        {
            folder = folder.Parent;
        }
        return folder?.FullName ?? throw new InvalidOperationException("OutputForge.sln not found above " + AppContext.BaseDirectory);
    }

    /// <summary>The shared folder beside the repository (public reference data), or null when absent.</summary>
    public static string? Shared(string relative)
    {
        var path = System.IO.Path.GetFullPath(System.IO.Path.Combine(Path, "..", "shared", relative));
        return File.Exists(path) || Directory.Exists(path) ? path : null;
    }
}
