using OutputForge.Tests.Support;

namespace OutputForge.Tests.AdverseEvents;

/// <summary>
/// The adverse-event kind on the hand-countable <see cref="SummaryStudy"/>. Safety population:
/// placebo S01, S02 (N = 2); active S05-S08 (N = 4). Treatment-emergent events: S01 nausea x2
/// (mild, severe) and abdominal pain, S02 headache, S05 and S06 nausea, S08 dizziness.
/// </summary>
public sealed class AdverseEventAnalysisTests
{
    private const string Table = """
        {
          "id": "14.3.1", "title": ["TEAEs"], "population": "safety", "kind": "adverse-events",
          "adverseEvents": { "where": "TRTEMFL = 'Y'", "events": true, "test": "fisher", "total": true }
        }
        """;

    [Fact]
    public void Counts_subjects_once_per_row_and_events_separately()
    {
        using var study = new SummaryStudy(Table);
        var result = study.Analyze();
        Assert.Equal([2, 4, 6], result.Columns.Where(c => c.SubjectCount is not null).Select(c => c.SubjectCount!.Value));
        Assert.Equal("2 (100.0) [4]", SummaryStudy.Displayed(result, "any", "placebo"));
        Assert.Equal("3 (75.0) [3]", SummaryStudy.Displayed(result, "any", "active"));
        Assert.Equal("1 (50.0) [3]", SummaryStudy.Displayed(result, "soc-gastrointestinal-disorders", "placebo"));
        Assert.Equal("1 (50.0) [2]", SummaryStudy.Displayed(result, "soc-gastrointestinal-disorders/pt-nausea", "placebo"));
        // S03's nausea is outside the safety population and S07's headache is not treatment-emergent.
        Assert.Equal("2 (50.0) [2]", SummaryStudy.Displayed(result, "soc-gastrointestinal-disorders/pt-nausea", "active"));
        Assert.Equal("0", SummaryStudy.Displayed(result, "soc-nervous-system-disorders/pt-headache", "active"));
        Assert.Equal("3 (50.0) [4]", SummaryStudy.Displayed(result, "soc-gastrointestinal-disorders/pt-nausea", "total"));
    }

    [Fact]
    public void Rows_are_nested_and_sorted_alphabetically_by_default()
    {
        using var study = new SummaryStudy(Table);
        var keys = study.Analyze().Rows.Where(r => r.Kind == OutputForge.Results.ResultRowKind.Data).Select(r => r.Key);
        Assert.Equal(
        [
            "any",
            "soc-gastrointestinal-disorders", "soc-gastrointestinal-disorders/pt-abdominal-pain", "soc-gastrointestinal-disorders/pt-nausea",
            "soc-nervous-system-disorders", "soc-nervous-system-disorders/pt-dizziness", "soc-nervous-system-disorders/pt-headache",
        ], keys);
    }

    [Fact]
    public void Sorting_by_frequency_uses_the_chosen_column()
    {
        using var study = new SummaryStudy(Table.Replace("\"test\": \"fisher\"", "\"sort\": { \"by\": \"frequency\", \"column\": \"total\" }"));
        var keys = study.Analyze().Rows.Select(r => r.Key).Where(k => k.Contains("/pt-", StringComparison.Ordinal)).ToList();
        // Nausea 3 subjects before abdominal pain 1; dizziness and headache 1 each, then alphabetical.
        Assert.Equal(
        [
            "soc-gastrointestinal-disorders/pt-nausea", "soc-gastrointestinal-disorders/pt-abdominal-pain",
            "soc-nervous-system-disorders/pt-dizziness", "soc-nervous-system-disorders/pt-headache",
        ], keys);
    }

    [Fact]
    public void Fisher_p_values_compare_each_active_arm_with_the_control()
    {
        using var study = new SummaryStudy(Table);
        var result = study.Analyze();
        // Abdominal pain: active 0 of 4, placebo 1 of 2. With one subject having the event, the tables are
        // "on active" (probability 4/6) or "on placebo" (2/6, observed): two-sided p = 2/6 (hand computation).
        Assert.Equal(2.0 / 6.0, SummaryStudy.Value(result, "soc-gastrointestinal-disorders/pt-abdominal-pain", "p-value-active", "pValue")!.Value, 12);
        Assert.Contains(OutputForge.Layout.TableNotes.Of(result).Footnotes, n => n.StartsWith("[a] Two-sided p-value from Fisher's exact test", StringComparison.Ordinal));
    }

    [Fact]
    public void The_threshold_keeps_terms_reported_by_enough_subjects_in_any_arm()
    {
        using var study = new SummaryStudy(Table.Replace("\"events\": true", "\"threshold\": { \"percent\": 50 }"));
        var result = study.Analyze();
        var terms = result.Rows.Select(r => r.Key).Where(k => k.Contains("/pt-", StringComparison.Ordinal)).ToList();
        // Exactly 50%: nausea (1 of 2, 2 of 4), abdominal pain and headache (1 of 2 placebo) stay; dizziness (1 of 4 = 25%) goes,
        // but the nervous system class still counts it.
        Assert.DoesNotContain("soc-nervous-system-disorders/pt-dizziness", terms);
        Assert.Equal(3, terms.Count);
        Assert.Equal("1 (25.0)", SummaryStudy.Displayed(result, "soc-nervous-system-disorders", "active"));
    }

    [Fact]
    public void The_severity_variant_counts_each_subject_at_its_maximum_severity()
    {
        using var study = new SummaryStudy(Table.Replace("\"test\": \"fisher\"",
            "\"severity\": { \"levels\": [ { \"value\": \"MILD\" }, { \"value\": \"MODERATE\" }, { \"value\": \"SEVERE\" } ] }"));
        var result = study.Analyze();
        const string nausea = "soc-gastrointestinal-disorders/pt-nausea";
        // S01 had mild then severe nausea: counted once, as severe; both events are in the term's [E].
        Assert.Equal("1 (50.0) [2]", SummaryStudy.Displayed(result, nausea, "placebo"));
        Assert.Equal("0", SummaryStudy.Displayed(result, nausea + "/severity-mild", "placebo"));
        Assert.Equal("1 (50.0)", SummaryStudy.Displayed(result, nausea + "/severity-severe", "placebo"));
        Assert.Equal("1 (25.0)", SummaryStudy.Displayed(result, nausea + "/severity-mild", "active"));
        Assert.Equal("1 (25.0)", SummaryStudy.Displayed(result, nausea + "/severity-moderate", "active"));
        Assert.Equal(1, SummaryStudy.Value(result, "any/severity-severe", "placebo", "n"));
        Assert.Equal(1, SummaryStudy.Value(result, "any/severity-moderate", "placebo", "n"));
    }

    [Fact]
    public void A_severity_value_outside_the_levels_is_a_located_spec_error()
    {
        using var study = new SummaryStudy(Table.Replace("\"test\": \"fisher\"",
            "\"severity\": { \"levels\": [ { \"value\": \"MILD\" }, { \"value\": \"SEVERE\" } ] }"));
        var error = Assert.Throws<OutputForge.Spec.SpecException>(study.Analyze);
        Assert.Contains("AESEV value 'MODERATE'", error.Message);
        Assert.Contains("$.adverseEvents.severity.levels", error.Message);
    }

    [Fact]
    public void An_unknown_sort_column_is_a_located_spec_error()
    {
        using var study = new SummaryStudy(Table.Replace("\"test\": \"fisher\"", "\"sort\": { \"by\": \"frequency\", \"column\": \"Activ\" }"));
        var error = Assert.Throws<OutputForge.Spec.SpecException>(study.Analyze);
        Assert.Contains("'Activ' is neither 'total' nor an arm of TRT01A (did you mean 'Active'?)", error.Message);
    }
}
