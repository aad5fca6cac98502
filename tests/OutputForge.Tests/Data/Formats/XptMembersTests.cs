using OutputForge.Data;
using OutputForge.Data.Xpt;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.Data.Formats;

/// <summary>
/// An XPT transport file of several datasets (members): refused with the members' names unless the study spec names the
/// member (<c>"adae": { "file": "library.xpt", "member": "ADAE" }</c>), then read as if it were the file's only member.
/// The two-member file is the demo's ADSL and ADAE files joined: the second file's members after the first's (its
/// library header, the first three records, left out), as the published layout of the format stacks members.
/// </summary>
public sealed class XptMembersTests
{
    [Fact]
    public void A_file_of_several_members_is_read_by_the_member_the_spec_names()
    {
        using var temp = new TempFolder();
        var error = new StringWriter();
        Assert.True(OutputForge.Cli.Program.Run(["demo", "--out", temp.Path, "--no-tables", "--data-format", "xpt", "--quiet"], error) == 0, error.ToString());
        var data = Path.Combine(temp.Path, "data");
        var library = Path.Combine(data, "library.xpt");
        JoinMembers(library, Path.Combine(data, "adsl.xpt"), Path.Combine(data, "adae.xpt"));

        var refused = Assert.Throws<DataException>(() => XptDatasetReader.Read("adsl", library));
        Assert.Contains("more than one dataset (members ADSL, ADAE)", refused.Message);
        Assert.Contains("\"member\": \"ADSL\"", refused.Message);
        var missing = Assert.Throws<DataException>(() => XptDatasetReader.Read("adtte", library, DataReadOptions.Default, _ => { }, "ADTTE"));
        Assert.Contains("no member ADTTE", missing.Message);
        Assert.Contains("its members: ADSL, ADAE", missing.Message);

        foreach (var (name, member) in new[] { ("adsl", "ADSL"), ("adae", "adae") })
        {
            var alone = XptDatasetReader.Read(name, Path.Combine(data, name + ".xpt"));
            var fromLibrary = XptDatasetReader.Read(name, library, DataReadOptions.Default, _ => { }, member);
            PilotFormatsAgreementTests.AssertSameValues(alone, fromLibrary, compareLabels: true);
            Assert.Equal(alone.RowCount, fromLibrary.RowCount);
        }

        // End to end: the spec names the members of the joined file; the adverse event table is the same.
        var studyFile = Path.Combine(temp.Path, "specs", "demo", "study.json");
        var outputs = new List<string>();
        foreach (var joined in new[] { false, true })
        {
            if (joined)
            {
                var text = File.ReadAllText(studyFile);
                Assert.Contains("\"adsl\": \"adsl.xpt\"", text);
                text = text.Replace("\"adsl\": \"adsl.xpt\"", "\"adsl\": { \"file\": \"library.xpt\", \"member\": \"ADSL\" }", StringComparison.Ordinal)
                    .Replace("\"adae\": \"adae.xpt\"", "\"adae\": { \"file\": \"library.xpt\", \"member\": \"ADAE\" }", StringComparison.Ordinal);
                File.WriteAllText(studyFile, text);
            }
            var output = Path.Combine(temp.Path, "out-" + joined);
            Assert.True(OutputForge.Cli.Program.Run(["run", "--spec", studyFile, "--data", data, "--out", output, "--tables", "14.3.1.1",
                "--format", "txt", "--quiet", "--timestamp", "2026-12-01T09:00:00Z"], error) == 0, error.ToString());
            outputs.Add(File.ReadAllText(Directory.GetFiles(output, "*.txt").Single()));
        }
        // The source line names the file read (its digest), so it differs; every other line is the same.
        var before = outputs[0].Split('\n').Where(l => !l.Contains("SHA-256", StringComparison.Ordinal)).ToList();
        var after = outputs[1].Split('\n').Where(l => !l.Contains("SHA-256", StringComparison.Ordinal)).ToList();
        Assert.Equal(before, after);
        Assert.Contains("library.xpt", outputs[1]);
    }

    [Fact]
    public void A_member_may_be_named_only_for_an_xpt_file()
    {
        using var temp = new TempFolder();
        var error = new StringWriter();
        Assert.True(OutputForge.Cli.Program.Run(["demo", "--out", temp.Path, "--no-tables", "--quiet"], error) == 0, error.ToString());
        var studyFile = Path.Combine(temp.Path, "specs", "demo", "study.json");
        File.WriteAllText(studyFile, File.ReadAllText(studyFile).Replace("\"adae\": \"adae.csv\"",
            "\"adae\": { \"file\": \"adae.csv\", \"member\": \"ADAE\" }", StringComparison.Ordinal));
        var code = OutputForge.Cli.Program.Run(["run", "--spec", studyFile, "--out", Path.Combine(temp.Path, "out"), "--quiet"], error);
        Assert.NotEqual(0, code);
        Assert.Contains("data.datasets.adae.file: expected an XPT file name", error.ToString());
        Assert.DoesNotContain("datasets.adsl", error.ToString());
    }

    private static void JoinMembers(string target, string first, string second)
    {
        var bytes = File.ReadAllBytes(first).Concat(File.ReadAllBytes(second).Skip(3 * XptDatasetReader.RecordLength)).ToArray();
        File.WriteAllBytes(target, bytes);
    }
}
