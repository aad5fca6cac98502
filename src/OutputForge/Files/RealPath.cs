namespace OutputForge.Files;

/// <summary>
/// A path with every symbolic link resolved, as the operating system will follow it: the folder checks of the sandbox
/// and the run lock compare these, so a link cannot make a file outside a folder look inside it, and two spellings of
/// one folder (one through a link) are one folder. The part of the path that does not exist yet is kept as written.
/// </summary>
public static class RealPath
{
    /// <summary>The links followed before giving up, as the Linux kernel does (common practice: ELOOP after 40).</summary>
    public const int MaxLinks = 40;

    private static readonly char[] Separators = [Path.DirectorySeparatorChar, Path.AltDirectorySeparatorChar];

    public static string Of(string path)
    {
        // Not Path.GetFullPath: it removes "x/.." before x is resolved, which is wrong when x is a link.
        var full = Path.IsPathFullyQualified(path) ? path : Path.Combine(Directory.GetCurrentDirectory(), path);
        var root = Path.GetPathRoot(full) ?? string.Empty;
        var pending = new Stack<string>(Parts(full[root.Length..]).Reverse());
        var current = root;
        var links = 0;
        while (pending.Count > 0)
        {
            var part = pending.Pop();
            if (part == ".")
            {
                continue;
            }
            if (part == "..")
            {
                // The folder walked so far holds no links, so its parent is the real parent.
                current = Path.GetDirectoryName(current) ?? current;
                continue;
            }
            var next = Path.Combine(current, part);
            var target = LinkTarget(next);
            if (target is null)
            {
                current = next;
                continue;
            }
            if (++links > MaxLinks)
            {
                throw new IOException($"{path}: too many levels of symbolic links");
            }
            if (Path.IsPathRooted(target))
            {
                current = Path.GetPathRoot(target) ?? root;
                target = target[current.Length..];
            }
            foreach (var linked in Parts(target).Reverse())
            {
                pending.Push(linked);
            }
        }
        return current;
    }

    /// <summary>True when <paramref name="path"/> is <paramref name="folder"/> or inside it (both already real paths).</summary>
    public static bool IsInside(string path, string folder)
    {
        var trimmed = folder.TrimEnd(Separators);
        return path == trimmed || path.StartsWith(trimmed + Path.DirectorySeparatorChar, StringComparison.Ordinal)
            || (trimmed.Length == 0 && path.StartsWith(Path.DirectorySeparatorChar));
    }

    private static string? LinkTarget(string path)
    {
        try
        {
            return new FileInfo(path).LinkTarget;
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            // A part that cannot be inspected (no permission to list its folder) is taken as written; opening it
            // fails later with its own message.
            return null;
        }
    }

    private static IEnumerable<string> Parts(string path) => path.Split(Separators, StringSplitOptions.RemoveEmptyEntries);
}
