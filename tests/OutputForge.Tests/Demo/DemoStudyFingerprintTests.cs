using System.Security.Cryptography;
using OutputForge.Demo;

namespace OutputForge.Tests.Demo;

/// <summary>
/// The default study is pinned by the SHA-256 of each file, recorded from this generator on Linux x64
/// with .NET 10. The same digests on any other operating system, processor or runtime show that no
/// platform-dependent arithmetic (libm, culture, line endings) reached the output. A deliberate change
/// to the simulation changes the digests; update them in the same commit and say why.
/// </summary>
public sealed class DemoStudyFingerprintTests : IClassFixture<DemoStudyFiles>
{
    private readonly DemoStudyFiles _study;

    public DemoStudyFingerprintTests(DemoStudyFiles study) => _study = study;

    [Theory]
    [InlineData("adsl.csv", "49c3886fec9417d35613b00bdaf7a01eca409f77270d7114bb8f8637d6a61d4a")]
    [InlineData("adeff.csv", "dfffe17eb40402efa080bae2271d1bec63f16f0ff1838ec8a68fbfbd48e9a00c")]
    [InlineData("adae.csv", "4e504bcce87c54c6a99843aa40fd05e0afb51b611036314a701b160214c3f4b6")]
    [InlineData("adtte.csv", "26346fd18446cf0c1450b571e5ef88284adaa5f7d50e241d1ec42e09669e5aed")]
    public void Default_study_files_have_the_recorded_digest(string file, string sha256)
    {
        var digest = Convert.ToHexStringLower(SHA256.HashData(File.ReadAllBytes(Path.Combine(_study.Folder, file))));
        Assert.Equal(sha256, digest);
    }

    [Fact]
    public void The_default_options_are_450_subjects_and_seed_301()
    {
        var options = new DemoStudyOptions();
        Assert.Equal(450, options.Subjects);
        Assert.Equal(301UL, options.Seed);
        Assert.Equal(["adsl.csv", "adeff.csv", "adae.csv", "adtte.csv"], _study.WrittenFiles);
    }
}
