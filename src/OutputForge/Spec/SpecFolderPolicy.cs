namespace OutputForge.Spec;

/// <summary>
/// Which folders a spec may make OutputForge read: its own folder tree, plus folders the user
/// names on the command line. A spec from elsewhere (e.g. received with a data transfer) cannot
/// point the tool at arbitrary files of the machine.
/// </summary>
public sealed class SpecFolderPolicy
{
    private readonly List<string> _allowed;

    public SpecFolderPolicy(string specFolder, IEnumerable<string>? allowedFolders = null)
    {
        SpecFolder = Normalize(specFolder);
        _allowed = [SpecFolder, .. (allowedFolders ?? []).Select(Normalize)];
    }

    public string SpecFolder { get; }

    public bool Allows(string path)
    {
        var full = Path.GetFullPath(path);
        return _allowed.Any(folder => full == folder.TrimEnd(Path.DirectorySeparatorChar) || full.StartsWith(folder, StringComparison.Ordinal));
    }

    public string Explain(string relative) =>
        $"'{relative}' is outside the spec's folder {SpecFolder.TrimEnd(Path.DirectorySeparatorChar)}; specs may only read files inside their own folder tree (allow another folder with --allow-folder)";

    private static string Normalize(string folder) =>
        Path.GetFullPath(folder).TrimEnd(Path.DirectorySeparatorChar) + Path.DirectorySeparatorChar;
}
