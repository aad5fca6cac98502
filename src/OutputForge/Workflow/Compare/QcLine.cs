namespace OutputForge.Workflow.Compare;

/// <summary>One line of a QC file: where the number stands (keys or displayed labels) and the QC value as written.</summary>
public sealed record QcLine(int Line, string Table, string Row, string Column, string Statistic, string Value)
{
    public string Address => $"{Table} / {Row} / {Column} / {Statistic}";
}
