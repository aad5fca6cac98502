using OutputForge.Data;

namespace OutputForge.Tests.Data;

/// <summary>The records of one parameter at one visit: the rows in both ascending lists, ascending.</summary>
public sealed class SortedRowsTests
{
    [Theory]
    [InlineData(new[] { 1, 3, 5, 7, 9 }, new[] { 0, 3, 4, 9, 12 }, new[] { 3, 9 })]
    [InlineData(new[] { 2, 4 }, new[] { 1, 3, 5 }, new int[0])]
    [InlineData(new int[0], new[] { 1, 2 }, new int[0])]
    [InlineData(new[] { 0, 1, 2 }, new[] { 0, 1, 2 }, new[] { 0, 1, 2 })]
    public void Intersection_keeps_the_rows_in_both_in_order(int[] first, int[] second, int[] expected)
    {
        Assert.Equal(expected, SortedRows.Intersection(first, second));
        Assert.Equal(expected, SortedRows.Intersection(second, first));
    }

    [Fact]
    public void Intersection_of_random_lists_equals_the_set_intersection()
    {
        // A fixed seed, so a failure repeats.
        var random = new Random(20261202);
        for (var trial = 0; trial < 200; trial++)
        {
            var first = Enumerable.Range(0, 300).Where(_ => random.Next(3) == 0).ToArray();
            var second = Enumerable.Range(0, 300).Where(_ => random.Next(4) == 0).ToArray();
            Assert.Equal(first.Intersect(second).Order(), SortedRows.Intersection(first, second));
        }
    }
}
