using System.Security.Cryptography;

namespace OutputForge.Data;

/// <summary>
/// The SHA-256 of a file's bytes (lower-case hex, as the manifest names the data read), computed on another core
/// while a streaming reader parses the same file: it reads the file on its own, in blocks, so neither the reader
/// nor the hash holds the whole file.
/// </summary>
internal static class StreamedFileDigest
{
    public static Task<string> Start(string path) => Task.Run(() =>
    {
        using var stream = new FileStream(path, FileMode.Open, FileAccess.Read, FileShare.Read, 1, FileOptions.SequentialScan);
        using var hash = IncrementalHash.CreateHash(HashAlgorithmName.SHA256);
        var buffer = new byte[1 << 20];
        int read;
        while ((read = stream.Read(buffer, 0, buffer.Length)) > 0)
        {
            hash.AppendData(buffer, 0, read);
        }
        return Convert.ToHexStringLower(hash.GetHashAndReset());
    });
}
