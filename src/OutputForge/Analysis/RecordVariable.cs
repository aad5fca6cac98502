using OutputForge.Data;
using OutputForge.Expressions;
using OutputForge.Naming;
using OutputForge.Spec;

namespace OutputForge.Analysis;

/// <summary>
/// A variable a model needs for one endpoint record (a covariate, factor or stratum): read from the
/// endpoint's own dataset when it has the variable, else from the subject's ADSL row.
/// </summary>
public sealed class RecordVariable
{
    private readonly DataColumn _column;
    private readonly SubjectLevelRows? _adslRows;

    private RecordVariable(string name, DataColumn column, SubjectLevelRows? adslRows, string datasetFile)
    {
        Name = name;
        _column = column;
        _adslRows = adslRows;
        DatasetFile = datasetFile;
    }

    public string Name { get; }

    /// <summary>The file the values come from, for messages.</summary>
    public string DatasetFile { get; }

    public static RecordVariable Find(string name, Dataset records, StudyData data, SpecSource source, string pointer)
    {
        if (records.Find(name) is { } own)
        {
            return new RecordVariable(name, own, null, Path.GetFileName(records.File));
        }
        var adsl = data.SubjectLevel;
        if (adsl.Find(name) is { } subjectLevel)
        {
            return new RecordVariable(name, subjectLevel, data.SubjectLevelRowsOf(records), Path.GetFileName(adsl.File));
        }
        var known = records.VariableNames.Concat(adsl.VariableNames).Distinct().ToList();
        throw new SpecException(source.Problem(pointer,
            $"neither {Path.GetFileName(records.File)} nor ADSL has a variable {name}{NearestName.Hint(name, known)}"));
    }

    /// <summary>The row of the variable's own dataset; <paramref name="subject"/> is the record's own USUBJID.</summary>
    private int Row(int recordRow, string subject) => _adslRows is null ? recordRow : _adslRows.Of(recordRow, subject);

    public string? Text(int recordRow, string subject) => Row(recordRow, subject) is var r && r >= 0 ? _column.GetText(r) : null;

    /// <summary>The numeric value, or NaN when missing or not a number.</summary>
    public double Number(int recordRow, string subject) => Row(recordRow, subject) is var r && r >= 0 ? _column.GetNumber(r) : double.NaN;

    public bool IsNumeric => _column.Kind == VariableKind.Number;

    /// <summary>Why the variable is not numeric, where a value shows it (e.g. "'abc' on line 5 is not a number"); empty otherwise.</summary>
    public string NotNumericEvidence => _column.TextEvidence is { } evidence ? $" ({evidence} is not a number)" : string.Empty;

    /// <summary>True when the variable has no value at all (a column left empty, typed as text).</summary>
    public bool IsEmpty => _column.DistinctValues().Count == 0;
}
