using OutputForge.Pipeline;
using OutputForge.Common;

namespace OutputForge.Tests.Pipeline;

/// <summary>
/// The tables of a run are built on all cores in a chosen order, and a failed run reports the error of the first
/// failing table in package order, whichever thread failed first, so that the message does not depend on timing.
/// </summary>
public sealed class InOrderParallelTests
{
    [Fact]
    public void Every_piece_runs_once_and_the_first_failure_by_index_is_the_one_rethrown()
    {
        var runs = new int[60];
        // Taken up from the last index down: the failure of piece 41 happens first, that of piece 7 is reported.
        var order = Enumerable.Range(0, 60).Reverse().ToArray();
        var error = Assert.Throws<InvalidOperationException>(() => InOrderParallel.For(60, i =>
        {
            Interlocked.Increment(ref runs[i]);
            if (i is 7 or 41)
            {
                throw new InvalidOperationException($"piece {i}");
            }
        }, order));
        Assert.Equal("piece 7", error.Message);
        Assert.All(runs, count => Assert.Equal(1, count));
    }

    [Fact]
    public void Pieces_are_taken_up_in_the_given_order()
    {
        var order = new[] { 5, 0, 9, 1, 8, 2, 7, 3, 6, 4 };
        var taken = new List<int>();
        var recorded = 0;
        // A piece is taken up by a free worker in the given order, but a worker may be paused between taking a piece
        // and running it. So each piece waits until the piece before it in the order has recorded itself: the
        // records then follow the order in which the pieces were taken. A runner that ignored the order (e.g. ranges
        // split between workers up front) leaves some piece waiting for one no worker takes next, and the wait ends
        // in a failure instead of a hang.
        InOrderParallel.For(order.Length, i =>
        {
            var position = Array.IndexOf(order, i);
            if (!SpinWait.SpinUntil(() => Volatile.Read(ref recorded) == position, TimeSpan.FromSeconds(30)))
            {
                throw new InvalidOperationException($"piece {i} (position {position}) was taken up before the pieces ahead of it");
            }
            lock (taken)
            {
                taken.Add(i);
            }
            Interlocked.Increment(ref recorded);
        }, order);
        Assert.Equal(order, taken);
    }

    [Fact]
    public void Invoke_rethrows_the_first_failing_action_not_an_aggregate()
    {
        var error = Assert.Throws<ArgumentException>(() => InOrderParallel.Invoke(
            () => Thread.Sleep(20),
            () => throw new ArgumentException("second"),
            () => throw new ArgumentException("third")));
        Assert.Equal("second", error.Message);
    }
}
