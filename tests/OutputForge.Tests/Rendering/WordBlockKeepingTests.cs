using OutputForge.Layout;
using OutputForge.Rendering.Word;

namespace OutputForge.Tests.Rendering;

/// <summary>Which Word rows keep with the next: short blocks whole, long blocks only their section label.</summary>
public sealed class WordBlockKeepingTests
{
    private static BodyRow Data(string label) => new(label, 1, [], RowKind.Data);

    private static BodyRow Section(string label) => new(label, 0, [], RowKind.Section);

    [Fact]
    public void A_short_block_is_kept_whole_up_to_its_last_row()
    {
        var rows = new[] { Section("Week 4"), Data("n"), Data("Better"), Data("Worse"), BodyRow.Blank(0), Section("Week 8"), Data("n") };

        var keep = WordBlockKeeping.KeepWithNext(rows);

        Assert.Equal([true, true, true, false, false, true, false], keep);
    }

    [Fact]
    public void A_long_block_keeps_only_its_section_label_with_the_first_row()
    {
        var rows = new List<BodyRow> { Section("System organ class") };
        rows.AddRange(Enumerable.Range(1, WordBlockKeeping.MaxKeptRows).Select(i => Data($"Term {i}")));

        var keep = WordBlockKeeping.KeepWithNext(rows);

        Assert.True(keep[0]);
        Assert.All(keep.Skip(1), Assert.False);
    }
}
