using OutputForge.Pipeline;

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
        InOrderParallel.For(order.Length, i =>
        {
            lock (taken)
            {
                taken.Add(i);
            }
            Thread.Sleep(5);
        }, order);
        // Workers take the next piece when free: a piece starts at most (cores - 1) places from its place in the order.
        for (var k = 0; k < order.Length; k++)
        {
            Assert.InRange(taken.IndexOf(order[k]), k - Environment.ProcessorCount + 1, k + Environment.ProcessorCount - 1);
        }
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
