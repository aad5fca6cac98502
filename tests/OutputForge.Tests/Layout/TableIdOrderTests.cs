using OutputForge.Layout;

namespace OutputForge.Tests.Layout;

public sealed class TableIdOrderTests
{
    [Fact]
    public void Table_numbers_sort_part_by_part_with_numbers_as_numbers()
    {
        string[] ids = ["14.2.1.10", "14.3.1", "14.2.1.9", "14.2", "14.2.1", "14.1.2a", "14.1.2", "14.10.1", "14.2.1.2"];

        var sorted = ids.Order(TableIdOrder.Instance).ToList();

        Assert.Equal(["14.1.2", "14.1.2a", "14.2", "14.2.1", "14.2.1.2", "14.2.1.9", "14.2.1.10", "14.3.1", "14.10.1"], sorted);
    }

    [Fact]
    public void Leading_zeros_do_not_make_two_ids_equal()
    {
        Assert.NotEqual(0, TableIdOrder.Instance.Compare("14.02", "14.2"));
    }
}
