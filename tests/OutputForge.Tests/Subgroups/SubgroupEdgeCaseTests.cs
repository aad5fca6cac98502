using OutputForge.Spec;
using OutputForge.Stats;
using static OutputForge.Tests.Subgroups.SubgroupStudy;
using OutputForge.Rendering.Figures;

namespace OutputForge.Tests.Subgroups;

/// <summary>
/// Levels too small to estimate, empty cells, separation and unknown names: each is reported as NE or a
/// located error with its reason in the warnings, never as a number. Data invented here.
/// </summary>
public sealed class SubgroupEdgeCaseTests
{
    private static readonly Cell[] Balanced =
    [
        new("Placebo", "F", "North", 6, 14), new("Placebo", "M", "North", 5, 15),
        new("Active", "F", "North", 12, 8), new("Active", "M", "North", 9, 11),
        new("Placebo", "F", "South", 2, 1), new("Active", "F", "South", 3, 0),
    ];

    [Fact]
    public void A_level_below_the_minimum_has_counts_but_no_effect_and_says_why()
    {
        var result = Analyze("""{ "variables": [ { "variable": "REGION1" } ] }""", Balanced);
        Assert.Equal(3, Value(result, "region1/south", "active", "n").Value);
        Assert.Equal(3, Value(result, "region1/south", "active", "N").Value);
        var effect = Value(result, "region1/south", "active-vs-placebo", "estimate");
        Assert.Null(effect.Value);
        Assert.Contains("fewer than the minimum of 5", effect.NotEstimableReason);
        Assert.Contains(OutputForge.Layout.TableNotes.Of(result).Warnings, w => w.StartsWith("REGION1 South, Active vs Placebo: difference not estimated: Active has 3 subjects and Placebo has 3 subjects, fewer than the minimum of 5", StringComparison.Ordinal));
        Assert.NotNull(Value(result, "region1/north", "active-vs-placebo", "estimate").Value);
    }

    [Fact]
    public void An_empty_cell_gives_no_odds_ratio_and_separation_gives_no_interaction_p_value()
    {
        var result = Analyze("""{ "variables": [ { "variable": "REGION1" } ], "measure": "odds-ratio", "minimumPerArm": 1 }""", Balanced);
        var odds = Value(result, "region1/south", "active-vs-placebo", "estimate");
        Assert.Null(odds.Value);
        Assert.Contains("zero", odds.NotEstimableReason);
        var p = Value(result, "region1/interaction", "active-vs-placebo", "pValue");
        Assert.Null(p.Value);
        Assert.Contains("quasi-complete separation", p.NotEstimableReason);
        Assert.Contains(OutputForge.Layout.TableNotes.Of(result).Warnings, w => w.Contains("REGION1 interaction, Active vs Placebo: no p-value", StringComparison.Ordinal)
            && w.Contains("separation", StringComparison.Ordinal));
    }

    [Fact]
    public void Breslow_Day_is_the_Stats_test_on_the_levels_as_strata()
    {
        var result = Analyze("""{ "variables": [ { "variable": "SEX" } ], "interaction": "breslow-day" }""", Balanced);
        // Female: Active 15/23, Placebo 8/23; Male: Active 9/20, Placebo 5/20.
        var expected = BreslowDayTest.Compute([new StratumCounts(15, 23, 8, 23), new StratumCounts(9, 20, 5, 20)], taroneCorrection: false);
        Assert.Equal(expected.PValue, Value(result, "sex/interaction", "active-vs-placebo", "pValue").Value);
        Assert.Equal(BreslowDayTest.MethodName, Value(result, "sex/interaction", "active-vs-placebo", "pValue").Method);
    }

    [Fact]
    public void A_level_without_subjects_of_an_arm_is_left_out_of_the_interaction_test_with_a_note()
    {
        var cells = Balanced.Append(new Cell("Active", "M", "West", 4, 4)).ToArray();
        var result = Analyze("""{ "variables": [ { "variable": "REGION1", "levels": [ { "value": "North" }, { "value": "South" }, { "value": "West" } ] } ], "interaction": "breslow-day-tarone", "minimumPerArm": 1 }""", cells);
        Assert.Equal(0, Value(result, "region1/west", "placebo", "N").Value);
        Assert.Contains("REGION1 interaction, Active vs Placebo: Level West has no subjects in Placebo and was left out of the interaction test.",
            OutputForge.Layout.TableNotes.Of(result).Warnings);
        Assert.NotNull(Value(result, "region1/interaction", "active-vs-placebo", "pValue").Value);
    }

    [Fact]
    public void A_level_the_Breslow_Day_test_leaves_out_is_named_by_its_label()
    {
        // West has no responder in either arm: no variability, so the Breslow-Day test leaves it out; the warning names
        // the level by its label, not by its position among the levels given to the test.
        var cells = Balanced.Append(new Cell("Placebo", "M", "West", 0, 5)).Append(new Cell("Active", "M", "West", 0, 6)).ToArray();
        var result = Analyze("""{ "variables": [ { "variable": "REGION1", "levels": [ { "value": "North" }, { "value": "South" }, { "value": "West" } ] } ], "interaction": "breslow-day", "minimumPerArm": 1 }""", cells);
        var warnings = OutputForge.Layout.TableNotes.Of(result).Warnings;
        Assert.Contains("REGION1 interaction, Active vs Placebo: Level West has no events, so no variability, and was left out of the Breslow-Day test.", warnings);
        Assert.DoesNotContain(warnings, w => w.Contains("Stratum", StringComparison.Ordinal));
    }

    [Fact]
    public void Subjects_outside_the_listed_levels_are_counted_in_a_warning()
    {
        var result = Analyze("""{ "variables": [ { "variable": "REGION1", "label": "Region", "levels": [ { "value": "North", "label": "Northern sites" } ] } ] }""", Balanced);
        Assert.Equal("Northern sites", result.Rows.Single(r => r.Key == "region1/north").Label);
        Assert.Contains(OutputForge.Layout.TableNotes.Of(result).Warnings, w => w.Contains("6 subjects have a value of REGION1 that the spec does not list ('South')", StringComparison.Ordinal));
    }

    [Fact]
    public void An_unknown_subgroup_variable_is_a_located_spec_error()
    {
        var error = Assert.Throws<SpecException>(() => Analyze("""{ "variables": [ { "variable": "SEX" }, { "variable": "REGIONX" } ] }""", Balanced));
        var problem = Assert.Single(error.Problems);
        Assert.Equal("$.subgroups.variables[1].variable", problem.JsonPath);
        Assert.NotNull(problem.Line);
        Assert.Contains("no variable REGIONX", error.Message);
    }

    [Fact]
    public void A_listed_level_missing_from_the_data_is_a_located_spec_error()
    {
        var error = Assert.Throws<SpecException>(() => Analyze("""{ "variables": [ { "variable": "SEX", "levels": [ { "value": "F" }, { "value": "X" } ] } ] }""", Balanced));
        var problem = Assert.Single(error.Problems);
        Assert.Equal("$.subgroups.variables[0].levels[1].value", problem.JsonPath);
        Assert.NotNull(problem.Line);
        Assert.Contains("'X' is not a value of SEX", error.Message);
    }

    [Theory]
    [InlineData("""{ "variables": [ { "variable": "SEX" } ], "measure": "hazard-ratio" }""", "measure")]
    [InlineData("""{ "variables": [ { "variable": "SEX" } ], "interaction": "wald" }""", "interaction")]
    [InlineData("""{ "measure": "difference" }""", "variables")]
    public void An_unknown_method_or_a_missing_list_is_a_schema_error(string subgroups, string key)
    {
        var error = Assert.Throws<SpecException>(() => Analyze(subgroups, Balanced));
        Assert.Contains(key, error.Message);
    }

    [Fact]
    public void Without_the_plot_setting_the_table_has_no_figure_and_with_it_the_same_bytes_each_time()
    {
        Assert.Null(Analyze("""{ "variables": [ { "variable": "SEX" } ], "forestPlot": false }""", Balanced).Figure);
        var first = Analyze("""{ "variables": [ { "variable": "SEX" } ], "measure": "relative-risk" }""", Balanced).Figure!;
        var second = Analyze("""{ "variables": [ { "variable": "SEX" } ], "measure": "relative-risk" }""", Balanced).Figure!;
        Assert.Equal(FigurePainter.Paint(first).Png, FigurePainter.Paint(second).Png);
        Assert.Equal([0x89, (byte)'P', (byte)'N', (byte)'G'], FigurePainter.Paint(first).Png.Take(4).ToArray());
        Assert.Equal("forest", first.Name);
        Assert.Contains("Forest plot for Table 9.1: relative risk", first.AltText);
        Assert.Contains("no effect is at 1", first.AltText);
    }

    [Fact]
    public void Figures_drawn_at_the_same_time_have_the_bytes_of_one_drawn_alone()
    {
        // A run builds its tables in parallel, so several forest plots may be drawn at once.
        const string settings = """{ "variables": [ { "variable": "SEX" }, { "variable": "REGION1" } ], "minimumPerArm": 1 }""";
        var alone = FigurePainter.Paint(Analyze(settings, Balanced).Figure!).Png;
        var together = new byte[6][];
        Parallel.For(0, together.Length, i => together[i] = FigurePainter.Paint(Analyze(settings, Balanced).Figure!).Png);
        Assert.All(together, png => Assert.Equal(alone, png));
    }
}
