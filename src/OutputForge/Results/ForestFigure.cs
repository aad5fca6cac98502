namespace OutputForge.Results;

/// <summary>
/// A forest plot described as data: one row per printed row of its table (summary, headings, levels), each with one
/// interval per series (an active arm against the control), the axis (its title, a log scale or not, the line of no
/// effect) and the texts around it. Values are in the axis's units (percentage points for a difference, the ratio
/// itself on a log scale).
/// </summary>
/// <param name="Title">The figure's title.</param>
/// <param name="AxisLabel">The title of the value axis.</param>
/// <param name="LogScale">Whether the axis is logarithmic (ratios), its line of no effect then at 1.</param>
/// <param name="NoEffect">Where the line of no effect is on a linear axis (0 for a difference).</param>
/// <param name="Series">The series' legend texts, one per interval of a row ("Drug 10 mg vs Placebo").</param>
/// <param name="FavoursLow">The text under the axis on the side of low values.</param>
/// <param name="FavoursHigh">The text under the axis on the side of high values.</param>
/// <param name="NotEstimable">What a point that cannot be estimated shows.</param>
public sealed record ForestFigure(string Name, string AltText, string Title, string AxisLabel, bool LogScale, double NoEffect,
    IReadOnlyList<string> Series, string FavoursLow, string FavoursHigh, string NotEstimable, IReadOnlyList<ForestFigureRow> Rows)
    : TableFigure(Name, AltText);

/// <summary>A row of a forest plot: a heading when <paramref name="Intervals"/> is null; the summary row (overall) is marked.</summary>
public sealed record ForestFigureRow(string Label, bool IsSummary, IReadOnlyList<FigureInterval>? Intervals);

/// <summary>An estimate with its interval, in the axis's units; the numbers mean nothing when it is not estimable.</summary>
public sealed record FigureInterval(double Estimate, double Lower, double Upper, bool IsEstimable);
