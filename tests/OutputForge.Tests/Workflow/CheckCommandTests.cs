using OutputForge.Tests.Support;

namespace OutputForge.Tests.Workflow;

/// <summary>`outputforge check`: every problem at once, errors and warnings apart, each located and with a hint.</summary>
public sealed class CheckCommandTests(WorkflowDemoFixture demo) : IClassFixture<WorkflowDemoFixture>
{
    private const string Study = """
        {
          "study": { "id": "T1", "title": "Test study" },
          "data": { "folder": "data", "datasets": { "adsl": "adsl.csv", "adeff": "adeff.csv" } },
          "treatment": { "variable": "TRT01P", "order": "TRT01PN", "control": "Placebo",
                         "arms": [ { "value": "Placebo", "order": 0 }, { "value": "Active", "order": 1 }, { "value": "High", "order": 2 } ] },
          "populations": { "itt": { "label": "ITT Population", "where": "ITTFL = 'Y'" },
                           "safety": { "label": "Safety Population", "where": "SAFFL = 'Y'" } },
          "tables": ["t1.json"]
        }
        """;

    private const string Adsl =
        "STUDYID,USUBJID,TRT01P,TRT01PN,ITTFL,SAFFL,AGE,RANDDT\n" +
        "T1,T1-001,Placebo,0,Y,N,40,2025-01-03\n" +
        "T1,T1-002,Placebo,0,Y,N,forty-one,2025-01-04\n" +
        "T1,T1-003,Active,1,Y,N,38,03/01/2025\n" +
        "T1,T1-003,Active,1,Y,N,66,2025-01-06\n" +
        "T1,T1-005,Low,3,Y,x,70,2025-01-07\n";

    private const string Adeff =
        "STUDYID,USUBJID,PARAMCD,PARAM,AVISIT,AVISITN,AVALC,ANL01FL\n" +
        "T1,T1-001,RESP,Response,Week 4,4,N,Y\n" +
        "T1,T1-002,RESP,Responder,Week 4,4,Y,Y\n" +
        "T1,T1-003,RESP,Response,Week 4,5,Y,Y\n" +
        "T1,T1-009,RESP,Response,Week 4,4,Y,Y\n";

    [Fact]
    public void TheDemoPackageHasNoErrors()
    {
        var (code, output, error) = WorkflowDemoFixture.Run(["check", "--spec", Path.Combine(demo.Root, "specs", "demo"), "--data", demo.Data]);

        Assert.True(code == 0, output + error);
        Assert.Contains("check: 0 errors", output);
    }

    [Fact]
    public void EveryProblemIsReportedAtOnce()
    {
        using var study = new MiniStudy(study: Study, adsl: Adsl, adeff: Adeff);

        var (code, output, _) = WorkflowDemoFixture.Run(["check", "--spec", study.StudyFile, "--data", study.DataFolder]);

        Assert.Equal(2, code);
        var expected = new[]
        {
            "adsl.csv line 5, variable USUBJID: subject T1-003 has a second ADSL row (first on line 4)",
            "adsl.csv line 6, variable SAFFL: flag value 'x' (ADaM flags hold Y, N or nothing)",
            "adsl.csv line 3, variable AGE: 'forty-one' is not a number, but AGE is a numeric variable",
            "adsl.csv line 4, variable RANDDT: '03/01/2025' is not an ISO 8601 date (YYYY-MM-DD)",
            "adeff.csv line 5, variable USUBJID: subject T1-009 is not in ADSL (adsl.csv)",
            "adeff.csv line 3, variable PARAM: PARAMCD 'RESP' has PARAM 'Responder' here but 'Response' on line 2",
            "adeff.csv line 4, variable AVISITN: AVISIT 'Week 4' has AVISITN '5' here but '4' on line 2",
            "TRT01P value 'Low' (1 subjects of population 'itt') is not one of the arms of study.json",
            "$.populations.safety.where: population 'safety' (SAFFL = 'Y') selects no subjects of adsl.csv",
        };
        foreach (var line in expected)
        {
            Assert.Contains(line, output);
        }
        Assert.Contains("warning: ", output);
        Assert.Contains("$.treatment.arms[2].value: arm 'High' has no subjects in population 'itt'", output);
        Assert.Contains("  hint: ", output);
        var firstWarning = output.IndexOf("warning: ", StringComparison.Ordinal);
        Assert.True(output.LastIndexOf("\nerror: ", StringComparison.Ordinal) < firstWarning, "errors are listed before warnings");
        Assert.Matches(@"check: (\d+) errors, (\d+) warnings?", output);
    }

    [Fact]
    public void SpecProblemsOfSeveralFilesAreAllReported()
    {
        var table = MiniStudy.TableJson.Replace("\"population\": \"itt\"", "\"population\": \"intent\"").Replace("\"visit\"", "\"visits\"");
        using var study = new MiniStudy(table: table);

        var (code, output, _) = WorkflowDemoFixture.Run(["check", "--spec", study.StudyFile]);

        Assert.Equal(2, code);
        Assert.Contains("unknown key 'visits'", output);
        Assert.Contains("hint: remove the key or correct its spelling", output);
    }

    [Fact]
    public void ConditionsWithUnknownVariablesAreReportedForEveryPopulationAndTable()
    {
        var spec = MiniStudy.StudyJson.Replace("ITTFL = 'Y'", "ITTFLAG = 'Y'");
        var table = MiniStudy.TableJson.Replace("AVALC = 'Y'", "AVALX = 'Y'");
        using var study = new MiniStudy(study: spec, table: table);

        var (code, output, _) = WorkflowDemoFixture.Run(["check", "--spec", study.StudyFile]);

        Assert.Equal(2, code);
        Assert.Contains("$.populations.itt.where: ", output);
        Assert.Contains("ITTFLAG", output);
        Assert.Contains("$.endpoint.response: ", output);
        Assert.Contains("AVALX", output);
    }

    [Fact]
    public void TheOldMissingValueTestIsLocatedAndNamesTheFormToWrite()
    {
        var spec = MiniStudy.StudyJson.Replace("ITTFL = 'Y'", "ITTFL IS NOT MISSING");
        using var study = new MiniStudy(study: spec);

        var (code, output, _) = WorkflowDemoFixture.Run(["check", "--spec", study.StudyFile]);

        Assert.Equal(2, code);
        Assert.Contains("$.populations.itt.where: the missing-value test is written 'is not null', not 'IS NOT MISSING' (at character 14 of \"ITTFL IS NOT MISSING\")", output);
        Assert.Contains("hint: write the missing-value test as 'VARIABLE is null' or 'VARIABLE is not null'", output);
    }

    [Fact]
    public void AMissingDataFileAndAnUnreadableOneAreBothReported()
    {
        using var study = new MiniStudy();
        File.Delete(Path.Combine(study.DataFolder, "adeff.csv"));
        File.WriteAllText(Path.Combine(study.DataFolder, "adsl.csv"), "STUDYID,USUBJID\nT1,\"T1-001\n");

        var (code, output, _) = WorkflowDemoFixture.Run(["check", "--spec", study.StudyFile]);

        Assert.Equal(2, code);
        Assert.Contains("$.data.datasets.adeff: no file adeff.csv in ", output);
        Assert.Contains("adsl.csv line 2: malformed CSV", output);
    }
}
