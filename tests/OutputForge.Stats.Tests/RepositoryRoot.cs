namespace OutputForge.Stats.Tests;

/// <summary>Finds the repository root (the folder holding OutputForge.sln) from the test binaries.</summary>
internal static class RepositoryRoot
{
    public static string Path { get; } = Find();

    private static string Find()
    {
        var directory = new DirectoryInfo(AppContext.BaseDirectory);
        while (directory is not null && !File.Exists(System.IO.Path.Combine(directory.FullName, "OutputForge.sln")))
        {
            directory = directory.Parent;
        }
        return directory?.FullName ?? throw new InvalidOperationException("OutputForge.sln was not found above the test output folder.");
    }
}
