namespace OutputForge.Pipeline;

/// <summary>
/// Collects a run's files in a staging folder beside the output folder and moves them into place
/// only when the whole run has succeeded, so a failed run leaves the previous outputs untouched
/// and no half-written file behind.
/// </summary>
public sealed class OutputStaging : IDisposable
{
    private readonly string _outputFolder;
    private readonly List<string> _files = [];

    public OutputStaging(string outputFolder)
    {
        _outputFolder = Path.GetFullPath(outputFolder);
        var parent = Path.GetDirectoryName(_outputFolder.TrimEnd(Path.DirectorySeparatorChar))
            ?? throw new RunException($"{outputFolder}: cannot write into the root folder");
        try
        {
            Directory.CreateDirectory(parent);
            RemoveLeftovers(parent, Path.GetFileName(_outputFolder));
            Folder = Path.Combine(parent, $".{Path.GetFileName(_outputFolder)}.staging-{Environment.ProcessId}-{Guid.NewGuid():N}");
            Directory.CreateDirectory(Folder);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            throw new RunException($"{outputFolder}: cannot create the output folder ({e.Message})");
        }
    }

    /// <summary>
    /// Deletes staging folders that a killed run left behind. Only called while this run holds the
    /// output folder's <see cref="OutputLock"/>, so no other run can be using them.
    /// </summary>
    private static void RemoveLeftovers(string parent, string outputName)
    {
        foreach (var leftover in Directory.GetDirectories(parent, $".{outputName}.staging-*"))
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

    /// <summary>The staging folder itself.</summary>
    public string Folder { get; }

    /// <summary>Opens a new staged file for writing. <paramref name="fileName"/> must be a plain file name.</summary>
    public Stream Create(string fileName)
    {
        if (fileName != Path.GetFileName(fileName) || fileName is "." or ".." || fileName.Length == 0)
        {
            throw new RunException($"'{fileName}' is not a plain file name for the output folder");
        }
        _files.Add(fileName);
        return new FileStream(Path.Combine(Folder, fileName), FileMode.CreateNew, FileAccess.ReadWrite);
    }

    public IReadOnlyList<string> Files => _files;

    /// <summary>Moves every staged file into the output folder, replacing files of the same name.</summary>
    public IReadOnlyList<string> Commit()
    {
        try
        {
            Directory.CreateDirectory(_outputFolder);
            var placed = new List<string>();
            foreach (var file in _files)
            {
                var target = Path.Combine(_outputFolder, file);
                File.Move(Path.Combine(Folder, file), target, overwrite: true);
                placed.Add(target);
            }
            return placed;
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            throw new RunException($"{_outputFolder}: cannot move the outputs into place ({e.Message})");
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
            // Leaving an empty staging folder behind is harmless; the outputs are already in place or untouched.
        }
    }
}
