namespace OutputForge.Workflow.Check;

/// <summary>Fix hints for the problems the Spec and Data layers report, chosen by the kind of message.</summary>
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

    public static string ForSpec(string message) => message switch
    {
        _ when message.StartsWith("unknown key", StringComparison.Ordinal) => "remove the key or correct its spelling",
        _ when message.StartsWith("invalid JSON", StringComparison.Ordinal) => "fix the JSON syntax at the position given",
        _ when message.StartsWith("unknown population", StringComparison.Ordinal) || message.StartsWith("unknown dataset", StringComparison.Ordinal) => Reference,
        _ when message.Contains("no record of", StringComparison.Ordinal) || message.Contains("is not a value of", StringComparison.Ordinal) => DataValue,
        _ when message.Contains("the missing-value test is written", StringComparison.Ordinal) => MissingValueTest,
        _ when message.Contains("has no variable", StringComparison.Ordinal) || message.Contains("at character", StringComparison.Ordinal) => Condition,
        _ when message.Contains("no subjects", StringComparison.Ordinal) => "check the population's condition and the flag values in ADSL",
        _ when message.Contains("more than one record", StringComparison.Ordinal) => "narrow the endpoint's selection (e.g. ANL01FL = 'Y')",
        _ => Schema,
    };

    public static string ForData(string message) => message switch
    {
        _ when message.Contains("flag value", StringComparison.Ordinal) => Flag,
        _ when message.Contains("is not in ADSL", StringComparison.Ordinal) || message.Contains("cannot be linked", StringComparison.Ordinal) => SubjectLink,
        _ when message.Contains("ADSL", StringComparison.Ordinal) || message.Contains("USUBJID", StringComparison.Ordinal) => SubjectLevel,
        _ => DataFile,
    };
}
