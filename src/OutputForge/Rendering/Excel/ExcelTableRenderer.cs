using OutputForge.Layout;

namespace OutputForge.Rendering.Excel;

/// <summary>Writes one table as a one-sheet .xlsx.</summary>
public sealed class ExcelTableRenderer : ITableRenderer
{
    public string Extension => ".xlsx";

    public void Write(TableDocument document, Stream output) =>
        new ExcelWorkbookRenderer().Write([document], output);
}
