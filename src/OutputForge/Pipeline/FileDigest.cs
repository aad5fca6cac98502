using System.Security.Cryptography;

namespace OutputForge.Pipeline;

/// <summary>
/// Short SHA-256 digests of input files for the source line: the first 12 hexadecimal digits
/// (48 bits), enough to tell two versions of a dataset apart at a glance; the full digest belongs
/// in a manifest.
/// </summary>
public static class FileDigest
{
    public const int ShortLength = 12;

    public static string Short(string path)
    {
        using var stream = File.OpenRead(path);
        return Convert.ToHexStringLower(SHA256.HashData(stream))[..ShortLength];
    }
}
