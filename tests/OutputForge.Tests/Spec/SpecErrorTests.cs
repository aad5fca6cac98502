using OutputForge.Pipeline;
using OutputForge.Spec;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.Spec;

/// <summary>Spec mistakes give one precise message: file, line, column, JSON path and a hint.</summary>
public sealed class SpecErrorTests
{
    private static SpecException RunFails(MiniStudy study)
    {
        var error = Assert.Throws<SpecException>(() =>
            PackageRunner.Run(new RunRequest(study.Folder, study.DataFolder, study.OutputFolder, []), new CollectingRunLog()));
        Assert.False(Directory.Exists(study.OutputFolder), "a failed run must not create outputs");
        return error;
    }

    [Fact]
    public void A_wrong_variable_in_a_condition_names_file_path_position_and_nearest_name()
    {
        using var study = new MiniStudy(table: MiniStudy.TableJson.Replace("AVALC = 'Y'", "AVALX = 'Y'"));
        var problem = Assert.Single(RunFails(study).Problems);
        Assert.EndsWith("t1.json", problem.File);
        Assert.Equal("$.endpoint.response", problem.JsonPath);
        Assert.Equal(11, problem.Line);
        Assert.Contains("has no variable AVALX (did you mean 'AVALC'?)", problem.Message);
        Assert.Contains("at character 1 of \"AVALX = 'Y'\"", problem.Message);
    }

    [Fact]
    public void A_wrong_population_variable_points_into_the_study_file()
    {
        using var study = new MiniStudy(study: MiniStudy.StudyJson.Replace("ITTFL = 'Y'", "ITTF = 'Y'"));
        var problem = Assert.Single(RunFails(study).Problems);
        Assert.EndsWith("study.json", problem.File);
        Assert.Equal("$.populations.itt.where", problem.JsonPath);
        Assert.Equal(5, problem.Line);
        Assert.Contains("did you mean 'ITTFL'?", problem.Message);
    }

    [Fact]
    public void An_unknown_population_suggests_the_nearest()
    {
        using var study = new MiniStudy(table: MiniStudy.TableJson.Replace("\"population\": \"itt\"", "\"population\": \"it\""));
        var problem = Assert.Single(RunFails(study).Problems);
        Assert.Equal("$.population", problem.JsonPath);
        Assert.Contains("unknown population 'it' (did you mean 'itt'?)", problem.Message);
    }

    [Fact]
    public void An_unknown_dataset_and_parameter_and_visit_are_named()
    {
        using var dataset = new MiniStudy(table: MiniStudy.TableJson.Replace("\"dataset\": \"adeff\"", "\"dataset\": \"adef\""));
        Assert.Contains("unknown dataset 'adef' (did you mean 'adeff'?)", RunFails(dataset).Message);

        using var parameter = new MiniStudy(table: MiniStudy.TableJson.Replace("\"RESP\"", "\"RSP\""));
        var problem = Assert.Single(RunFails(parameter).Problems);
        Assert.Equal("$.endpoint.parameter", problem.JsonPath);
        Assert.Contains("has PARAMCD 'RSP' (did you mean 'RESP'?)", problem.Message);

        using var visit = new MiniStudy(table: MiniStudy.TableJson.Replace("\"Week 4\"", "\"Week 40\""));
        Assert.Contains("AVISIT 'Week 40' (did you mean 'Week 4'?)", RunFails(visit).Message);
    }

    [Fact]
    public void An_unknown_control_arm_is_named()
    {
        using var study = new MiniStudy(study: MiniStudy.StudyJson.Replace("\"control\": \"Placebo\"", "\"control\": \"placebo\""));
        var problem = Assert.Single(RunFails(study).Problems);
        Assert.Equal("$.treatment.control", problem.JsonPath);
        Assert.Contains("(did you mean 'Placebo'?)", problem.Message);
    }

    [Fact]
    public void Schema_violations_are_all_reported_with_their_lines()
    {
        var table = MiniStudy.TableJson
            .Replace("\"kind\": \"responders\"", "\"kind\": \"responder\"")
            .Replace("\"title\": [\"Responders\"],", "\"titel\": [\"Responders\"],");
        using var study = new MiniStudy(table: table);
        var problems = RunFails(study).Problems;
        Assert.Contains(problems, p => p.JsonPath == "$.titel" && p.Message.Contains("unknown key 'titel' (did you mean 'title'?)") && p.Line == 3);
        Assert.Contains(problems, p => p.JsonPath == "$.kind" && p.Message.Contains("expected one of \"responders\"") && p.Line == 5);
        // The misspelt key is reported once: not again as the required key it was meant to be.
        Assert.DoesNotContain(problems, p => p.Message.Contains("missing required key: 'title'"));
        Assert.Equal(2, problems.Count);
    }

    [Fact]
    public void Invalid_json_names_line_and_column()
    {
        using var study = new MiniStudy(table: MiniStudy.TableJson.Replace("\"kind\": \"responders\",", "\"kind\": \"responders\""));
        var problem = Assert.Single(RunFails(study).Problems);
        Assert.Contains("invalid JSON", problem.Message);
        Assert.Equal(6, problem.Line);
    }

    [Fact]
    public void A_missing_table_file_is_named()
    {
        using var study = new MiniStudy(study: MiniStudy.StudyJson.Replace("t1.json", "t2.json"));
        var problem = Assert.Single(RunFails(study).Problems);
        Assert.Equal("$.tables[0]", problem.JsonPath);
        Assert.Contains("no such table spec file 't2.json'", problem.Message);
    }

    [Fact]
    public void Two_records_for_one_subject_are_refused()
    {
        using var study = new MiniStudy(adeff: MiniStudy.Adeff + "T1,T1-001,RESP,Week 4,Y,Y\n");
        var problem = Assert.Single(RunFails(study).Problems);
        Assert.Equal("$.endpoint.where", problem.JsonPath);
        Assert.Contains("more than one record of subject T1-001 (adeff.csv lines 2 and 6)", problem.Message);
    }

    [Fact]
    public void An_empty_population_is_refused()
    {
        using var study = new MiniStudy(study: MiniStudy.StudyJson.Replace("ITTFL = 'Y'", "ITTFL = 'X'"));
        Assert.Contains("has no subjects", RunFails(study).Message);
    }
}
