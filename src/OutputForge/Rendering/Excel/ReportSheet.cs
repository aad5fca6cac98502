namespace OutputForge.Rendering.Excel;

/// <summary>
/// One worksheet of a workflow report (compare, changes) as data: its name, a header row and rows of text, each cell
/// shown exactly as written (<see cref="ReportWorkbookWriter"/>).
/// </summary>
public sealed record ReportSheet(string Name, IReadOnlyList<string> Header, IReadOnlyList<IReadOnlyList<string>> Rows);
