using System.Diagnostics;
using OutputForge.Common;
using OutputForge.Spec;

namespace OutputForge.Pipeline;

/// <summary>
/// Builds the selected tables in parallel (each reads the shared, immutable datasets) and returns them in package order,
/// the slow kinds started first (<see cref="TableWorkOrder"/>). When tables fail, the first failing table's error is the
/// one reported, so the message does not depend on thread timing.
/// </summary>
internal static class TableRunLoop
{
    public static BuiltTable[] BuildAll(IReadOnlyList<TableSpec> selected, TableBuilder builder, IRunLog log, CombinedWorkbookBuilder? workbook)
    {
        var built = new BuiltTable[selected.Count];
        var done = 0;
        // The tables already keep every core busy; MathNet's own threads inside a factorization would only contend with
        // them (spinning and waiting). Each column of its algorithms is computed the same way on one thread.
        MathNet.Numerics.Control.UseSingleThread();
        InOrderParallel.For(selected.Count, i =>
        {
            try
            {
                var clock = Stopwatch.StartNew();
                built[i] = builder.Build(selected[i]);
                workbook?.Ready(i, built[i].Table);
                log.Detail($"table {selected[i].Id}: built in {clock.Elapsed.TotalMilliseconds:0} ms ({built[i].Times})");
            }
            catch
            {
                workbook?.Abandon(i);
                throw;
            }
            finally
            {
                log.Progress(Interlocked.Increment(ref done), selected.Count, selected[i].Id);
            }
        }, TableWorkOrder.Of(selected));
        return built;
    }
}
