using OutputForge.Kinds.CategoricalByVisit;
using OutputForge.Data;
using OutputForge.Results;
using OutputForge.Spec;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.CategoricalByVisit;

/// <summary>The categorical-by-visit kind on hand-countable invented studies: selection, layout, warnings and errors.</summary>
public sealed class CategoricalByVisitAnalysisTests
{
    private const string Adsl =
        "STUDYID,USUBJID,TRT01P,TRT01PN,ITTFL,REG\n" +
        "T1,T1-001,Placebo,0,Y,A\nT1,T1-002,Placebo,0,Y,A\nT1,T1-003,Placebo,0,Y,B\nT1,T1-004,Placebo,0,Y,B\n" +
        "T1,T1-005,Active,1,Y,A\nT1,T1-006,Active,1,Y,A\nT1,T1-007,Active,1,Y,B\nT1,T1-008,Active,1,Y,C\n";

    // Week 8 is listed first in the file; AVISITN orders it after Week 4. T1-004 has an LOCF record at Week 8,
    // T1-003 a missing value at Week 8.
    private const string Adeff =
        "STUDYID,USUBJID,PARAMCD,AVISIT,AVISITN,AVAL,AVALC,ANL01FL,DTYPE\n" +
        "T1,T1-001,IMP,Week 8,8,2,Better,Y,\nT1,T1-002,IMP,Week 8,8,3,Same,Y,\nT1,T1-003,IMP,Week 8,8,,,Y,\n" +
        "T1,T1-005,IMP,Week 8,8,1,Much better,Y,\nT1,T1-006,IMP,Week 8,8,1,Much better,Y,\nT1,T1-007,IMP,Week 8,8,2,Better,Y,\n" +
        "T1,T1-004,IMP,Week 8,8,3,Same,Y,LOCF\n" +
        "T1,T1-001,IMP,Week 4,4,3,Same,Y,\nT1,T1-002,IMP,Week 4,4,2,Better,Y,\nT1,T1-003,IMP,Week 4,4,3,Same,Y,\nT1,T1-004,IMP,Week 4,4,3,Same,Y,\n" +
        "T1,T1-005,IMP,Week 4,4,2,Better,Y,\nT1,T1-006,IMP,Week 4,4,1,Much better,Y,\nT1,T1-007,IMP,Week 4,4,2,Better,Y,\nT1,T1-008,IMP,Week 4,4,1,Much better,Y,\n" +
        "T1,T1-008,IMP,Week 4,4,4,Worse,,\n";

    private const string Categories = """
        [{ "value": 1, "label": "Much better" }, { "value": 2, "label": "Better" }, { "value": 3, "label": "Same" }, { "value": 4, "label": "Worse" }]
        """;

    private static string Table(string settings) => $$"""
        {
          "id": "1", "title": ["Impression by visit"], "population": "itt", "kind": "categorical-by-visit",
          "endpoint": { "dataset": "adeff", "parameter": "IMP", "where": "ANL01FL = 'Y'" },
          "categoricalByVisit": {{settings}}
        }
        """;

    private static TableResult Analyze(MiniStudy study)
    {
        var package = SpecLoader.Load(study.Folder);
        var data = StudyData.Load(package.Study, study.DataFolder);
        return new CategoricalByVisitAnalysis().Analyze(package.Study, package.Tables[0], data);
    }

    private static IReadOnlyList<string> Warnings(TableResult result) => OutputForge.Layout.TableNotes.Of(result).Warnings;

    private static IReadOnlyList<string> Footnotes(TableResult result) => OutputForge.Layout.TableNotes.Of(result).Footnotes;

    private static double? Value(TableResult result, string row, string column, string statistic) =>
        result.Rows.Single(r => r.Key == row).Cells.Single(c => c.Column == column).Values.Single(v => v.Statistic == statistic).Value;

    [Fact]
    public void Visits_follow_avisitn_and_counts_are_of_the_observed_records()
    {
        using var study = new MiniStudy(adsl: Adsl, adeff: Adeff, table: Table($$"""{ "categories": {{Categories}}, "test": "none" }"""));
        var result = Analyze(study);
        Assert.Equal(["week-4", "week-8"], result.Rows.Where(r => r.Kind == ResultRowKind.Section).Select(r => r.Key));
        // Week 8 placebo: T1-001 (2) and T1-002 (3) observed; T1-003 has no value, T1-004 only an LOCF record.
        Assert.Equal(2, Value(result, "week-8/n", "placebo", "n"));
        Assert.Equal(2, Value(result, "week-8/missing", "placebo", "n"));
        Assert.Equal(50, Value(result, "week-8/category-2", "placebo", "percent"));
        // A category nobody chose is still shown, with 0.
        Assert.Equal(0, Value(result, "week-8/category-4", "active", "n"));
        // Week 4 active: T1-008's record without ANL01FL is not selected, its flagged one (1) is.
        Assert.Equal(2, Value(result, "week-4/category-1", "active", "n"));
        Assert.DoesNotContain(result.Columns, c => c.Key.StartsWith("p-value", StringComparison.Ordinal));
        Assert.Contains(Footnotes(result), n => n.Contains("observed responses only (DTYPE empty)", StringComparison.Ordinal));
    }

    [Fact]
    public void Locf_records_fill_the_visits_without_an_observed_response_and_are_counted_in_a_footnote()
    {
        using var study = new MiniStudy(adsl: Adsl, adeff: Adeff, table: Table($$"""{ "categories": {{Categories}}, "imputation": "LOCF", "test": "none" }"""));
        var result = Analyze(study);
        Assert.Equal(3, Value(result, "week-8/n", "placebo", "n"));
        Assert.Equal(2, Value(result, "week-8/category-3", "placebo", "n"));
        Assert.Contains(Footnotes(result), n => n.Contains("imputed by LOCF", StringComparison.Ordinal) && n.Contains("Week 8: 1", StringComparison.Ordinal));
    }

    [Fact]
    public void A_stratum_with_one_subject_is_left_out_and_reported_in_the_footnotes_and_warnings()
    {
        using var study = new MiniStudy(adsl: Adsl, adeff: Adeff, table: Table($$"""{ "categories": {{Categories}}, "strata": ["REG"] }"""));
        var result = Analyze(study);
        // Week 4: REG = C holds T1-008 alone.
        var expected = "Week 4, Active vs Placebo: left out of the test for having fewer than 2 subjects with a response: REG = C (1 subject).";
        Assert.Contains(expected, Warnings(result));
        Assert.Contains(expected, Footnotes(result));
        Assert.Equal(2, Value(result, "week-4/n", "p-value-active", "strata"));
        Assert.Equal(1, Value(result, "week-4/n", "p-value-active", "df"));
        // The note is data: its visit, comparison and strata, worded by Layout.
        var note = Assert.Single(result.Notes, n => n.Kind == NoteKind.StrataTooSmall && n.Role == NoteRole.Warning && n.Subject.Visit == "Week 4");
        Assert.Equal(new NoteSubject(Visit: "Week 4", Arm: "Active", Control: "Placebo"), note.Subject);
        Assert.Equal(["REG = C"], note.List<string>("strata"));
        Assert.Empty(result.MethodNotes);
        Assert.Empty(result.Warnings);
    }

    [Fact]
    public void The_test_footnote_is_lettered_by_the_p_value_columns_that_refer_to_it()
    {
        using var study = new MiniStudy(adsl: Adsl, adeff: Adeff, table: Table($$"""{ "categories": {{Categories}}, "strata": ["REG"] }"""));
        var result = Analyze(study);
        var notes = OutputForge.Layout.TableNotes.Of(result);
        Assert.Equal("Active\nvs Placebo\np-value [a]", notes.ColumnLabel(result.Columns.Single(c => c.Key == "p-value-active")));
        string[] expected = ["N = number of subjects in the ITT Population; n = subjects with a response at the visit. Percentages are of n." +
            " Missing: subjects of the population without a response at the visit (not in the percentages).",
            "Records with PARAMCD = 'IMP' and ANL01FL = 'Y'; observed responses only (DTYPE empty), no imputation of missing values.",
            "[a] Cochran-Mantel-Haenszel row mean scores test (chi-square with 1 degree of freedom), table scores (column scores 1, 2, 3, 4 for the " +
            "categories in the order listed); stratified by REG; 1 to 2 strata by visit and comparison; at each visit separately, each active arm with Placebo, those two arms only. " +
            "Strata with fewer than 2 subjects with a response are left out of a test.",
            "Week 4, Active vs Placebo: left out of the test for having fewer than 2 subjects with a response: REG = C (1 subject).",
            "Week 8, Active vs Placebo: left out of the test for having fewer than 2 subjects with a response: REG = B (1 subject)."];
        Assert.Equal(expected.Length, notes.Footnotes.Count);
        foreach (var (want, got) in expected.Zip(notes.Footnotes))
        {
            Assert.Equal(want, got);
        }
    }

    [Fact]
    public void A_subject_without_a_stratum_stays_in_the_counts_but_not_in_the_test()
    {
        using var study = new MiniStudy(adsl: Adsl.Replace("T1-008,Active,1,Y,C", "T1-008,Active,1,Y,", StringComparison.Ordinal), adeff: Adeff,
            table: Table($$"""{ "categories": {{Categories}}, "strata": ["REG"] }"""));
        var result = Analyze(study);
        Assert.Equal(4, Value(result, "week-4/n", "active", "n"));
        Assert.Contains("Week 4, Active vs Placebo: 1 subject has no value of REG and is left out of the test.", Warnings(result));
        Assert.Contains("Week 4, Active vs Placebo: 1 subject has no value of REG and is left out of the test.", Footnotes(result));
    }

    /// <summary>
    /// Unstratified 2 x J row mean scores with table scores equals (n - 1) r^2, r the Pearson correlation of
    /// arm (0/1) and score (Mantel 1963, the statistic of Landis, Heyman and Koch 1978 for one stratum).
    /// Week 4: placebo scores 3, 2, 3, 3; active 2, 1, 2, 1. By hand Sxy = 0.5 x 6 - 0.5 x 11 = -2.5, Sxx = 2,
    /// Syy = 41 - 8 x 2.125^2 = 4.875, r^2 = 6.25 / 9.75, Q = 7 x 6.25 / 9.75 = 4.4871794871...; p from R 4.2.2
    /// pchisq(Q, 1, lower.tail = FALSE).
    /// </summary>
    [Fact]
    public void The_unstratified_two_arm_statistic_is_n_minus_one_times_the_squared_correlation()
    {
        using var study = new MiniStudy(adsl: Adsl, adeff: Adeff, table: Table($$"""{ "categories": {{Categories}} }"""));
        var result = Analyze(study);
        Assert.Equal(7 * 6.25 / 9.75, Value(result, "week-4/n", "p-value-active", "statistic")!.Value, 12);
        Assert.Equal(0.034149976354555585, Value(result, "week-4/n", "p-value-active", "pValue")!.Value, 12);
    }

    [Fact]
    public void Empty_categories_lower_the_general_association_degrees_of_freedom_with_a_note()
    {
        using var study = new MiniStudy(adsl: Adsl, adeff: Adeff, table: Table($$"""{ "categories": {{Categories}}, "test": "general-association" }"""));
        var result = Analyze(study);
        // Week 4 uses categories 1-3 only: rank (2 - 1)(3 - 1) = 2 instead of 3.
        Assert.Equal(2, Value(result, "week-4/n", "p-value-active", "df"));
        Assert.Contains(Warnings(result), w => w.StartsWith("Week 4, Active vs Placebo: The covariance matrix has rank 2 instead of 3", StringComparison.Ordinal));
        Assert.Contains(Footnotes(result), n => n.Contains("chi-square with 3 degrees of freedom", StringComparison.Ordinal));
    }

    [Fact]
    public void Text_categories_match_avalc_and_take_equally_spaced_scores()
    {
        const string text = """
            [{ "value": "Much better" }, { "value": "Better" }, { "value": "Same" }, { "value": "Worse" }]
            """;
        using var study = new MiniStudy(adsl: Adsl, adeff: Adeff, table: Table($$"""{ "variable": "AVALC", "categories": {{text}}, "scores": "equal-spacing" }"""));
        var result = Analyze(study);
        Assert.Equal(2, Value(result, "week-4/category-better", "active", "n"));
        Assert.Equal(7 * 6.25 / 9.75, Value(result, "week-4/n", "p-value-active", "statistic")!.Value, 12);
    }

    [Fact]
    public void Text_categories_without_scores_cannot_have_table_scores()
    {
        const string text = """[{ "value": "Much better" }, { "value": "Better" }, { "value": "Same" }, { "value": "Worse" }]""";
        using var study = new MiniStudy(adsl: Adsl, adeff: Adeff, table: Table($$"""{ "variable": "AVALC", "categories": {{text}} }"""));
        var error = Assert.Throws<SpecException>(() => Analyze(study));
        Assert.Equal(JsonPositionMap.ToJsonPath("/categoricalByVisit/categories/0"), error.Problems[0].JsonPath);
        Assert.Contains("equal-spacing", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_value_outside_the_categories_is_a_located_error_naming_the_line()
    {
        const string two = """[{ "value": 1 }, { "value": 2 }]""";
        using var study = new MiniStudy(adsl: Adsl, adeff: Adeff, table: Table($$"""{ "categories": {{two}}, "visits": ["Week 4"] }"""));
        var error = Assert.Throws<SpecException>(() => Analyze(study));
        Assert.Equal(JsonPositionMap.ToJsonPath("/categoricalByVisit/categories"), error.Problems[0].JsonPath);
        Assert.Contains("AVAL '3' (adeff.csv line 9)", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void An_imputation_type_needs_a_dtype_variable()
    {
        var noDtype = string.Join("\n", Adeff.Split('\n').Select(l => l.Length == 0 ? l : l[..l.LastIndexOf(',')]));
        using var study = new MiniStudy(adsl: Adsl, adeff: noDtype, table: Table($$"""{ "categories": {{Categories}}, "imputation": "LOCF" }"""));
        var error = Assert.Throws<SpecException>(() => Analyze(study));
        Assert.Equal(JsonPositionMap.ToJsonPath("/categoricalByVisit/imputation"), error.Problems[0].JsonPath);
        Assert.Contains("no DTYPE variable", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void An_unknown_visit_is_a_located_error_with_a_hint()
    {
        using var study = new MiniStudy(adsl: Adsl, adeff: Adeff, table: Table($$"""{ "categories": {{Categories}}, "visits": ["Week 4", "Week 80"] }"""));
        var error = Assert.Throws<SpecException>(() => Analyze(study));
        Assert.Equal(JsonPositionMap.ToJsonPath("/categoricalByVisit/visits/1"), error.Problems[0].JsonPath);
        Assert.Contains("Week 8", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void All_arms_give_one_p_value_column()
    {
        using var study = new MiniStudy(adsl: Adsl, adeff: Adeff, table: Table($$"""{ "categories": {{Categories}}, "comparison": "all-arms", "test": "correlation" }"""));
        var result = Analyze(study);
        Assert.Equal(["placebo", "active", "p-value"], result.Columns.Select(c => c.Key));
        // With two arms the correlation and row mean scores statistics coincide.
        Assert.Equal(7 * 6.25 / 9.75, Value(result, "week-4/n", "p-value", "statistic")!.Value, 12);
    }
}
