using OutputForge.Files;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.Files;

/// <summary>Input files are read only when they are regular files of a size the process can hold.</summary>
public sealed class RegularFileTests
{
    private static Exception Refuse(string problem) => new InvalidDataException(problem);

    [Fact]
    public async Task A_named_pipe_is_refused_without_waiting_for_a_writer()
    {
        if (OperatingSystem.IsWindows())
        {
            return;
        }
        using var folder = new TempFolder();
        var pipe = folder.File("adsl.csv");
        using (var mkfifo = System.Diagnostics.Process.Start("mkfifo", [pipe]))
        {
            mkfifo.WaitForExit();
        }
        var read = Task.Run(() => RegularFile.ReadAllBytes(pipe, 1 << 20, "allowed", Refuse));
        Assert.True(await Task.WhenAny(read, Task.Delay(TimeSpan.FromSeconds(20))) == read, "reading a named pipe hung");
        var error = await Assert.ThrowsAsync<InvalidDataException>(() => read);
        Assert.Contains("a named pipe (FIFO), not a regular file", error.Message);
    }

    [Fact]
    public void An_endless_device_is_refused_before_it_is_read()
    {
        if (!File.Exists("/dev/zero"))
        {
            return;
        }
        var error = Assert.Throws<InvalidDataException>(() => RegularFile.ReadAllBytes("/dev/zero", 1 << 20, "allowed", Refuse));
        Assert.Contains("a character device, not a regular file", error.Message);
    }

    [Fact]
    public void A_file_above_the_limit_is_refused_with_its_size_and_the_limit()
    {
        using var folder = new TempFolder();
        var file = folder.Write("big.csv", new string('x', 2_000));
        var error = Assert.Throws<InvalidDataException>(() => RegularFile.ReadAllBytes(file, 1_000, "a test allows", Refuse));
        Assert.Equal("the file is 2,000 bytes, more than the 1,000 bytes a test allows", error.Message);
    }

    [Fact]
    public void The_limit_is_half_the_memory_available_to_the_process()
    {
        Assert.Equal(Math.Min(GC.GetGCMemoryInfo().TotalAvailableMemoryBytes / 2, Array.MaxLength), RegularFile.SizeLimit);
        Assert.True(RegularFile.SizeLimit > 0);
    }

    [Fact]
    public void A_regular_file_is_read_whole()
    {
        using var folder = new TempFolder();
        var file = folder.Write("a.csv", "A,B\n1,2\n");
        Assert.Equal("A,B\n1,2\n"u8.ToArray(), RegularFile.ReadAllBytes(file, 100, "allowed", Refuse));
        Assert.Null(RegularFile.NotRegular(file));
    }
}
