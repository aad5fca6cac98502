using System.Runtime.CompilerServices;
using OutputForge.Results;

namespace OutputForge.Rendering.Figures;

/// <summary>
/// Draws a table's figure as described (<see cref="TableFigure"/>), each kind of figure by its painter. A figure is drawn
/// once however many outputs show it (the PNG beside the table, the Word documents): the picture is kept with the
/// figure for as long as the figure lives.
/// </summary>
public static class FigurePainter
{
    private static readonly ConditionalWeakTable<TableFigure, PaintedFigure> Painted = new();

    public static PaintedFigure Paint(TableFigure figure) => Painted.GetValue(figure, Draw);

    /// <summary>What a run must be told about drawing the figure on this machine (a missing font), or null.</summary>
    public static string? Warning(TableFigure figure) => figure switch
    {
        ForestFigure => ForestPlotPainter.FontWarning(),
        _ => null,
    };

    private static PaintedFigure Draw(TableFigure figure) => figure switch
    {
        ForestFigure forest => ForestPlotPainter.Paint(forest),
        _ => throw new ArgumentOutOfRangeException(nameof(figure), figure.GetType().Name, "no painter for this kind of figure"),
    };
}
