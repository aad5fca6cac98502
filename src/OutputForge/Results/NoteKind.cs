namespace OutputForge.Results;

/// <summary>
/// What a note says, as a code; Layout's <c>NoteWording</c> holds the one wording of each. The values a kind needs are
/// named beside it (<see cref="ResultNote.Values"/>).
/// </summary>
public enum NoteKind
{
    /// <summary>What N, n and the percentages of a summary table are. Values: population; optional armVariable (the arms' variable is named), withValue (n counts subjects with a value).</summary>
    Denominators,
    /// <summary>The tests across the treatment arms of a summary table, grouped by method. Values: methods and subjects (parallel lists: the method of each tested block or variable).</summary>
    AcrossArmsTest,
    /// <summary>Expected counts below 5 in a chi-square test (Cochran 1954). Values: below, cells, smallest.</summary>
    SmallExpectedCounts,
    /// <summary>A test gave no result. Values: method, reason.</summary>
    TestNotEstimable,
    /// <summary>A remark of a statistical method on its own input (e.g. empty rows left out), as the method words it. Values: text.</summary>
    MethodRemark,
    /// <summary>An NE in the table: the subject names the row and column. Values: reason.</summary>
    NotEstimable,
    /// <summary>Text worded before Layout by a part not yet moved to structured notes (e.g. the summary's level checks). Values: text.</summary>
    Text,
}
