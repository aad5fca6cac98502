using System.Globalization;
using OutputForge.Results;
using ScottPlot;

namespace OutputForge.Rendering.Figures;

/// <summary>
/// Draws a <see cref="ForestFigure"/> as a PNG with ScottPlot: one line per row's interval with a square at the
/// estimate (a diamond for the summary row), headings in bold, a dashed vertical line of no effect, a log axis for
/// ratios, the axis title and the "favours" texts under the axis. With several series each has its own colour and a
/// legend. Text is drawn in DejaVu Sans (Debian package fonts-dejavu-core), so the same inputs give the same bytes on
/// any machine with that font.
/// </summary>
internal static class ForestPlotPainter
{
    public const string FontName = "DejaVu Sans";
    private const int Width = 1600;
    private const int RowHeight = 46;
    private const float FontSize = 22;

    private static readonly Color[] ArmColors = [Color.FromHex("#000000"), Color.FromHex("#1F4E9A"), Color.FromHex("#B8520A"), Color.FromHex("#2E7D32")];

    /// <summary>Null when the font is installed; otherwise what the run must be told.</summary>
    public static string? FontWarning() =>
        string.Equals(SkiaSharp.SKTypeface.FromFamilyName(FontName)?.FamilyName, FontName, StringComparison.Ordinal)
            ? null
            : $"the forest plot font {FontName} is not installed (Debian package fonts-dejavu-core); another font was used, so the plot's bytes depend on this machine.";

    public static PaintedFigure Paint(ForestFigure forest)
    {
        double X(double value) => forest.LogScale ? Math.Log10(value) : value;
        var plot = new Plot();
        var arms = forest.Series.Count;
        var estimable = forest.Rows.Where(r => r.Intervals is not null).SelectMany(r => r.Intervals!).Where(e => e.IsEstimable).ToList();
        var noEffect = forest.LogScale ? 0 : forest.NoEffect;
        double low = estimable.Select(e => X(e.Lower)).Append(noEffect).Min();
        double high = estimable.Select(e => X(e.Upper)).Append(noEffect).Max();
        if (high - low < 1e-9)
        {
            (low, high) = (noEffect - 1, noEffect + 1);
        }
        var pad = 0.06 * (high - low);
        (low, high) = (low - pad, high + pad);

        var ticks = new ScottPlot.TickGenerators.NumericManual();
        for (var i = 0; i < forest.Rows.Count; i++)
        {
            var row = forest.Rows[i];
            double y = -i;
            if (row.Intervals is null)
            {
                var heading = plot.Add.Text(row.Label, low, y);
                heading.LabelFontName = FontName;
                heading.LabelFontSize = FontSize;
                heading.LabelBold = true;
                heading.LabelAlignment = Alignment.MiddleLeft;
                heading.OffsetX = 6;
                continue;
            }
            ticks.AddMajor(y, row.Label);
            for (var j = 0; j < arms; j++)
            {
                var effect = row.Intervals[j];
                var offset = arms == 1 ? 0 : 0.5 * (j - (arms - 1) / 2.0) / arms * 1.2;
                var color = ArmColors[j % ArmColors.Length];
                if (!effect.IsEstimable)
                {
                    var ne = plot.Add.Text(forest.NotEstimable, noEffect, y - offset);
                    ne.LabelFontSize = FontSize * 0.8f;
                    ne.LabelFontColor = color;
                    ne.LabelAlignment = Alignment.MiddleLeft;
                    ne.LabelFontName = FontName;
                    continue;
                }
                var line = plot.Add.Line(X(effect.Lower), y - offset, X(effect.Upper), y - offset);
                line.LineWidth = 2.5f;
                line.Color = color;
                var overall = row.IsSummary;
                var marker = plot.Add.Marker(X(effect.Estimate), y - offset, overall ? MarkerShape.FilledDiamond : MarkerShape.FilledSquare,
                    overall ? 24 : 15, color);
                if (overall && arms > 1)
                {
                    marker.LegendText = forest.Series[j];
                }
            }
        }
        var bottom = -forest.Rows.Count;
        var none = plot.Add.VerticalLine(noEffect);
        none.LinePattern = LinePattern.Dashed;
        none.LineWidth = 2;
        none.Color = Color.FromHex("#606060");
        var left = plot.Add.Text(forest.FavoursLow, noEffect, bottom + 0.1);
        var right = plot.Add.Text(forest.FavoursHigh, noEffect, bottom + 0.1);
        foreach (var (text, alignment) in new[] { (left, Alignment.LowerRight), (right, Alignment.LowerLeft) })
        {
            text.LabelFontSize = FontSize * 0.9f;
            text.LabelAlignment = alignment;
            text.LabelFontName = FontName;
            text.OffsetX = alignment == Alignment.LowerRight ? -8 : 8;
        }

        plot.Axes.Left.TickGenerator = ticks;
        // Each text names its font: Plot.Font.Set would also reset the headings' bold face.
        plot.Axes.Left.TickLabelStyle.FontName = FontName;
        plot.Axes.Bottom.TickLabelStyle.FontName = FontName;
        plot.Axes.Bottom.Label.FontName = FontName;
        plot.Axes.Left.TickLabelStyle.FontSize = FontSize;
        plot.Axes.Bottom.TickLabelStyle.FontSize = FontSize * 0.9f;
        plot.Axes.Bottom.TickGenerator = forest.LogScale
            ? RatioTicks(low, high)
            : new ScottPlot.TickGenerators.NumericAutomatic { MinimumTickSpacing = 90, MinorTickGenerator = new ScottPlot.TickGenerators.EvenlySpacedMinorTickGenerator(1) };
        plot.Axes.Bottom.Label.Text = forest.AxisLabel;
        plot.Axes.Bottom.Label.FontSize = FontSize;
        plot.Title(forest.Title, FontSize * 1.1f);
        plot.Axes.Title.Label.FontName = FontName;
        plot.Axes.SetLimits(low, high, bottom - 0.2, 0.7);
        plot.Grid.XAxisStyle.MajorLineStyle.Color = Color.FromHex("#E4E4E4");
        plot.Grid.YAxisStyle.MajorLineStyle.Width = 0;
        if (arms > 1)
        {
            plot.ShowLegend(Edge.Bottom);
            plot.Legend.FontSize = FontSize * 0.9f;
            plot.Legend.FontName = FontName;
        }
        var height = 220 + RowHeight * (forest.Rows.Count + 1) + (arms > 1 ? 60 : 0);
        var png = plot.GetImageBytes(Width, height, ImageFormat.Png);
        return new PaintedFigure(png, Width, height);
    }

    /// <summary>Ticks at 1-2-5 steps of the ratio, placed on the log10 axis, labelled with the ratio itself.</summary>
    private static ScottPlot.TickGenerators.NumericManual RatioTicks(double lowLog, double highLog)
    {
        var ticks = new ScottPlot.TickGenerators.NumericManual();
        var candidates = new List<double>();
        for (var exponent = -4; exponent <= 4; exponent++)
        {
            foreach (var step in new[] { 1.0, 2.0, 5.0 })
            {
                candidates.Add(step * Math.Pow(10, exponent));
            }
        }
        var inside = candidates.Where(c => Math.Log10(c) >= lowLog && Math.Log10(c) <= highLog).ToList();
        if (inside.Count > 9)
        {
            inside = inside.Where(c => Math.Abs(Math.Log10(c) - Math.Round(Math.Log10(c))) < 1e-9 || Math.Abs(c - 1) < 1e-9 || c.ToString("R", CultureInfo.InvariantCulture).StartsWith('5')).ToList();
        }
        foreach (var c in inside)
        {
            ticks.AddMajor(Math.Log10(c), c.ToString("0.####", CultureInfo.InvariantCulture));
        }
        return ticks;
    }
}
