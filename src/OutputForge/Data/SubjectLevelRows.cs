namespace OutputForge.Data;

/// <summary>
/// The ADSL row of each record of one dataset (a model reads its ADSL covariates and factors for thousands of
/// records per visit). For one of the study's datasets every record's row is found once, in one pass over its
/// USUBJID values: a BDS dataset keeps each subject's records together, and the reader gives a value repeating the
/// row above the same string, so only each change of subject costs a look-up. For other records (made by a table),
/// a record's row is looked up the first time it is asked for.
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

    /// <summary>Every record's ADSL row from the records' own USUBJID column, in one pass.</summary>
    internal SubjectLevelRows(IReadOnlyDictionary<string, int> rowOfSubject, DataColumn subjects)
    {
        _rowOfSubject = rowOfSubject;
        _rowOfRecord = new int[subjects.Length];
        string? previous = null;
        var row = -1;
        for (var i = 0; i < _rowOfRecord.Length; i++)
        {
            var subject = subjects.GetText(i);
            if (!ReferenceEquals(subject, previous))
            {
                row = subject is not null && rowOfSubject.TryGetValue(subject, out var found) ? found : -1;
                previous = subject;
            }
            _rowOfRecord[i] = row;
        }
    }

    /// <summary>The ADSL row of record <paramref name="recordRow"/>, whose USUBJID is <paramref name="subject"/>; -1 when ADSL lacks the subject.</summary>
    public int Of(int recordRow, string subject)
    {
        var row = _rowOfRecord[recordRow];
        if (row == NotLookedUp)
        {
            // Shared by tables running in parallel: a row looked up twice at the same time gets the same answer twice.
            row = _rowOfSubject.TryGetValue(subject, out var found) ? found : -1;
            _rowOfRecord[recordRow] = row;
        }
        return row;
    }
}
