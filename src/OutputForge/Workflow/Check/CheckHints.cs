using OutputForge.Data;
using OutputForge.Spec;

namespace OutputForge.Workflow.Check;

/// <summary>Fix hints for the problems the Spec and Data layers report, chosen by the problem's code, never by its wording.</summary>
public static class CheckHints
{
    public const string Schema = "correct the value or key as the schema says (specs/schema/*.json; docs/spec-reference.md)";
    public const string Reference = "use a name defined in the study spec (populations, data.datasets) or correct its spelling";
    public const string Condition = "correct the condition (docs/conditions.md); variables must exist in the dataset it is evaluated on";
    public const string MissingValueTest = "write the missing-value test as 'VARIABLE is null' or 'VARIABLE is not null' (docs/conditions.md)";
    public const string DataValue = "name a value that occurs in the data (values are compared exactly, including case)";
    public const string DataFile = "fix the file (UTF-8 CSV with a header row, RFC 4180 quoting) or point --data at the right folder";
    public const string SubjectLevel = "ADSL must hold one row per subject with USUBJID filled in";
    public const string SubjectLink = "every subject of an analysis dataset must have its ADSL row";
    public const string Flag = "ADaM flags (names ending in FL) hold Y, N or nothing; recode other values";

    public static string ForSpec(SpecProblem problem) => problem.Code switch
    {
        SpecProblemCode.UnknownKey => "remove the key or correct its spelling",
        SpecProblemCode.InvalidJson => "fix the JSON syntax at the position given",
        SpecProblemCode.RetiredName => $"write '{problem.Suggestion}' instead",
        SpecProblemCode.UnknownReference => Reference,
        SpecProblemCode.UnknownDataValue => DataValue,
        SpecProblemCode.MissingValueTest => MissingValueTest,
        SpecProblemCode.UnknownVariable or SpecProblemCode.ConditionSyntax => Condition,
        SpecProblemCode.NoSubjects => "check the population's condition and the flag values in ADSL",
        SpecProblemCode.DuplicateRecords => "narrow the endpoint's selection (e.g. ANL01FL = 'Y')",
        _ => Schema,
    };

    public static string ForData(DataException problem) => problem.Code switch
    {
        DataProblemCode.Flag => Flag,
        DataProblemCode.UnknownSubject or DataProblemCode.NoSubjectVariable => SubjectLink,
        DataProblemCode.NoSubjectLevelVariable or DataProblemCode.NoSubjects or DataProblemCode.EmptySubject or DataProblemCode.RepeatedSubject => SubjectLevel,
        _ => DataFile,
    };
}
