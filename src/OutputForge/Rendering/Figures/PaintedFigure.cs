namespace OutputForge.Rendering.Figures;

/// <summary>A figure drawn: the PNG bytes (the same for the same figure) and the picture's size in pixels.</summary>
public sealed record PaintedFigure(byte[] Png, int WidthPixels, int HeightPixels);
