using OutputForge.Files;

namespace OutputForge.Spec;

/// <summary>
/// Which folders a spec may make OutputForge read: its own folder tree, plus folders the user
/// names on the command line. A spec from elsewhere (e.g. received with a data transfer) cannot
/// point the tool at arbitrary files of the machine. Paths are compared after resolving every
/// symbolic link (<see cref="RealPath"/>), so a link inside the spec tree that leads out of the
/// allowed folders is refused like a path that names the outside file directly.
/// </summary>
public sealed class SpecFolderPolicy
{
    private readonly List<string> _allowed;

    public SpecFolderPolicy(string specFolder, IEnumerable<string>? allowedFolders = null)
    {
        SpecFolder = Path.GetFullPath(specFolder).TrimEnd(Path.DirectorySeparatorChar);
        _allowed = [RealPath.Of(specFolder), .. (allowedFolders ?? []).Select(RealPath.Of)];
    }

    /// <summary>The spec's folder as the user named it (for messages).</summary>
    public string SpecFolder { get; }

    /// <summary>The allowed folders, links resolved.</summary>
    public IReadOnlyList<string> Folders => _allowed;

    public bool Allows(string path)
    {
        var real = RealPath.Of(path);
        return _allowed.Any(folder => RealPath.IsInside(real, folder));
    }

    /// <summary>True when <paramref name="path"/> is a symbolic link somewhere along its way (to say "link" in messages).</summary>
    public static bool GoesThroughLink(string path) => RealPath.Of(path) != Path.GetFullPath(path).TrimEnd(Path.DirectorySeparatorChar);

    public string Explain(string relative) =>
        $"'{relative}' is outside the spec's folder {SpecFolder}{(GoesThroughLinkSafe(relative) ? " (through a symbolic link)" : string.Empty)}; " +
        "specs may only read files inside their own folder tree (allow another folder with --allow-folder)";

    private bool GoesThroughLinkSafe(string relative)
    {
        try
        {
            return GoesThroughLink(Path.Combine(SpecFolder, relative));
        }
        catch (IOException)
        {
            return true;
        }
    }
}
