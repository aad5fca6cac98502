using OutputForge.Layout;
using OutputForge.Rendering;
using OutputForge.Rendering.Excel;
using OutputForge.Rendering.Word;
using OutputForge.Common;

namespace OutputForge.Pipeline;

/// <summary>
/// The combined outputs of a run (--combined): all-tables.docx (contents, then every table on
/// new pages) when Word output is requested, all-tables.xlsx (one sheet per table and the
/// "results" sheet) when Excel output is; tables in table-number order (<see cref="TableIdOrder"/>).
/// </summary>
public static class CombinedOutputs
{
    /// <summary>The combined files' names and bytes, each document rendered on its own core.</summary>
    /// <param name="workbook">The combined workbook when it was built beside the tables (<see cref="CombinedWorkbookBuilder"/>).</param>
    internal static IReadOnlyList<(string Name, byte[] Bytes)> Render(IReadOnlyList<ITableRenderer> renderers, IReadOnlyList<LaidOutTable> tables,
        DateTimeOffset runTime, CombinedWorkbookBuilder? workbook = null)
    {
        var ordered = tables.OrderBy(t => t.Document.TableId, TableIdOrder.Instance).ToList();
        var documents = ordered.Select(t => t.Document).ToList();
        var jobs = new List<(string Name, Func<byte[]> Render)>();
        if (renderers.Any(r => r is WordTableRenderer))
        {
            jobs.Add((OutputFileNames.Combined + ".docx", () => Bytes(s => new WordCombinedRenderer().Write(documents, s), runTime)));
        }
        if (renderers.Any(r => r is ExcelTableRenderer))
        {
            jobs.Add((OutputFileNames.Combined + ".xlsx", workbook is not null ? workbook.Bytes : () => Bytes(s =>
                new ExcelWorkbookRenderer().Write(documents, s, ordered.SelectMany(t => t.Records).ToList()), runTime)));
        }
        var bytes = new byte[jobs.Count][];
        InOrderParallel.For(jobs.Count, i => bytes[i] = jobs[i].Render());
        return jobs.Select((job, i) => (job.Name, bytes[i])).ToList();
    }

    private static byte[] Bytes(Action<Stream> render, DateTimeOffset runTime)
    {
        using var buffer = new MemoryStream();
        render(buffer);
        return PackageNormalizer.Normalize(buffer.ToArray(), runTime);
    }
}
