namespace OutputForge.Stats.Tests;

/// <summary>
/// A fact that needs a file of the public reference folder beside the repository (../shared); the
/// test is skipped, with a message naming the file, when that folder or file is absent.
/// </summary>
public sealed class SharedFileFactAttribute : FactAttribute
{
    public SharedFileFactAttribute(string relativePath)
    {
        if (SharedFile.Find(relativePath) is null)
        {
            Skip = $"../shared/{relativePath} is not present, so this reference check was not run.";
        }
    }
}

/// <summary>Finds files of ../shared relative to the repository root.</summary>
internal static class SharedFile
{
    public static string? Find(string relativePath)
    {
        var path = System.IO.Path.GetFullPath(System.IO.Path.Combine(RepositoryRoot.Path, "..", "shared", relativePath));
        return File.Exists(path) ? path : null;
    }
}
