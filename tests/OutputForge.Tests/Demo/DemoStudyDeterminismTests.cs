using OutputForge.Demo;

namespace OutputForge.Tests.Demo;

public sealed class DemoStudyDeterminismTests : IDisposable
{
    private readonly List<string> _folders = new();

    private string Generate(DemoStudyOptions options)
    {
        var folder = DemoStudyFiles.NewTempFolder();
        _folders.Add(folder);
        DemoStudyGenerator.WriteCsv(folder, options);
        return folder;
    }

    [Fact]
    public void Same_options_give_byte_identical_files()
    {
        var first = Generate(new DemoStudyOptions(300, 99));
        var second = Generate(new DemoStudyOptions(300, 99));
        foreach (var file in DemoStudyFacts.DatasetFiles)
            Assert.Equal(File.ReadAllBytes(Path.Combine(first, file)), File.ReadAllBytes(Path.Combine(second, file)));
    }

    [Fact]
    public void A_different_seed_gives_different_files()
    {
        var first = Generate(new DemoStudyOptions(300, 99));
        var second = Generate(new DemoStudyOptions(300, 100));
        foreach (var file in DemoStudyFacts.DatasetFiles)
            Assert.NotEqual(File.ReadAllBytes(Path.Combine(first, file)), File.ReadAllBytes(Path.Combine(second, file)));
    }

    [Fact]
    public void Files_are_utf8_without_bom_with_newline_endings()
    {
        var folder = Generate(new DemoStudyOptions(120, 5));
        foreach (var file in DemoStudyFacts.DatasetFiles)
        {
            var bytes = File.ReadAllBytes(Path.Combine(folder, file));
            Assert.False(bytes.Length >= 3 && bytes[0] == 0xEF && bytes[1] == 0xBB && bytes[2] == 0xBF, $"{file} starts with a BOM");
            Assert.DoesNotContain((byte)'\r', bytes);
            Assert.Equal((byte)'\n', bytes[^1]);
        }
    }

    [Fact]
    public void Writes_the_four_datasets_and_creates_the_folder()
    {
        var folder = Path.Combine(DemoStudyFiles.NewTempFolder(), "nested");
        _folders.Add(Path.GetDirectoryName(folder)!);
        var written = DemoStudyGenerator.WriteCsv(folder, new DemoStudyOptions(10, 1));
        Assert.Equal(["adsl.csv", "adeff.csv", "adae.csv", "adtte.csv"], written);
        Assert.All(written, f => Assert.True(File.Exists(Path.Combine(folder, f))));
    }

    [Theory]
    [InlineData(0)]
    [InlineData(-5)]
    [InlineData(DemoStudyOptions.MaxSubjects + 1)]
    public void An_impossible_size_is_a_clear_error(int subjects)
    {
        var error = Assert.Throws<DemoStudyException>(() =>
            DemoStudyGenerator.WriteCsv(DemoStudyFiles.NewTempFolder(), new DemoStudyOptions(subjects)));
        Assert.Contains(subjects.ToString(System.Globalization.CultureInfo.InvariantCulture), error.Message);
        Assert.DoesNotContain('\n', error.Message);
    }

    public void Dispose()
    {
        foreach (var folder in _folders.Where(Directory.Exists)) Directory.Delete(folder, recursive: true);
    }
}
