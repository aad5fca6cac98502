using OutputForge.Layout;
using OutputForge.Results;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.Disposition;

/// <summary>The disposition kind on the hand-countable <see cref="SummaryStudy"/>.</summary>
public sealed class DispositionAnalysisTests
{
    private const string Table = """
        {
          "id": "14.1.2", "title": ["Disposition"], "population": "randomized", "kind": "disposition",
          "disposition": {
            "blocks": [
              { "variable": "EOSSTT", "label": "Status", "levels": [ { "value": "COMPLETED", "label": "Completed" }, { "value": "DISCONTINUED", "label": "Discontinued" } ], "test": "fisher" },
              { "variable": "DCSREAS", "label": "Reason", "where": "EOSSTT = 'DISCONTINUED'", "order": "frequency", "test": "chi-square" }
            ]
          }
        }
        """;

    [Fact]
    public void Counts_status_and_reasons_with_percentages_of_the_column_n()
    {
        using var study = new SummaryStudy(Table);
        var result = study.Analyze();
        Assert.Equal("2 (50.0)", SummaryStudy.Displayed(result, "eosstt/completed", "placebo"));
        Assert.Equal("3 (75.0)", SummaryStudy.Displayed(result, "eosstt/completed", "active"));
        Assert.Equal("1 (25.0)", SummaryStudy.Displayed(result, "eosstt/discontinued", "active"));
        // Reasons among the discontinued, still of all randomized (N = 4): ADVERSE EVENT 1 and 1, WITHDRAWAL 1 and 0.
        Assert.Equal("1 (25.0)", SummaryStudy.Displayed(result, "dcsreas/adverse-event", "active"));
        Assert.Equal("0", SummaryStudy.Displayed(result, "dcsreas/withdrawal-by-subject", "active"));
        // Frequency order: ADVERSE EVENT (2) before WITHDRAWAL BY SUBJECT (1).
        Assert.Equal(["dcsreas/adverse-event", "dcsreas/withdrawal-by-subject"],
            result.Rows.Where(r => r.Key.StartsWith("dcsreas/", StringComparison.Ordinal)).Select(r => r.Key));
    }

    [Fact]
    public void Tests_each_block_on_its_heading_row_and_warns_of_small_expected_counts()
    {
        using var study = new SummaryStudy(Table);
        var result = study.Analyze();
        // Status [[2, 3], [2, 1]]: hypergeometric probabilities 5/70, 30/70, 30/70, 5/70 for 1..4 completers on
        // placebo; the observed 30/70 is the largest, so the two-sided p is 1 (hand computation).
        Assert.Equal(1.0, SummaryStudy.Value(result, "eosstt", "p-value", "pValue")!.Value, 12);
        var notes = TableNotes.Of(result);
        Assert.Contains(notes.Warnings, w => w.StartsWith("Reason: 4 of 4 expected counts are below 5", StringComparison.Ordinal));
        Assert.Contains(notes.Footnotes, n => n.StartsWith("[a] ", StringComparison.Ordinal)
            && n.Contains("Fisher's exact test for Status") && n.Contains("Pearson's chi-square test for Reason"));
        // The warning is data: its kind, what it is about and its numbers (Reason's 2 x 2 table, every expected count below 5).
        var small = Assert.Single(result.Notes, n => n.Kind == NoteKind.SmallExpectedCounts);
        Assert.Equal(("Reason", 4.0, 4.0), (small.Subject.What, small.Number("below"), small.Number("cells")));
    }

    [Fact]
    public void An_unknown_variable_is_a_located_spec_error()
    {
        using var study = new SummaryStudy(Table.Replace("\"variable\": \"DCSREAS\"", "\"variable\": \"DCSREA\""));
        var error = Assert.Throws<OutputForge.Spec.SpecException>(study.Analyze);
        Assert.Contains("ADSL has no variable DCSREA (did you mean 'DCSREAS'?)", error.Message);
        Assert.Contains("$.disposition.blocks[1].variable", error.Message);
    }
}
