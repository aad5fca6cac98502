using OutputForge.Files;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.Files;

/// <summary>Links resolved as the operating system follows them, so folder checks compare where files really are.</summary>
public sealed class RealPathTests
{
    [Fact]
    public void A_link_to_a_folder_resolves_to_the_folder_and_keeps_the_rest_of_the_path()
    {
        using var folder = new TempFolder();
        Directory.CreateDirectory(folder.File("real"));
        Directory.CreateSymbolicLink(folder.File("link"), folder.File("real"));
        Assert.Equal(RealPath.Of(folder.File("real/not-yet/file.txt")), RealPath.Of(folder.File("link/not-yet/file.txt")));
        Assert.EndsWith(Path.Combine("real", "not-yet", "file.txt"), RealPath.Of(folder.File("link/not-yet/file.txt")));
    }

    [Fact]
    public void Parent_steps_after_a_link_leave_from_the_link_target()
    {
        // a/up -> ../b/c : "a/up/.." is b, not a (the link is followed before "..", as the kernel does).
        using var folder = new TempFolder();
        Directory.CreateDirectory(folder.File("a"));
        Directory.CreateDirectory(folder.File("b/c"));
        Directory.CreateSymbolicLink(folder.File("a/up"), "../b/c");
        Assert.Equal(RealPath.Of(folder.File("b")), RealPath.Of(folder.File("a/up/..")));
    }

    [Fact]
    public void A_loop_of_links_is_an_error_not_a_hang()
    {
        using var folder = new TempFolder();
        File.CreateSymbolicLink(folder.File("x"), folder.File("y"));
        File.CreateSymbolicLink(folder.File("y"), folder.File("x"));
        Assert.Throws<IOException>(() => RealPath.Of(folder.File("x")));
    }

    [Fact]
    public void Inside_compares_whole_folder_names()
    {
        Assert.True(RealPath.IsInside("/data/study/adsl.csv", "/data/study"));
        Assert.True(RealPath.IsInside("/data/study", "/data/study/"));
        Assert.False(RealPath.IsInside("/data/study2/adsl.csv", "/data/study"));
    }
}
