using System.Runtime.ExceptionServices;

namespace OutputForge.Common;

/// <summary>
/// Runs independent pieces of work on all cores and, when some fail, rethrows the error of the first failing
/// piece in the given order (not an AggregateException, and not whichever thread failed first), so that a
/// failed run reports the same one-line error every time.
/// </summary>
internal static class InOrderParallel
{
    /// <param name="order">The order in which the cores take up the pieces (a permutation of 0..count-1); by index when null.</param>
    public static void For(int count, Action<int> body, IReadOnlyList<int>? order = null)
    {
        var failures = new Exception?[count];
        var next = -1;
        void Work()
        {
            int taken;
            while ((taken = Interlocked.Increment(ref next)) < count)
            {
                var i = order?[taken] ?? taken;
                try
                {
                    body(i);
                }
                catch (Exception e)
                {
                    failures[i] = e;
                }
            }
        }
        // Each worker takes the next piece in the order when it is free (Parallel.For would split the range between
        // the workers up front and ignore the order).
        var helpers = Enumerable.Range(1, Math.Max(0, Math.Min(Environment.ProcessorCount, count) - 1))
            .Select(_ => Task.Factory.StartNew(Work, CancellationToken.None, TaskCreationOptions.LongRunning, TaskScheduler.Default))
            .ToArray();
        Work();
        Task.WaitAll(helpers);
        if (failures.FirstOrDefault(f => f is not null) is { } failure)
        {
            ExceptionDispatchInfo.Capture(failure).Throw();
        }
    }

    public static void Invoke(params Action[] actions) => For(actions.Length, i => actions[i]());
}
