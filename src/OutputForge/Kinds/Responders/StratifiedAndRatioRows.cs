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
    private readonly List<ResultNote> _notes = [];
    private readonly List<ResultNote> _warnings = [];

    public IReadOnlyList<ResultRow> Rows => _rows;
    public IReadOnlyList<ResultNote> Notes => _notes;
    public IReadOnlyList<ResultNote> Warnings => _warnings;

    public static StratifiedAndRatioRows Build(ResponderSettings settings, ResponderStrata? strata,
        IReadOnlyList<StratifiedComparison> stratified, IReadOnlyList<ResponderRatios> ratios, IReadOnlyList<ResultColumn> columns,
        TreatmentArm control, double level, int percentDecimals, IReadOnlyDictionary<string, int> populationOfStratum)
    {
        var result = new StratifiedAndRatioRows();
        var indent = strata is null ? 1 : 2;
        var ofStrata = strata is not null;
        if (strata is not null)
        {
            result._rows.Add(new ResultRow("stratified", $"Stratified by {string.Join(" and ", strata.Variables)}", 1,
                columns.Select(c => CellFactory.Empty(c.Key)).ToList()));
            var spec = settings.Stratified!;
            var mn = spec.Difference == StratifiedDifference.MiettinenNurminen;
            var differenceMethod = mn ? StratifiedMiettinenNurminen.MethodName : "Mantel-Haenszel, Sato variance";
            var d = ResponderNotes.StratifiedDifference;
            result._rows.Add(Row("stratified-difference", "Difference in proportions, %", indent, columns, stratified,
                c => CellFactory.Estimate(c.Arm.Key, c.Difference, 100, percentDecimals, differenceMethod)) with { NoteRefs = [d] });
            result._rows.Add(Row("stratified-difference-ci", "{level} CI", indent, columns, stratified,
                c => CellFactory.Interval(c.Arm.Key, c.Difference, 100, percentDecimals, differenceMethod, level)) with { Level = level, NoteRefs = [d] });
            result._notes.Add(ResultNote.Footnote(d, NoteKind.StratifiedDifference, ("scoreInterval", mn), ("control", control.Label), ("level", level)));
            var e = ResponderNotes.Cmh;
            result._rows.Add(Row("cmh-p-value", "CMH p-value", indent, columns, stratified, c => WithStrata(CellFactory.PValueOf(c.Arm.Key, c.Test), c.StrataUsed))
                with { NoteRefs = [e] });
            result._notes.Add(ResultNote.Footnote(e, NoteKind.CmhTest, ("corrected", spec.Test == StratifiedTest.CmhCorrected), ("control", control.Label)));
            if (spec.Homogeneity)
            {
                var f = ResponderNotes.Homogeneity;
                result._rows.Add(Row("homogeneity-p-value", "Breslow-Day p-value", indent, columns, stratified, c => CellFactory.PValueOf(c.Arm.Key, c.Homogeneity!))
                    with { NoteRefs = [f] });
                result._notes.Add(ResultNote.Footnote(f, NoteKind.HomogeneityTest));
            }
        }
        var oddsMethod = settings.OddsRatioInterval;
        var ratioDecimals = settings.RatioDecimals;
        if (settings.Ratios.Contains(RatioMeasure.RelativeRisk))
        {
            var g = ResponderNotes.RelativeRisk;
            var method = strata is null ? "Katz log" : "Mantel-Haenszel, Greenland-Robins";
            result._rows.Add(Row("relative-risk", "Relative risk", indent, columns, ratios, c => CellFactory.Estimate(c.Arm.Key, c.RelativeRisk!, 1, ratioDecimals, method))
                with { NoteRefs = [g] });
            result._rows.Add(Row("relative-risk-ci", "{level} CI", indent, columns, ratios, c => CellFactory.Interval(c.Arm.Key, c.RelativeRisk!, 1, ratioDecimals, method, level))
                with { Level = level, NoteRefs = [g] });
            result._notes.Add(ResultNote.Footnote(g, NoteKind.RelativeRisk, ("stratified", ofStrata), ("control", control.Label), ("level", level)));
        }
        if (settings.Ratios.Contains(RatioMeasure.OddsRatio))
        {
            var h = ResponderNotes.OddsRatio;
            var describe = OddsRatioIntervalMethods.Describe(oddsMethod, strata is not null);
            var method = strata is null ? describe : $"Mantel-Haenszel, {describe}";
            result._rows.Add(Row("odds-ratio", "Odds ratio", indent, columns, ratios, c => CellFactory.Estimate(c.Arm.Key, c.OddsRatio!, 1, ratioDecimals, method))
                with { NoteRefs = [h] });
            result._rows.Add(Row("odds-ratio-ci", "{level} CI", indent, columns, ratios, c => CellFactory.Interval(c.Arm.Key, c.OddsRatio!, 1, ratioDecimals, method, level))
                with { Level = level, NoteRefs = [h] });
            result._notes.Add(ResultNote.Footnote(h, NoteKind.OddsRatio, ("stratified", ofStrata), ("method", describe), ("control", control.Label), ("level", level)));
        }
        if (strata is not null)
        {
            result.StrataNotes(strata, stratified, populationOfStratum);
        }
        return result;
    }

    private void StrataNotes(ResponderStrata strata, IReadOnlyList<StratifiedComparison> stratified, IReadOnlyDictionary<string, int> populationOfStratum)
    {
        _notes.Add(ResultNote.Footnote("strata", NoteKind.StrataDefinition, ("variables", strata.Variables.ToList())));
        if (strata.EmptyCombinations.Count > 0)
        {
            _warnings.Add(ResultNote.Warning(NoteKind.EmptyStrata, NoteSubject.None, ("strata", strata.EmptyCombinations.ToList())));
        }
        var single = strata.Levels.Where(l => populationOfStratum.GetValueOrDefault(l) == 1).ToList();
        if (single.Count > 0)
        {
            _warnings.Add(ResultNote.Warning(NoteKind.SingleSubjectStrata, NoteSubject.None, ("strata", single)));
        }
        if (strata.WithoutValue > 0)
        {
            _warnings.Add(ResultNote.Warning(NoteKind.NoStratumValue, NoteSubject.None, ("subjects", strata.WithoutValue),
                ("variables", strata.Variables.ToList()), ("leftOutOf", "stratified-analysis")));
        }
        // Warnings go to the run log and are printed under the table as "Warning: ..." footnotes by the layout.
        _warnings.AddRange(stratified.SelectMany(c => c.Notes));
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
