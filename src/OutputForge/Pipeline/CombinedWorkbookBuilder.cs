using OutputForge.Layout;
using OutputForge.Rendering;
using OutputForge.Rendering.Excel;

namespace OutputForge.Pipeline;

/// <summary>
/// Builds the combined all-tables.xlsx on its own thread while the tables are still being built: each table's sheet
/// is written, in table-number order, as soon as that table is ready, then the results sheet. Only saving the workbook
/// is left for after the last table, instead of the whole workbook (the largest single piece of a run's work after
/// the tables). The file is the same as writing all the sheets at the end.
/// </summary>
internal sealed class CombinedWorkbookBuilder
{
    private readonly TaskCompletionSource<LaidOutTable>[] _tables;
    private readonly int[] _order;
    private readonly Task<byte[]> _bytes;

    /// <param name="tableIds">The ids of the tables to come, by index.</param>
    public CombinedWorkbookBuilder(IReadOnlyList<string> tableIds, DateTimeOffset runTime)
    {
        _tables = tableIds.Select(_ => new TaskCompletionSource<LaidOutTable>(TaskCreationOptions.RunContinuationsAsynchronously)).ToArray();
        _order = Enumerable.Range(0, tableIds.Count).OrderBy(i => tableIds[i], TableIdOrder.Instance).ToArray();
        _bytes = Task.Factory.StartNew(() => Render(runTime), CancellationToken.None, TaskCreationOptions.LongRunning, TaskScheduler.Default);
    }

    public void Ready(int index, LaidOutTable table) => _tables[index].TrySetResult(table);

    /// <summary>No table will come at <paramref name="index"/> (it failed): the workbook is given up.</summary>
    public void Abandon(int index) => _tables[index].TrySetCanceled();

    /// <summary>The normalized bytes of the workbook, once every table is <see cref="Ready"/>.</summary>
    public byte[] Bytes() => _bytes.GetAwaiter().GetResult();

    /// <summary>Gives the workbook up after a failed run and waits for its thread to stop.</summary>
    public void AbandonAll()
    {
        for (var i = 0; i < _tables.Length; i++)
        {
            Abandon(i);
        }
        try
        {
            _bytes.Wait();
        }
        catch (AggregateException)
        {
            // The run reports the table's own error; the workbook's is a consequence of it.
        }
    }

    /// <summary>Where the workbook's time went (for --verbose): waiting for tables, their sheets, the results sheet and saving.</summary>
    public string Times => _times.ToString();

    private readonly StageTimes _times = new();

    private byte[] Render(DateTimeOffset runTime)
    {
        var tables = new List<LaidOutTable>();
        var waiting = TimeSpan.Zero;
        IEnumerable<TableDocument> InOrder()
        {
            foreach (var i in _order)
            {
                var clock = System.Diagnostics.Stopwatch.StartNew();
                var table = _tables[i].Task.GetAwaiter().GetResult();
                waiting += clock.Elapsed;
                tables.Add(table);
                yield return table.Document;
            }
        }
        IReadOnlyList<Results.ResultRecord> Records()
        {
            _times.Lap($"waiting for tables {waiting.TotalMilliseconds:0}, sheets");
            return tables.SelectMany(t => t.Records).ToList();
        }
        using var buffer = new MemoryStream();
        new ExcelWorkbookRenderer().WriteInOrder(InOrder(), buffer, Records);
        _times.Lap("results sheet and saving");
        var bytes = PackageNormalizer.Normalize(buffer.ToArray(), runTime);
        _times.Lap("normalizing");
        return bytes;
    }
}
