namespace OutputForge.Pipeline;

/// <summary>
/// Keeps two runs from writing the same output folder at once: an exclusive lock on a hidden
/// file beside the folder, held for the whole run. The file stays after the run (deleting it
/// could let a waiting run and a new one both believe they hold it).
/// </summary>
public sealed class OutputLock : IDisposable
{
    private readonly FileStream _stream;

    private OutputLock(FileStream stream)
    {
        _stream = stream;
    }

    public static OutputLock Acquire(string outputFolder)
    {
        var full = Path.GetFullPath(outputFolder).TrimEnd(Path.DirectorySeparatorChar);
        var parent = Path.GetDirectoryName(full) ?? throw new RunException($"{outputFolder}: cannot write into the root folder");
        var path = Path.Combine(parent, $".{Path.GetFileName(full)}.lock");
        try
        {
            Directory.CreateDirectory(parent);
            return new OutputLock(new FileStream(path, FileMode.OpenOrCreate, FileAccess.ReadWrite, FileShare.None));
        }
        catch (IOException)
        {
            throw new RunException($"{outputFolder}: another OutputForge run is writing to this folder (lock {path}); wait for it to finish and run again");
        }
        catch (UnauthorizedAccessException e)
        {
            throw new RunException($"{outputFolder}: cannot write beside the output folder ({e.Message})");
        }
    }

    public void Dispose() => _stream.Dispose();
}
