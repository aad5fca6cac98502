using System.Security.Cryptography;

namespace OutputForge.Pipeline.Manifest;

/// <summary>
/// SHA-256 digests of files (FIPS 180-4), in lower-case hex, and the short form printed in
/// source lines: the first 8 hex digits, enough to tell two data transfers apart at a glance.
/// </summary>
public static class FileDigest
{
    public const int ShortLength = 8;

    public static string Sha256(string path)
    {
        using var stream = File.OpenRead(path);
        return Convert.ToHexStringLower(SHA256.HashData(stream));
    }

    public static string Short(string sha256) => sha256.Length <= ShortLength ? sha256 : sha256[..ShortLength];
}
