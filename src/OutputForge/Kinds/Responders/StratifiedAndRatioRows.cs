using OutputForge.Analysis;
using OutputForge.Results;
using OutputForge.Stats;

namespace OutputForge.Kinds.Responders;

/// <summary>
/// The rows of a responder table's comparison block after the unstratified difference and p-value: the
/// stratified common difference, the Cochran-Mantel-Haenszel p-value and the Breslow-Day p-value (when
/// stratified), and the relative risk and odds ratio rows (when asked for); with the footnotes naming each
/// method and the strata, and the warnings (run log and "Warning:" footnotes) on empty, single-subject and dropped strata.
/// </summary>
public sealed class StratifiedAndRatioRows
{
    private readonly List<ResultRow> _rows = [];
    private readonly List<string> _notes = [];
    private readonly List<string> _warnings = [];

    public IReadOnlyList<ResultRow> Rows => _rows;
    public IReadOnlyList<string> Notes => _notes;
    public IReadOnlyList<string> Warnings => _warnings;

    public static StratifiedAndRatioRows Build(ResponderSettings settings, ResponderStrata? strata,
        IReadOnlyList<StratifiedComparison> stratified, IReadOnlyList<ResponderRatios> ratios, IReadOnlyList<ResultColumn> columns,
        TreatmentArm control, double level, int percentDecimals, FootnoteLetters letters, IReadOnlyDictionary<string, int> populationOfStratum)
    {
        var result = new StratifiedAndRatioRows();
        var levelText = MethodCatalog.LevelText(level);
        var indent = strata is null ? 1 : 2;
        if (strata is not null)
        {
            result._rows.Add(new ResultRow("stratified", $"Stratified by {string.Join(" and ", strata.Variables)}", 1,
                columns.Select(c => CellFactory.Empty(c.Key)).ToList()));
            var spec = settings.Stratified!;
            var mn = spec.Difference == StratifiedDifference.MiettinenNurminen;
            var differenceMethod = mn ? StratifiedMiettinenNurminen.MethodName : "Mantel-Haenszel, Sato variance";
            var d = letters.Next();
            result._rows.Add(Row("stratified-difference", $"Difference in proportions, % {d}", indent, columns, stratified,
                c => CellFactory.Estimate(c.Arm.Key, c.Difference, 100, percentDecimals, differenceMethod)));
            result._rows.Add(Row("stratified-difference-ci", $"{levelText} CI {d}", indent, columns, stratified,
                c => CellFactory.Interval(c.Arm.Key, c.Difference, 100, percentDecimals, differenceMethod)));
            result._notes.Add(mn
                ? $"{d} Common difference (arm minus {control.Label}), weights n1 n2 / (n1 + n2); stratified Miettinen-Nurminen score {levelText} CI (Miettinen and Nurminen 1985); estimate: the score's root, equal to the weighted difference."
                : $"{d} Mantel-Haenszel common difference (arm minus {control.Label}), weights n1 n2 / (n1 + n2); {levelText} CI from Sato's variance (Sato 1989).");
            var e = letters.Next();
            result._rows.Add(Row("cmh-p-value", $"CMH p-value {e}", indent, columns, stratified, c => WithStrata(CellFactory.PValueOf(c.Arm.Key, c.Test), c.StrataUsed)));
            result._notes.Add($"{e} Two-sided p-value of the Cochran-Mantel-Haenszel test{(spec.Test == StratifiedTest.CmhCorrected ? " with continuity correction" : "")}, each arm against {control.Label}.");
            if (spec.Homogeneity)
            {
                var f = letters.Next();
                result._rows.Add(Row("homogeneity-p-value", $"Breslow-Day p-value {f}", indent, columns, stratified, c => CellFactory.PValueOf(c.Arm.Key, c.Homogeneity!)));
                result._notes.Add($"{f} Breslow-Day test (Tarone's correction) of equal odds ratios; strata where all or none responded are left out.");
            }
        }
        var oddsMethod = settings.OddsRatioInterval;
        var ratioDecimals = settings.RatioDecimals;
        if (settings.Ratios.Contains(RatioMeasure.RelativeRisk))
        {
            var g = letters.Next();
            var method = strata is null ? "Katz log" : "Mantel-Haenszel, Greenland-Robins";
            result._rows.Add(Row("relative-risk", $"Relative risk {g}", indent, columns, ratios, c => CellFactory.Estimate(c.Arm.Key, c.RelativeRisk!, 1, ratioDecimals, method)));
            result._rows.Add(Row("relative-risk-ci", $"{levelText} CI {g}", indent, columns, ratios, c => CellFactory.Interval(c.Arm.Key, c.RelativeRisk!, 1, ratioDecimals, method)));
            result._notes.Add(strata is null
                ? $"{g} Relative risk of response (each arm / {control.Label}), log (Katz) {levelText} CI."
                : $"{g} Mantel-Haenszel relative risk of response (each arm / {control.Label}), {levelText} CI from the Greenland-Robins variance.");
        }
        if (settings.Ratios.Contains(RatioMeasure.OddsRatio))
        {
            var h = letters.Next();
            var describe = OddsRatioIntervalMethods.Describe(oddsMethod, strata is not null);
            var method = strata is null ? describe : $"Mantel-Haenszel, {describe}";
            result._rows.Add(Row("odds-ratio", $"Odds ratio {h}", indent, columns, ratios, c => CellFactory.Estimate(c.Arm.Key, c.OddsRatio!, 1, ratioDecimals, method)));
            result._rows.Add(Row("odds-ratio-ci", $"{levelText} CI {h}", indent, columns, ratios, c => CellFactory.Interval(c.Arm.Key, c.OddsRatio!, 1, ratioDecimals, method)));
            result._notes.Add(strata is null
                ? $"{h} Odds ratio of response (each arm to {control.Label}), {describe} {levelText} CI."
                : $"{h} Mantel-Haenszel odds ratio of response (each arm to {control.Label}), {describe} {levelText} CI.");
        }
        if (strata is not null)
        {
            result.StrataNotes(strata, stratified, populationOfStratum);
        }
        return result;
    }

    private void StrataNotes(ResponderStrata strata, IReadOnlyList<StratifiedComparison> stratified, IReadOnlyDictionary<string, int> populationOfStratum)
    {
        _notes.Add($"Strata: each combination of {strata.VariablesText} values (ADSL); each comparison uses its two arms only.");
        var remarks = new List<string>();
        if (strata.EmptyCombinations.Count > 0)
        {
            remarks.Add($"Empty {(strata.EmptyCombinations.Count == 1 ? "stratum" : "strata")} (no subject of the population): {string.Join("; ", strata.EmptyCombinations)}.");
        }
        var single = strata.Levels.Where(l => populationOfStratum.GetValueOrDefault(l) == 1).ToList();
        if (single.Count > 0)
        {
            remarks.Add($"{(single.Count == 1 ? "Stratum" : "Strata")} with one subject in the population: {string.Join("; ", single)}.");
        }
        if (strata.WithoutValue > 0)
        {
            remarks.Add($"{strata.WithoutValue} subject{(strata.WithoutValue == 1 ? " has" : "s have")} no value of {strata.VariablesText} and {(strata.WithoutValue == 1 ? "is" : "are")} left out of the stratified analysis.");
        }
        remarks.AddRange(stratified.SelectMany(c => c.Notes));
        // Warnings go to the run log and are printed under the table as "Warning: ..." footnotes by the layout.
        _warnings.AddRange(remarks);
    }

    private static ResultCell WithStrata(ResultCell cell, int strataUsed) =>
        cell with { Values = [.. cell.Values, StatisticValue.Count(StatisticNames.StrataCount, strataUsed)] };

    private static ResultRow Row<T>(string key, string label, int indent, IReadOnlyList<ResultColumn> columns, IReadOnlyList<T> comparisons, Func<T, ResultCell> cell)
        where T : class =>
        new(key, label, indent, columns.Select(column =>
            comparisons.FirstOrDefault(c => ArmOf(c).Key == column.Key) is { } comparison
                ? cell(comparison)
                : CellFactory.Empty(column.Key)).ToList());

    private static TreatmentArm ArmOf<T>(T comparison) => comparison switch
    {
        StratifiedComparison s => s.Arm,
        ResponderRatios r => r.Arm,
        _ => throw new ArgumentException("not a comparison of an arm", nameof(comparison)),
    };
}
