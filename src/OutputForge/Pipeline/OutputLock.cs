using OutputForge.Files;

namespace OutputForge.Pipeline;

/// <summary>
/// Keeps two runs from writing the same output folder at once: an exclusive lock on a hidden file beside the folder,
/// held for the whole run. The folder is the real one (<see cref="RealPath"/>), so two spellings of one folder (one of
/// them through a symbolic link) take the same lock.
/// </summary>
/// <remarks>
/// The lock file is removed when the run ends, while it is still locked. A second run may have opened the file just
/// before that and lock it just after, holding a lock on a file no longer in the folder while a third run creates a new
/// one; so after locking, a run checks that the file it locked is still the one in the folder, and tries again
/// otherwise. That check needs the Linux process file table (/proc/self/fd); where it is missing the file is left in
/// place after the run, as a harmless empty file.
/// </remarks>
public sealed class OutputLock : IDisposable
{
    private const int Attempts = 5;
    private readonly FileStream _stream;
    private readonly string _path;

    private OutputLock(FileStream stream, string path)
    {
        _stream = stream;
        _path = path;
    }

    /// <summary>The output folder with its links resolved: the folder the run writes, and stages and swaps beside.</summary>
    public string Folder { get; private init; } = string.Empty;

    public static OutputLock Acquire(string outputFolder)
    {
        var real = OutputPlace.Resolve(outputFolder);
        var parent = Path.GetDirectoryName(real)!;
        var path = Path.Combine(parent, $".{Path.GetFileName(real)}.lock");
        OutputPlace.CreateParent(outputFolder, parent);
        for (var attempt = 1; ; attempt++)
        {
            FileStream stream;
            try
            {
                stream = new FileStream(path, FileMode.OpenOrCreate, FileAccess.ReadWrite, FileShare.None);
            }
            catch (IOException e) when (IsHeldByAnother(e))
            {
                throw new RunException($"{outputFolder}: another OutputForge run is writing to this folder (lock {path}); wait for it to finish and run again");
            }
            catch (Exception e) when (e is IOException or UnauthorizedAccessException)
            {
                throw OutputPlace.CannotWrite(outputFolder, parent, e);
            }
            if (StillInFolder(stream) != false)
            {
                return new OutputLock(stream, path) { Folder = real };
            }
            stream.Dispose();
            if (attempt == Attempts)
            {
                throw new RunException($"{outputFolder}: another OutputForge run is writing to this folder (lock {path}); wait for it to finish and run again");
            }
        }
    }

    /// <summary>
    /// A lock held by another run, as the runtime reports it: EWOULDBLOCK from flock(2) on Unix (11 on Linux, 35 on
    /// macOS and the BSDs), a sharing or lock violation on Windows.
    /// </summary>
    private static bool IsHeldByAnother(IOException e) =>
        e.GetType() == typeof(IOException) && (e.HResult is 11 or 35 || (e.HResult & 0xFFFF) is 32 or 33);

    /// <summary>Whether the locked file is still the one in the folder, or null where this cannot be told.</summary>
    private static bool? StillInFolder(FileStream stream)
    {
        var link = $"/proc/self/fd/{stream.SafeFileHandle.DangerousGetHandle()}";
        try
        {
            return new FileInfo(link).LinkTarget is { } target ? !target.EndsWith(" (deleted)", StringComparison.Ordinal) : null;
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            return null;
        }
    }

    public void Dispose()
    {
        if (StillInFolder(_stream) == true)
        {
            try
            {
                File.Delete(_path);
            }
            catch (Exception e) when (e is IOException or UnauthorizedAccessException)
            {
                // A lock file that cannot be removed stays as an empty file; the next run locks it again.
            }
        }
        _stream.Dispose();
    }
}
