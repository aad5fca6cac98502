using System.Runtime.ExceptionServices;

namespace OutputForge.Pipeline;

/// <summary>
/// Runs independent pieces of work on all cores and, when some fail, rethrows the error of the first failing
/// piece in the given order (not an AggregateException, and not whichever thread failed first), so that a
/// failed run reports the same one-line error every time.
/// </summary>
internal static class InOrderParallel
{
    public static void For(int count, Action<int> body)
    {
        var failures = new Exception?[count];
        Parallel.For(0, count, new ParallelOptions { MaxDegreeOfParallelism = Environment.ProcessorCount }, i =>
        {
            try
            {
                body(i);
            }
            catch (Exception e)
            {
                failures[i] = e;
            }
        });
        if (failures.FirstOrDefault(f => f is not null) is { } failure)
        {
            ExceptionDispatchInfo.Capture(failure).Throw();
        }
    }

    public static void Invoke(params Action[] actions) => For(actions.Length, i => actions[i]());
}
