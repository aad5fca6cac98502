namespace OutputForge.Tests.Snapshots;

public sealed class LineDiffTests
{
    [Fact]
    public void A_changed_line_shows_as_removed_then_added_with_context()
    {
        string[] approved = ["a", "b", "c", "d", "e", "f", "g"];
        string[] received = ["a", "b", "c", "D", "e", "f", "g"];

        var diff = LineDiff.Describe(approved, received);

        Assert.Equal("  ...\n  b\n  c\n- d\n+ D\n  e\n  f\n", diff);
    }
}
