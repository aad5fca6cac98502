using System.Runtime.InteropServices;

namespace OutputForge.Files;

/// <summary>
/// Reads input files only when they are regular files of a size the machine can hold. A named pipe would make the
/// run wait for a writer forever, and a device such as an endless stream of zero bytes would be read until memory
/// runs out; both are refused before they are opened, and a regular file is read no further than its size allows.
/// </summary>
public static class RegularFile
{
    /// <summary>
    /// The share of the memory available to the process that one input file may take. A CSV file's bytes are held
    /// while its typed columns are built beside them, so a file above half the memory cannot be read (common practice).
    /// </summary>
    public const int MemoryShare = 2;

    /// <summary>The largest input file this process can read: half its available memory, and at most the largest array.</summary>
    public const string SizeLimitReason = "this process can read (half the memory available to it)";

    public static long SizeLimit => Math.Min(GC.GetGCMemoryInfo().TotalAvailableMemoryBytes / MemoryShare, Array.MaxLength);

    /// <summary>
    /// Why <paramref name="path"/> (links followed) is not a regular file, such as "a named pipe (FIFO)", or null for a
    /// regular file, a path that does not exist, or a system where the file type cannot be asked.
    /// </summary>
    public static string? NotRegular(string path)
    {
        if (!OperatingSystem.IsLinux() && !OperatingSystem.IsMacOS() && !OperatingSystem.IsFreeBSD())
        {
            return Directory.Exists(path) ? "a folder" : null;
        }
        FileStatus status;
        try
        {
            if (Stat(path, out status) != 0)
            {
                return null;
            }
        }
        catch (Exception e) when (e is DllNotFoundException or EntryPointNotFoundException)
        {
            return Directory.Exists(path) ? "a folder" : null;
        }
        // File type bits as the runtime's native layer reports them on every Unix system (the POSIX S_IFMT values).
        return (status.Mode & 0xF000) switch
        {
            0x8000 => null,
            0x1000 => "a named pipe (FIFO)",
            0x2000 => "a character device",
            0x6000 => "a block device",
            0x4000 => "a folder",
            0xC000 => "a socket",
            _ => "not a regular file",
        };
    }

    /// <summary>
    /// The bytes of a regular file no larger than <paramref name="limit"/> (<paramref name="limitReason"/> says why, e.g.
    /// "a spec may hold"); <paramref name="refuse"/> makes the
    /// exception for a problem (its argument says what is wrong, without any of the file's content).
    /// </summary>
    public static byte[] ReadAllBytes(string path, long limit, string limitReason, Func<string, Exception> refuse)
    {
        if (NotRegular(path) is { } kind)
        {
            throw refuse($"the file is {kind}, not a regular file");
        }
        using var stream = new FileStream(path, FileMode.Open, FileAccess.Read, FileShare.Read, 1, FileOptions.SequentialScan);
        var length = stream.Length;
        if (length > limit)
        {
            throw refuse($"the file is {length:N0} bytes, more than the {limit:N0} bytes {limitReason}");
        }
        var bytes = new byte[length];
        try
        {
            stream.ReadExactly(bytes);
        }
        catch (EndOfStreamException)
        {
            throw refuse("the file shrank while it was read; is another program still writing it?");
        }
        // A file that grows while it is read is read to the size it had when opened; more bytes mean it is still being written.
        if (stream.ReadByte() >= 0)
        {
            throw refuse("the file grew while it was read; is another program still writing it?");
        }
        return bytes;
    }

    [StructLayout(LayoutKind.Sequential)]
    private struct FileStatus
    {
        public int Flags;
        public int Mode;
        // The rest of the runtime's status record (owner, size, times, device, inode), not read here; room to spare.
        public Padding Rest;
    }

    [System.Runtime.CompilerServices.InlineArray(32)]
    private struct Padding
    {
        private long _element;
    }

    /// <summary>stat(2) through the .NET runtime's own native layer, which reports the type bits the same on every Unix.</summary>
    [DllImport("libSystem.Native", EntryPoint = "SystemNative_Stat", CharSet = CharSet.Ansi, SetLastError = true)]
    private static extern int Stat(string path, out FileStatus status);
}
