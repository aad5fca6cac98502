namespace OutputForge.Pipeline;

/// <summary>
/// Builds the complete new output folder beside the old one and puts it in place by renaming folders, so the output
/// folder holds either the whole previous package or the whole new one, never a mixture.
/// </summary>
/// <remarks>
/// <para>The run writes its files into <c>.{out}.staging-*</c> beside the output folder. <see cref="Commit"/> copies in
/// every file of the previous output folder that the run does not replace (other tables' files after a run with
/// <c>--tables</c>, the user's own files), then swaps: the old folder is renamed to <c>.{out}.previous-*</c>, the
/// staging folder to the output folder's name, and the old folder is deleted. A failure before the second rename
/// leaves the previous folder in place (it is renamed back if the first rename had happened).</para>
/// <para>A run killed between the two renames leaves no output folder, only <c>.{out}.previous-*</c> (the complete
/// previous package) and the staging folder; the next run into the folder (holding the <see cref="OutputLock"/>)
/// renames the previous package back before it starts, and deletes the leftovers. Only called while the run holds the
/// output folder's lock, so no other run is using these folders.</para>
/// </remarks>
public sealed class OutputStaging : IDisposable
{
    private readonly string _named;
    private readonly string _outputFolder;
    private readonly string _parent;
    private readonly string _name;
    private readonly List<string> _files = [];

    public OutputStaging(string outputFolder)
    {
        _named = outputFolder;
        _outputFolder = OutputPlace.Resolve(outputFolder);
        _parent = Path.GetDirectoryName(_outputFolder)!;
        _name = Path.GetFileName(_outputFolder);
        OutputPlace.CreateParent(outputFolder, _parent);
        try
        {
            Recover(_parent, _name);
            Folder = Path.Combine(_parent, $".{_name}.staging-{Environment.ProcessId}-{Guid.NewGuid():N}");
            Directory.CreateDirectory(Folder);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            throw OutputPlace.CannotWrite(outputFolder, _parent, e);
        }
    }

    /// <summary>The staging folder itself.</summary>
    public string Folder { get; }

    /// <summary>A test's way to make a step of <see cref="Commit"/> fail ("carry", "set aside", "swap"), as a full disk or a locked file would.</summary>
    internal Action<string>? BeforeStep { get; init; }

    /// <summary>
    /// Puts back the previous package a run killed between its two renames left aside, and deletes what killed runs
    /// left behind (staging folders, set-aside packages of a finished swap).
    /// </summary>
    public static void Recover(string parent, string outputName)
    {
        var output = Path.Combine(parent, outputName);
        var setAside = Directory.GetDirectories(parent, $".{outputName}.previous-*").Order(StringComparer.Ordinal).ToList();
        if (!Directory.Exists(output) && !File.Exists(output) && setAside.Count > 0)
        {
            Directory.Move(setAside[^1], output);
            setAside.RemoveAt(setAside.Count - 1);
        }
        foreach (var leftover in setAside.Concat(Directory.GetDirectories(parent, $".{outputName}.staging-*")))
        {
            try
            {
                Directory.Delete(leftover, recursive: true);
            }
            catch (IOException)
            {
                // A leftover that cannot be removed now is retried by the next run; it never reaches the outputs.
            }
        }
    }

    /// <summary>Opens a new staged file for writing. <paramref name="fileName"/> must be a plain file name.</summary>
    public Stream Create(string fileName)
    {
        if (fileName != Path.GetFileName(fileName) || fileName is "." or ".." || fileName.Length == 0)
        {
            throw new RunException($"'{fileName}' is not a plain file name for the output folder");
        }
        _files.Add(fileName);
        try
        {
            return new FileStream(Path.Combine(Folder, fileName), FileMode.CreateNew, FileAccess.ReadWrite);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            throw new RunException($"{_named}: cannot write {fileName} into the staging folder {Folder} ({e.Message})");
        }
    }

    public IReadOnlyList<string> Files => _files;

    /// <summary>
    /// Completes the staged folder with the previous folder's other files and swaps it in for the output folder;
    /// returns the paths of the files this run wrote.
    /// </summary>
    public IReadOnlyList<string> Commit()
    {
        var setAside = Path.Combine(_parent, $".{_name}.previous-{Environment.ProcessId}-{Guid.NewGuid():N}");
        var hadPrevious = Directory.Exists(_outputFolder);
        try
        {
            BeforeStep?.Invoke("carry");
            if (hadPrevious)
            {
                CarryOver(_outputFolder, Folder, new HashSet<string>(_files, StringComparer.Ordinal));
            }
            BeforeStep?.Invoke("set aside");
            if (hadPrevious)
            {
                Directory.Move(_outputFolder, setAside);
            }
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            throw new RunException($"{_named}: cannot put the outputs in place ({e.Message}); the previous outputs are unchanged");
        }
        try
        {
            BeforeStep?.Invoke("swap");
            Directory.Move(Folder, _outputFolder);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            if (hadPrevious)
            {
                try
                {
                    Directory.Move(setAside, _outputFolder);
                }
                catch (Exception back) when (back is IOException or UnauthorizedAccessException)
                {
                    throw new RunException($"{_named}: cannot put the outputs in place ({e.Message}), nor the previous outputs back " +
                        $"({back.Message}); they are complete in {setAside}, and the next run into {_named} puts them back");
                }
            }
            throw new RunException($"{_named}: cannot put the outputs in place ({e.Message}); the previous outputs are unchanged");
        }
        if (hadPrevious)
        {
            try
            {
                Directory.Delete(setAside, recursive: true);
            }
            catch (Exception e) when (e is IOException or UnauthorizedAccessException)
            {
                // The new package is in place; the set-aside old one is deleted by the next run.
            }
        }
        return _files.Select(f => Path.Combine(_outputFolder, f)).ToList();
    }

    /// <summary>Copies the previous folder's entries that the run does not replace into the staged folder.</summary>
    private static void CarryOver(string from, string to, IReadOnlySet<string> replaced)
    {
        foreach (var entry in new DirectoryInfo(from).EnumerateFileSystemInfos())
        {
            if (replaced.Contains(entry.Name))
            {
                continue;
            }
            var target = Path.Combine(to, entry.Name);
            if (entry.LinkTarget is { } link)
            {
                // A link is carried as the link, not as what it points at.
                if (entry is DirectoryInfo)
                {
                    Directory.CreateSymbolicLink(target, link);
                }
                else
                {
                    File.CreateSymbolicLink(target, link);
                }
            }
            else if (entry is DirectoryInfo)
            {
                Directory.CreateDirectory(target);
                CarryOver(entry.FullName, target, new HashSet<string>());
            }
            else if (global::OutputForge.Files.RegularFile.NotRegular(entry.FullName) is { } kind)
            {
                throw new IOException($"{entry.FullName} is {kind}, which cannot be carried into the new output folder; remove it");
            }
            else
            {
                File.Copy(entry.FullName, target);
            }
        }
    }

    public void Dispose()
    {
        try
        {
            if (Directory.Exists(Folder))
            {
                Directory.Delete(Folder, recursive: true);
            }
        }
        catch (IOException)
        {
            // Leaving a staging folder behind is harmless; the outputs are already in place or untouched, and the next run deletes it.
        }
    }
}
