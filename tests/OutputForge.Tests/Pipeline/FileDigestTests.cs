using OutputForge.Pipeline;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.Pipeline;

public sealed class FileDigestTests
{
    [Fact]
    public void Short_digest_is_the_start_of_the_sha256_of_the_file()
    {
        using var folder = new TempFolder();
        var path = folder.Write("abc.txt", "abc");

        // SHA-256("abc") = ba7816bf 8f01cfea ... (FIPS 180-2, Appendix B.1; also `printf abc | sha256sum`).
        Assert.Equal("ba7816bf8f01", FileDigest.Short(path));
    }
}
