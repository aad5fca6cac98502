using System.Text.RegularExpressions;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.Architecture;

/// <summary>
/// Notes are data from Stats to Layout: Stats returns the strata it left out by index and reason, the kinds name them by
/// their values and Layout words them. These tests fail if prose about a stratum came back, or if a kind went back to
/// reading a stratum out of a note's text.
/// </summary>
public sealed partial class StructuredNotesTests
{
    private static readonly string Source = Path.Combine(RepositoryRoot.Path, "src", "OutputForge");

    public static TheoryData<string> AnalysisFiles()
    {
        var data = new TheoryData<string>();
        foreach (var folder in new[] { "Analysis", "Kinds" })
        {
            foreach (var file in Directory.EnumerateFiles(Path.Combine(Source, folder), "*.cs", SearchOption.AllDirectories).Order(StringComparer.Ordinal))
            {
                data.Add(Path.GetRelativePath(Source, file).Replace('\\', '/'));
            }
        }
        return data;
    }

    [Theory]
    [MemberData(nameof(AnalysisFiles))]
    public void No_analysis_reads_or_rewrites_the_text_of_a_note(string file)
    {
        var text = File.ReadAllText(Path.Combine(Source, file));
        // A regular expression beside a method's notes is a note read back as data.
        Assert.False(text.Contains("Regex", StringComparison.Ordinal) && text.Contains(".Notes", StringComparison.Ordinal),
            $"{file} uses a regular expression and reads notes");
        // Renaming "Stratum k" in a note's text is what the stratum remarks replaced.
        Assert.False(StratumRename().IsMatch(text), $"{file} rewrites a stratum's name in a note's text");
    }

    [Fact]
    public void No_kind_writes_a_footnote_letter_into_its_text()
    {
        // Layout letters the footnotes in order of first reference; a kind that writes "[a] " itself has worded a
        // footnote before Layout (as the categorical-by-visit kind did) and would go out of step with the letters.
        var offenders = Directory.EnumerateFiles(Path.Combine(Source, "Kinds"), "*.cs", SearchOption.AllDirectories)
            .Where(f => ProseFootnote().IsMatch(File.ReadAllText(f)))
            .Select(f => Path.GetRelativePath(Source, f).Replace('\\', '/'))
            .ToList();
        Assert.Empty(offenders);
    }

    [GeneratedRegex(@"Replace\(\$?""(Stratum|Level|stratum|level) ")]
    private static partial Regex StratumRename();

    /// <summary>A footnote letter written into a note's text ("[a] ..."), which Layout gives.</summary>
    [GeneratedRegex(@"""\[[a-z]\] ")]
    private static partial Regex ProseFootnote();
}
