using System.Runtime.CompilerServices;

namespace OutputForge.Tests.Rendering;

/// <summary>
/// The repository root: the first folder holding OutputForge.sln above the test binaries, or
/// else above this source file (when the tests are built from another output folder).
/// </summary>
public static class RepositoryRoot
{
    public static string Find() => FindAbove(AppContext.BaseDirectory) ?? FindAbove(SourceFolder())
        ?? throw new InvalidOperationException("OutputForge.sln not found above " + AppContext.BaseDirectory);

    private static string? FindAbove(string start)
    {
        for (var dir = new DirectoryInfo(start); dir is not null; dir = dir.Parent)
        {
            if (File.Exists(Path.Combine(dir.FullName, "OutputForge.sln")))
                return dir.FullName;
        }
        return null;
    }

    private static string SourceFolder([CallerFilePath] string path = "") => Path.GetDirectoryName(path) ?? ".";
}
