namespace OutputForge.Data;

/// <summary>
/// The ADSL row of each record of one dataset, found by the record's USUBJID the first time a table asks and then
/// kept for every later table (a model reads its ADSL covariates and factors for thousands of records per visit).
/// Shared by the tables running in parallel: a row looked up twice at the same time gets the same answer twice.
/// </summary>
public sealed class SubjectLevelRows
{
    private const int NotLookedUp = int.MinValue;

    private readonly IReadOnlyDictionary<string, int> _rowOfSubject;
    private readonly int[] _rowOfRecord;

    internal SubjectLevelRows(IReadOnlyDictionary<string, int> rowOfSubject, int records)
    {
        _rowOfSubject = rowOfSubject;
        _rowOfRecord = new int[records];
        Array.Fill(_rowOfRecord, NotLookedUp);
    }

    /// <summary>The ADSL row of record <paramref name="recordRow"/>, whose USUBJID is <paramref name="subject"/>; -1 when ADSL lacks the subject.</summary>
    public int Of(int recordRow, string subject)
    {
        var row = _rowOfRecord[recordRow];
        if (row == NotLookedUp)
        {
            row = _rowOfSubject.TryGetValue(subject, out var found) ? found : -1;
            _rowOfRecord[recordRow] = row;
        }
        return row;
    }
}
