using OutputForge.Tests.Support;

namespace OutputForge.Tests.Workflow;

/// <summary>
/// The demo package run once ("before"), and run again ("after") on a copy of its data in which
/// one ITT subject of the QF-217 10 mg arm with a Week 12 non-response is turned into a responder.
/// </summary>
public sealed class WorkflowDemoFixture : IDisposable
{
    private readonly TempFolder _folder = new();

    public WorkflowDemoFixture()
    {
        Run(["demo", "--out", _folder.Path, "--format", "docx,xlsx"]);
        var afterData = Path.Combine(_folder.Path, "after-data");
        Directory.CreateDirectory(afterData);
        foreach (var file in Directory.GetFiles(Data))
        {
            System.IO.File.Copy(file, Path.Combine(afterData, Path.GetFileName(file)));
        }
        var adsl = SimpleCsv.Read(Path.Combine(Data, "adsl.csv")).ToDictionary(s => s["USUBJID"]);
        var lines = System.IO.File.ReadAllLines(Path.Combine(afterData, "adeff.csv")).ToList();
        var header = lines[0].Split(',');
        int Column(string name) => Array.IndexOf(header, name);
        for (var i = 1; i < lines.Count; i++)
        {
            var fields = lines[i].Split(',');
            var subject = fields[Column("USUBJID")];
            if (fields[Column("PARAMCD")] == "ITCHR50" && fields[Column("AVISIT")] == "Week 12" && fields[Column("ANL01FL")] == "Y" &&
                fields[Column("AVALC")] == "N" && adsl[subject]["ITTFL"] == "Y" && adsl[subject]["TRT01P"] == "QF-217 10 mg")
            {
                fields[Column("AVALC")] = "Y";
                fields[Column("AVAL")] = "1";
                fields[Column("CRIT1FL")] = "Y";
                lines[i] = string.Join(',', fields);
                FlippedSubject = subject;
                FlippedSubjectInPerProtocol = adsl[subject]["PPROTFL"] == "Y";
                break;
            }
        }
        System.IO.File.WriteAllText(Path.Combine(afterData, "adeff.csv"), string.Join("\n", lines) + "\n");
        Run(["run", "--spec", Path.Combine(_folder.Path, "specs", "demo"), "--data", afterData, "--out", After, "--format", "xlsx"]);
    }

    public string Root => _folder.Path;
    public string Data => Path.Combine(_folder.Path, "data");
    public string Before => Path.Combine(_folder.Path, "output");
    public string After => Path.Combine(_folder.Path, "after");
    public string FlippedSubject { get; } = "";
    public bool FlippedSubjectInPerProtocol { get; }

    public static (int ExitCode, string Output, string Error) Run(string[] args)
    {
        var output = new StringWriter();
        var error = new StringWriter();
        var code = OutputForge.Cli.Program.Run(args, error, output);
        return (code, output.ToString(), error.ToString());
    }

    public string File(string relative) => _folder.File(relative);

    public string Write(string relative, string content) => _folder.Write(relative, content);

    public void Dispose() => _folder.Dispose();
}
