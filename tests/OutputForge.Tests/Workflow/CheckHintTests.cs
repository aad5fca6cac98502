using OutputForge.Data;
using OutputForge.Spec;
using OutputForge.Workflow.Check;

namespace OutputForge.Tests.Workflow;

/// <summary>`check`'s hints follow the problem's code, whatever its message says.</summary>
public sealed class CheckHintTests
{
    [Theory]
    [InlineData(SpecProblemCode.UnknownReference, CheckHints.Reference)]
    [InlineData(SpecProblemCode.UnknownDataValue, CheckHints.DataValue)]
    [InlineData(SpecProblemCode.MissingValueTest, CheckHints.MissingValueTest)]
    [InlineData(SpecProblemCode.UnknownVariable, CheckHints.Condition)]
    [InlineData(SpecProblemCode.ConditionSyntax, CheckHints.Condition)]
    [InlineData(SpecProblemCode.NotAChoice, CheckHints.Schema)]
    public void A_spec_problem_gets_the_hint_of_its_code(SpecProblemCode code, string hint)
    {
        // The message names another kind of problem on purpose: only the code may choose the hint.
        var problem = new SpecProblem("t.json", 1, 1, "$.x", "unknown key 'x'; no subjects; has no variable") { Code = code };
        Assert.Equal(hint, CheckHints.ForSpec(problem));
    }

    [Fact]
    public void The_spec_loader_codes_an_unknown_population()
    {
        const string table = """{ "id": "1", "title": ["T"], "population": "itx", "kind": "demographics", "demographics": { "variables": [{ "variable": "AGE", "type": "continuous" }] } }""";
        using var study = new Support.MiniStudy(table: table);
        var problems = new List<SpecProblem>();
        SpecLoader.LoadCollecting(study.Folder, problems);
        var problem = Assert.Single(problems, p => p.JsonPath == "$.population");
        Assert.Equal(SpecProblemCode.UnknownReference, problem.Code);
        Assert.Equal(CheckHints.Reference, CheckHints.ForSpec(problem));
    }

    [Theory]
    [InlineData(DataProblemCode.Flag, CheckHints.Flag)]
    [InlineData(DataProblemCode.UnknownSubject, CheckHints.SubjectLink)]
    [InlineData(DataProblemCode.NoSubjectVariable, CheckHints.SubjectLink)]
    [InlineData(DataProblemCode.RepeatedSubject, CheckHints.SubjectLevel)]
    [InlineData(DataProblemCode.File, CheckHints.DataFile)]
    public void A_data_problem_gets_the_hint_of_its_code(DataProblemCode code, string hint)
    {
        var problem = new DataException("adsl.csv", 2, "ITTFL", "flag value 'X' is not in ADSL (USUBJID)", code);
        Assert.Equal(hint, CheckHints.ForData(problem));
        Assert.Equal("flag value 'X' is not in ADSL (USUBJID)", CheckProblem.FromData(problem, hint).Message);
    }
}
