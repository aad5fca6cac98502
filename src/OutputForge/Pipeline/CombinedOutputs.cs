using OutputForge.Layout;
using OutputForge.Rendering;
using OutputForge.Rendering.Excel;
using OutputForge.Rendering.Word;

namespace OutputForge.Pipeline;

/// <summary>
/// The combined outputs of a run (--combined): all-tables.docx (contents, then every table on
/// new pages) when Word output is requested, all-tables.xlsx (one sheet per table and the
/// "results" sheet) when Excel output is; tables in table-number order (<see cref="TableIdOrder"/>).
/// </summary>
public static class CombinedOutputs
{
    public static void Write(OutputStaging staging, IReadOnlyList<ITableRenderer> renderers, IReadOnlyList<LaidOutTable> tables, DateTimeOffset runTime)
    {
        var ordered = tables.OrderBy(t => t.Document.TableId, TableIdOrder.Instance).ToList();
        var documents = ordered.Select(t => t.Document).ToList();
        if (renderers.Any(r => r is WordTableRenderer))
        {
            Save(staging, OutputFileNames.Combined + ".docx", runTime, s => new WordCombinedRenderer().Write(documents, s));
        }
        if (renderers.Any(r => r is ExcelTableRenderer))
        {
            var records = ordered.SelectMany(t => t.Records).ToList();
            Save(staging, OutputFileNames.Combined + ".xlsx", runTime, s => new ExcelWorkbookRenderer().Write(documents, s, records));
        }
    }

    private static void Save(OutputStaging staging, string name, DateTimeOffset runTime, Action<Stream> render)
    {
        using var buffer = new MemoryStream();
        render(buffer);
        var bytes = PackageNormalizer.Normalize(buffer.ToArray(), runTime);
        using var stream = staging.Create(name);
        stream.Write(bytes);
    }
}
