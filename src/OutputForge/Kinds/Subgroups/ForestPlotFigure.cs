using System.Globalization;
using OutputForge.Results;

namespace OutputForge.Kinds.Subgroups;

/// <summary>
/// Describes a <see cref="ForestPlot"/> as the figure Rendering draws: one row per printed row (the overall row as the
/// summary, each subgroup variable's label as a heading), each active arm's effect against the control as an interval
/// in the axis's units (percentage points for a difference; ratios on a log scale with no effect at 1), the measure in
/// the axis title and which side favours which arm under the axis.
/// </summary>
internal static class ForestPlotFigure
{
    public const string FileName = "forest";

    public static ForestFigure Describe(ForestPlot forest)
    {
        var measure = forest.Measure;
        var rows = forest.Rows.Select((row, i) => new ForestFigureRow(row.Label, i == 0,
            row.Effects?.Select(e => measure.IsRatio
                ? new FigureInterval(e.Estimate, e.Lower, e.Upper, e.IsEstimable)
                : new FigureInterval(e.Estimate * measure.Scale, e.Lower * measure.Scale, e.Upper * measure.Scale, e.IsEstimable)).ToList()))
            .ToList();
        var title = $"Table {forest.TableId}: {(measure.IsRatio ? measure.Label.ToLowerInvariant() + " of response" : "difference in proportions of responders")} by subgroup";
        var axis = measure.IsRatio
            ? $"{measure.Label} ({forest.LevelText} CI), log scale"
            : $"Difference in proportions of responders, percentage points ({forest.LevelText} CI)";
        return new ForestFigure(FileName, AltText(forest), title, axis, measure.IsRatio, measure.NoEffect,
            forest.ActiveArms.Select(a => $"{a} vs {forest.ControlArm}").ToList(),
            $"\u2190 Favours {forest.ControlArm}", $"Favours {string.Join(" / ", forest.ActiveArms)} \u2192", "NE", rows);
    }

    private static string AltText(ForestPlot forest)
    {
        var headings = forest.Rows.Where(r => r.Effects is null).Select(r => r.Label).ToList();
        return $"Forest plot for Table {forest.TableId}: {forest.Measure.Label.Replace(", %", " in percentage points", StringComparison.Ordinal).ToLowerInvariant()} " +
               $"with {forest.LevelText} confidence intervals of {string.Join(" and ", forest.ActiveArms)} against {forest.ControlArm}, " +
               $"overall and by {string.Join(", ", headings)}; the line of no effect is at {forest.Measure.NoEffect.ToString(CultureInfo.InvariantCulture)}. " +
               $"The numbers are those of Table {forest.TableId}.";
    }
}
