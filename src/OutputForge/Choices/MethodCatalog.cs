using OutputForge.Choices;
using OutputForge.Stats;
using QuantileDefinition = MathNet.Numerics.Statistics.QuantileDefinition;

namespace OutputForge.Choices;

/// <summary>
/// The one catalogue of the names of every method, test, interval, sort and display choice of a spec, with the typed
/// value each selects, its description (the words footnotes and docs use) and its default, and the ranges of the
/// numeric statistics options. The spec reader parses names through it once, when a spec loads; the table schema's
/// enums, ranges and defaults are generated from it (Kinds/TableSchemaComposition: a fragment writes
/// <c>"choices": "key"</c> or <c>"range": "key"</c>); the `calc` command takes the same names; and docs/methods.md
/// lists them (a test keeps the page equal to <see cref="MethodCatalogPage"/>).
/// </summary>
public static class MethodCatalog
{
    public static readonly OptionSet<ProportionCiMethod> ProportionInterval = new("proportion-interval", "Interval of a single proportion",
    [
        new("wald", ProportionCiMethod.Wald, "Wald (normal approximation)"),
        new("wilson", ProportionCiMethod.Wilson, "Wilson score"),
        new("wilson-cc", ProportionCiMethod.WilsonCorrected, "Wilson score with continuity correction"),
        new("clopper-pearson", ProportionCiMethod.ClopperPearson, "Clopper-Pearson exact"),
        new("agresti-coull", ProportionCiMethod.AgrestiCoull, "Agresti-Coull"),
        new("jeffreys", ProportionCiMethod.Jeffreys, "Jeffreys"),
    ], ProportionCiMethod.Wilson);

    public static readonly OptionSet<DifferenceCiMethod> DifferenceInterval = new("difference-interval", "Interval of the difference of two proportions",
    [
        new("wald", DifferenceCiMethod.Wald, "Wald (normal approximation)"),
        new("wald-cc", DifferenceCiMethod.WaldCorrected, "Wald with continuity correction"),
        new("newcombe", DifferenceCiMethod.Newcombe, "Newcombe hybrid score"),
        new("agresti-caffo", DifferenceCiMethod.AgrestiCaffo, "Agresti-Caffo"),
        new("miettinen-nurminen", DifferenceCiMethod.MiettinenNurminen, "Miettinen-Nurminen score"),
    ], DifferenceCiMethod.Newcombe);

    /// <summary>
    /// "chi-square" is Pearson's chi-square test. `calc` once called it "pearson": that name is retired (an error names
    /// "chi-square") so that specs and `calc` share one name.
    /// </summary>
    public static readonly OptionSet<TableTest> TableTest = new("table-test", "Test of each active arm against the control (2 x 2, or r x c in calc)",
    [
        new("auto", Choices.TableTest.Auto, "Pearson's chi-square test, or Fisher's exact test when an expected count is below 5 (Cochran 1954)"),
        new("chi-square", Choices.TableTest.ChiSquare, "Pearson's chi-square test"),
        new("yates", Choices.TableTest.Yates, "Pearson's chi-square test with Yates' continuity correction (2 x 2 only)"),
        new("likelihood-ratio", Choices.TableTest.LikelihoodRatio, "the likelihood-ratio chi-square test"),
        new("fisher", Choices.TableTest.Fisher, "Fisher's exact test"),
    ], Choices.TableTest.Auto, [new("pearson", "chi-square")]);

    public static readonly OptionSet<MissingResponse> MissingResponse = new("missing-response", "Subjects of the population without an endpoint record",
    [
        new("non-responder", Choices.MissingResponse.NonResponder, "counted as non-responders"),
        new("exclude", Choices.MissingResponse.Exclude, "left out of the denominator"),
        new("observed", Choices.MissingResponse.Observed, "the selected records as the dataset has them (derived records included); subjects without one left out"),
    ], Choices.MissingResponse.NonResponder);

    public static readonly OptionSet<SummaryTest> SummaryTest = new("summary-test", "Test of a summary block across the arms",
    [
        new("none", Choices.SummaryTest.None, "no test"),
        new("anova", Choices.SummaryTest.Anova, "one-way analysis of variance (continuous variables)"),
        new("chi-square", Choices.SummaryTest.ChiSquare, "Pearson's chi-square test"),
        new("likelihood-ratio", Choices.SummaryTest.LikelihoodRatio, "the likelihood-ratio chi-square test"),
        new("fisher", Choices.SummaryTest.Fisher, "Fisher's exact test"),
    ], Choices.SummaryTest.None);

    public static readonly OptionSet<SummaryTest> ContinuousTest = SummaryTest.Subset("continuous-test", "Test of a continuous demographics variable",
        Choices.SummaryTest.None, Choices.SummaryTest.None, Choices.SummaryTest.Anova);

    public static readonly OptionSet<SummaryTest> CategoricalTest = SummaryTest.Subset("categorical-test", "Test of a categorical block (levels x arms)",
        Choices.SummaryTest.None, Choices.SummaryTest.None, Choices.SummaryTest.ChiSquare, Choices.SummaryTest.LikelihoodRatio, Choices.SummaryTest.Fisher);

    public static readonly OptionSet<SummaryTest> AdverseEventTest = SummaryTest.Subset("adverse-event-test", "Test of each adverse event row, each active arm against the control",
        Choices.SummaryTest.None, Choices.SummaryTest.None, Choices.SummaryTest.Fisher);

    public static readonly OptionSet<LevelSorting> LevelSorting = new("level-sorting", "Order of levels (or rows) the spec does not list",
    [
        new("alphabetical", Choices.LevelSorting.Alphabetical, "alphabetical"),
        new("frequency", Choices.LevelSorting.Frequency, "descending count, ties alphabetical"),
    ], Choices.LevelSorting.Alphabetical);

    public static readonly OptionSet<QuantileDefinition> Quartiles = new("quartiles", "Definition of the sample quartiles",
    [
        new("hyndman-fan-2", QuantileDefinition.R2, "Hyndman and Fan (1996) definition 2 (inverse of the empirical distribution, averaged at discontinuities)"),
        new("hyndman-fan-7", QuantileDefinition.R7, "Hyndman and Fan (1996) definition 7 (linear interpolation of the order statistics)"),
    ], QuantileDefinition.R2);

    public static readonly OptionSet<DemographicVariableType> VariableType = new("variable-type", "How a demographics variable is summarized",
    [
        new("continuous", DemographicVariableType.Continuous, "descriptive statistics in the rows the spec lists"),
        new("categorical", DemographicVariableType.Categorical, "n (%) per level"),
    ]);

    public static readonly OptionSet<GeneralizedCmhStatistic> GeneralizedCmh = new("generalized-cmh", "Generalized Cochran-Mantel-Haenszel statistic per visit",
    [
        new("row-mean-scores", GeneralizedCmhStatistic.RowMeanScores, "row mean scores differ"),
        new("correlation", GeneralizedCmhStatistic.Correlation, "nonzero correlation"),
        new("general-association", GeneralizedCmhStatistic.GeneralAssociation, "general association"),
        new("none", GeneralizedCmhStatistic.None, "no test"),
    ], GeneralizedCmhStatistic.RowMeanScores);

    /// <summary>"category-values" was called "table" (one program's option name); the old name gets an error naming the new one.</summary>
    public static readonly OptionSet<ColumnScores> ColumnScores = new("column-scores", "Column scores of the generalized Cochran-Mantel-Haenszel statistics",
    [
        new("category-values", Choices.ColumnScores.CategoryValues, "each category's score, else its numeric value"),
        new("equal-spacing", Choices.ColumnScores.EqualSpacing, "1, 2, ... in the order listed"),
        new("modified-ridit", Choices.ColumnScores.ModifiedRidit, "standardized midranks computed within each stratum"),
    ], Choices.ColumnScores.CategoryValues, [new("table", "category-values")]);

    public static readonly OptionSet<ArmComparison> ArmComparison = new("arm-comparison", "Arms one categorical-by-visit test compares",
    [
        new("each-vs-control", Choices.ArmComparison.EachVsControl, "each active arm with the control, two arms per test"),
        new("all-arms", Choices.ArmComparison.AllArms, "one test over every arm"),
    ], Choices.ArmComparison.EachVsControl);

    public static readonly OptionSet<RatioMeasure> RatioMeasure = new("ratio", "Ratio rows of a responder table",
    [
        new("relative-risk", Choices.RatioMeasure.RelativeRisk, "relative risk (Katz log interval; Mantel-Haenszel with the Greenland-Robins variance when stratified)"),
        new("odds-ratio", Choices.RatioMeasure.OddsRatio, "odds ratio (interval from oddsRatioInterval)"),
    ]);

    public static readonly OptionSet<OddsRatioIntervalMethod> OddsRatioInterval = new("odds-ratio-interval", "Interval of the odds ratio",
    [
        new("woolf", OddsRatioIntervalMethod.Woolf, "large-sample log interval (Woolf unstratified, Robins-Breslow-Greenland when stratified)"),
        new("exact", OddsRatioIntervalMethod.Exact, "conditional MLE with the exact Cornfield interval, unstratified tables only"),
    ], OddsRatioIntervalMethod.Woolf);

    public static readonly OptionSet<StratifiedDifference> StratifiedDifference = new("stratified-difference", "Common risk difference over strata",
    [
        new("mantel-haenszel", Choices.StratifiedDifference.MantelHaenszel, "Mantel-Haenszel with Sato's variance"),
        new("miettinen-nurminen", Choices.StratifiedDifference.MiettinenNurminen, "stratified Miettinen-Nurminen score interval"),
    ], Choices.StratifiedDifference.MantelHaenszel);

    public static readonly OptionSet<StratifiedTest> StratifiedTest = new("stratified-test", "Cochran-Mantel-Haenszel test",
    [
        new("cmh", Choices.StratifiedTest.Cmh, "without continuity correction"),
        new("cmh-corrected", Choices.StratifiedTest.CmhCorrected, "with continuity correction"),
    ], Choices.StratifiedTest.Cmh);

    public static readonly OptionSet<EffectMeasure> EffectMeasure = new("effect-measure", "Treatment effect per subgroup level",
    [
        new("difference", Choices.EffectMeasure.Difference, "difference in proportions (interval from statistics.differenceInterval)"),
        new("odds-ratio", Choices.EffectMeasure.OddsRatio, "odds ratio (Woolf)"),
        new("relative-risk", Choices.EffectMeasure.RelativeRisk, "relative risk (Katz)"),
    ], Choices.EffectMeasure.Difference);

    public static readonly OptionSet<InteractionTest> InteractionTest = new("interaction-test", "Treatment-by-subgroup interaction test",
    [
        new("likelihood-ratio", Choices.InteractionTest.LikelihoodRatio, "likelihood-ratio test of the interaction terms of a logistic regression"),
        new("breslow-day", Choices.InteractionTest.BreslowDay, "Breslow-Day test of homogeneous odds ratios"),
        new("breslow-day-tarone", Choices.InteractionTest.BreslowDayTarone, "Breslow-Day test with Tarone's correction"),
    ], Choices.InteractionTest.LikelihoodRatio);

    public static readonly OptionSet<SurvivalEstimate> SurvivalEstimate = new("survival-estimate", "Kaplan-Meier estimate printed at the chosen times",
    [
        new("event-free", Choices.SurvivalEstimate.EventFree, "S(t), the probability of no event by t"),
        new("event", Choices.SurvivalEstimate.Event, "1 - S(t), the probability of the event by t"),
    ], Choices.SurvivalEstimate.EventFree);

    public static readonly OptionSet<CoxTies> CoxTies = new("cox-ties", "Tied event times in the Cox partial likelihood",
    [
        new("efron", Stats.Models.CoxTies.Efron, "Efron (1977)"),
        new("breslow", Stats.Models.CoxTies.Breslow, "Breslow (1974)"),
    ], Stats.Models.CoxTies.Efron);

    public static readonly OptionSet<ZeroDisplay> ZeroDisplay = new("zero-display", "A zero count of an n (%) cell",
    [
        new("count", Choices.ZeroDisplay.Count, "0"),
        new("count-percent", Choices.ZeroDisplay.CountPercent, "0 (0.0)"),
    ], Choices.ZeroDisplay.Count);

    /// <summary>
    /// Procedures controlling the familywise error rate over several hypotheses (`calc multiplicity --method`). Taken by
    /// `calc` only until a table kind reads it: listed in <see cref="CalcOnly"/>.
    /// </summary>
    public static readonly OptionSet<MultiplicityProcedure> Multiplicity = new("multiplicity", "Multiplicity adjustment over several hypotheses",
    [
        new("bonferroni", MultiplicityProcedure.Bonferroni, "Bonferroni, each hypothesis at alpha / m"),
        new("holm", MultiplicityProcedure.Holm, "Holm (1979) step-down"),
        new("hochberg", MultiplicityProcedure.Hochberg, "Hochberg (1988) step-up (independent or positively dependent tests)"),
        new("hommel", MultiplicityProcedure.Hommel, "Hommel (1988), the closed test of Simes tests"),
        new("fixed-sequence", MultiplicityProcedure.FixedSequence, "fixed sequence, each at alpha in the order listed until the first not rejected"),
        new("fallback", MultiplicityProcedure.Fallback, "fallback (Wiens 2003): weights in the order listed, a rejected hypothesis's level passed to the next"),
        new("weighted-bonferroni", MultiplicityProcedure.WeightedBonferroni, "weighted Bonferroni, each hypothesis at its weight times alpha"),
        new("graphical", MultiplicityProcedure.Graphical, "the graphical approach of Bretz, Maurer, Brannath and Posch (2009): weights and a transition matrix"),
    ]);

    /// <summary>
    /// The two-sided confidence level of every interval, specs and `calc` alike. Above one half: a "confidence" interval
    /// below 50% is almost surely a mistyped alpha (common practice).
    /// </summary>
    public static readonly NumberRange ConfidenceLevel = new("confidence-level", 0.5, 1, 0.95);

    /// <summary>p-values below this floor print as "&lt;floor"; no higher than 0.05, which would hide a significant result's size.</summary>
    public static readonly NumberRange PValueFloor = new("p-value-floor", 0, 0.05, 0.001, MaximumIncluded: true);

    public static readonly IReadOnlyList<IOptionSet> All =
    [
        ProportionInterval, DifferenceInterval, TableTest, MissingResponse, SummaryTest, ContinuousTest, CategoricalTest,
        AdverseEventTest, LevelSorting, Quartiles, VariableType, GeneralizedCmh, ColumnScores, ArmComparison, RatioMeasure,
        OddsRatioInterval, StratifiedDifference, StratifiedTest, EffectMeasure, InteractionTest, SurvivalEstimate, CoxTies,
        ZeroDisplay, Multiplicity,
    ];

    /// <summary>
    /// Options only `calc` takes so far: listed in docs/methods.md with the others, but in no spec schema until a table
    /// kind reads them (a test holds that each option is in the schema or here, never both).
    /// </summary>
    public static readonly IReadOnlyList<IOptionSet> CalcOnly = [Multiplicity];

    public static readonly IReadOnlyList<NumberRange> Ranges = [ConfidenceLevel, PValueFloor];

    /// <summary>Spec keys renamed for a name of our own: "geomean" (one program's function name) is "geometricMean".</summary>
    public static readonly IReadOnlyList<RetiredName> RetiredKeys = [new("geomean", "geometricMean")];

    /// <summary>The full set of each enum type, for reading spec values: a subset shares its type with the set it was cut from.</summary>
    private static readonly Dictionary<Type, IOptionSet> ByType = All
        .GroupBy(s => s.ValueType).ToDictionary(g => g.Key, g => g.First());

    public static IOptionSet? Find(string key) => All.FirstOrDefault(s => s.Key == key);

    public static NumberRange? FindRange(string key) => Ranges.FirstOrDefault(r => r.Key == key);

    /// <summary>The set whose values a spec property of type <paramref name="type"/> takes; null for a type no option has.</summary>
    public static IOptionSet? ForType(Type type) => ByType.GetValueOrDefault(type);

    public static string Describe(ProportionCiMethod method) => ProportionInterval.Describe(method);

    public static string Describe(DifferenceCiMethod method) => DifferenceInterval.Describe(method);

    /// <summary>"95%" for 0.95, "97.5%" for 0.975.</summary>
    public static string LevelText(double level) =>
        (level * 100).ToString("0.###", System.Globalization.CultureInfo.InvariantCulture) + "%";
}
