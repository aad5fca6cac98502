using ClosedXML.Excel;
using OutputForge.Layout;
using OutputForge.Rendering.Excel;

namespace OutputForge.Tests.Rendering;

/// <summary>Renders tables to .xlsx in memory and reopens the workbook with ClosedXML.</summary>
public sealed class ExcelWorkbookReader : IDisposable
{
    private readonly MemoryStream _stream = new();

    public ExcelWorkbookReader(params TableDocument[] documents)
    {
        if (documents.Length == 1)
            new ExcelTableRenderer().Write(documents[0], _stream);
        else
            new ExcelWorkbookRenderer().Write(documents, _stream);
        _stream.Position = 0;
        Workbook = new XLWorkbook(_stream);
    }

    public XLWorkbook Workbook { get; }

    public IXLWorksheet Sheet => Workbook.Worksheets.Single();

    public byte[] Bytes => _stream.ToArray();

    public void Dispose()
    {
        Workbook.Dispose();
        _stream.Dispose();
    }
}
