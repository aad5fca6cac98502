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
    private readonly IReadOnlyDictionary<string, int>? _adslRowOfSubject;

    private RecordVariable(string name, DataColumn column, IReadOnlyDictionary<string, int>? adslRowOfSubject, string datasetFile)
    {
        Name = name;
        _column = column;
        _adslRowOfSubject = adslRowOfSubject;
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
            var subjects = adsl.Get(AdamConformance.SubjectVariable);
            var rowOfSubject = new Dictionary<string, int>(StringComparer.Ordinal);
            for (var row = 0; row < adsl.RowCount; row++)
            {
                rowOfSubject[subjects.GetText(row)!] = row;
            }
            return new RecordVariable(name, subjectLevel, rowOfSubject, Path.GetFileName(adsl.File));
        }
        var known = records.Columns.Select(c => c.Name).Concat(adsl.Columns.Select(c => c.Name)).Distinct().ToList();
        throw new SpecException(source.Problem(pointer,
            $"neither {Path.GetFileName(records.File)} nor ADSL has a variable {name}{NearestName.Hint(name, known)}"));
    }

    private int Row(int recordRow, string subject) =>
        _adslRowOfSubject is null ? recordRow : _adslRowOfSubject.TryGetValue(subject, out var r) ? r : -1;

    public string? Text(int recordRow, string subject) => Row(recordRow, subject) is var r && r >= 0 ? _column.GetText(r) : null;

    /// <summary>The numeric value, or NaN when missing or not a number.</summary>
    public double Number(int recordRow, string subject) => Row(recordRow, subject) is var r && r >= 0 ? _column.GetNumber(r) : double.NaN;

    public bool IsNumeric => _column.Kind == VariableKind.Number;
}
