using System.Globalization;
using System.Text.RegularExpressions;
using OutputForge.Data;

namespace OutputForge.Workflow.Check;

/// <summary>
/// ADaM conventions beyond those every run relies on (CDISC ADaM Implementation Guide v1.3,
/// BDS variables): one PARAM per PARAMCD, AVISITN and AVISIT in one-to-one correspondence,
/// numeric variables holding numbers, and dates written in ISO 8601.
/// </summary>
public static partial class AdamConventionChecks
{
    /// <summary>Variables the ADaM IG defines as numeric (besides *N codes of a character variable and *DY study days).</summary>
    private static readonly string[] NumericNames = ["AVAL", "BASE", "CHG", "PCHG", "AGE", "AVISITN", "PARAMN", "ADY", "ASTDY", "AENDY"];

    public static void Run(Dataset dataset, CheckReport report)
    {
        OneToOne(dataset, "PARAMCD", "PARAM", report, bothWays: false,
            "each PARAMCD has exactly one PARAM (ADaM IG, BDS); correct the PARAM text or the code");
        OneToOne(dataset, "AVISIT", "AVISITN", report, bothWays: true,
            "AVISITN is the numeric code of AVISIT: each visit name has one number and each number one name");
        foreach (var column in dataset.Columns)
        {
            if (IsNumericByConvention(dataset, column.Name))
            {
                Numeric(dataset, column, report);
            }
            if (column.Name.EndsWith("DT", StringComparison.OrdinalIgnoreCase) && column.Name.Length > 2)
            {
                Dates(dataset, column, report, IsoDate(), "an ISO 8601 date (YYYY-MM-DD)");
            }
            else if (column.Name.EndsWith("DTC", StringComparison.OrdinalIgnoreCase))
            {
                Dates(dataset, column, report, IsoDateTimeText(), "an ISO 8601 date or date-time (YYYY, YYYY-MM, YYYY-MM-DD or YYYY-MM-DDThh:mm[:ss])");
            }
            else if (column.Name.EndsWith("DTM", StringComparison.OrdinalIgnoreCase))
            {
                Dates(dataset, column, report, IsoDateTime(), "an ISO 8601 date-time (YYYY-MM-DDThh:mm[:ss])");
            }
        }
    }

    private static bool IsNumericByConvention(Dataset dataset, string name) =>
        NumericNames.Contains(name, StringComparer.OrdinalIgnoreCase)
        || (name.Length > 2 && name.EndsWith("DY", StringComparison.OrdinalIgnoreCase))
        || (name.Length > 1 && name.EndsWith('N') && dataset.Find(name[..^1]) is not null);

    private static void Numeric(Dataset dataset, DataColumn column, CheckReport report)
    {
        if (column.Kind == Expressions.VariableKind.Number)
        {
            return;
        }
        for (var row = 0; row < dataset.RowCount; row++)
        {
            var text = column.GetText(row);
            if (text is not null && !double.TryParse(text, NumberStyles.Float, CultureInfo.InvariantCulture, out _))
            {
                report.Add(Problem(dataset, row, column.Name, $"'{text}' is not a number, but {Named(column)} is a numeric variable",
                    "write numbers with a '.' decimal point and no units; leave missing values empty"), $"non-numeric {column.Name}");
            }
        }
    }

    private static void Dates(Dataset dataset, DataColumn column, CheckReport report, Regex pattern, string expected)
    {
        for (var row = 0; row < dataset.RowCount; row++)
        {
            var text = column.GetText(row);
            if (text is not null && !(pattern.IsMatch(text) && ValidCalendarDate(text)))
            {
                report.Add(Problem(dataset, row, column.Name, $"'{text}'{(column.Label is { Length: > 0 } ? " of " + Named(column) : "")} is not {expected}", "write dates as ISO 8601, e.g. 2025-04-09"),
                    $"dates of {column.Name}");
            }
        }
    }

    private static bool ValidCalendarDate(string text) =>
        text.Length < 10 || DateOnly.TryParseExact(text[..10], "yyyy-MM-dd", CultureInfo.InvariantCulture, DateTimeStyles.None, out _);

    private static void OneToOne(Dataset dataset, string keyName, string valueName, CheckReport report, bool bothWays, string hint)
    {
        var key = dataset.Find(keyName);
        var value = dataset.Find(valueName);
        if (key is null || value is null)
        {
            return;
        }
        Pairs(dataset, key, value, report, hint);
        if (bothWays)
        {
            Pairs(dataset, value, key, report, hint);
        }
    }

    private static void Pairs(Dataset dataset, DataColumn key, DataColumn value, CheckReport report, string hint)
    {
        var first = new Dictionary<string, (string? Value, int Line)>(StringComparer.Ordinal);
        var reported = new HashSet<string>(StringComparer.Ordinal);
        for (var row = 0; row < dataset.RowCount; row++)
        {
            if (key.GetText(row) is not { } k)
            {
                continue;
            }
            var v = value.GetText(row);
            if (!first.TryGetValue(k, out var seen))
            {
                first[k] = (v, dataset.LineOfRow[row]);
            }
            else if (seen.Value != v && reported.Add(k + "\u0000" + v))
            {
                report.Add(Problem(dataset, row, value.Name,
                    $"{key.Name} '{k}' has {value.Name} '{v}' here but '{seen.Value}' on line {seen.Line}", hint), $"{key.Name}/{value.Name} pairs");
            }
        }
    }

    /// <summary>The variable's name, with its label where the file gives one (XPT, Dataset-JSON): "TRTSDT (Date of First Exposure)".</summary>
    private static string Named(DataColumn column) => column.Label is { Length: > 0 } label ? $"{column.Name} ({label})" : column.Name;

    private static CheckProblem Problem(Dataset dataset, int row, string variable, string message, string hint) =>
        new(CheckSeverity.Error, dataset.File, $"line {dataset.LineOfRow[row]}, variable {variable}", message, hint);

    [GeneratedRegex(@"^\d{4}-\d{2}-\d{2}$")]
    private static partial Regex IsoDate();

    [GeneratedRegex(@"^\d{4}(-\d{2}(-\d{2}(T\d{2}:\d{2}(:\d{2}(\.\d+)?)?)?)?)?$")]
    private static partial Regex IsoDateTimeText();

    [GeneratedRegex(@"^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}(:\d{2}(\.\d+)?)?$")]
    private static partial Regex IsoDateTime();
}
