namespace OutputForge.Results;

/// <summary>
/// A figure that belongs to a table (e.g. a forest plot), described as data: what it shows, not how it is drawn.
/// Rendering paints it as a PNG written beside the table's other outputs as "table-{id}-{Name}.png" and embedded after
/// the table in the documents that show it.
/// </summary>
/// <param name="Name">The file-name part after the table id, e.g. "forest" (letters, digits and dashes).</param>
/// <param name="AltText">What the picture shows, for readers who cannot see it (the image's description in Word).</param>
public abstract record TableFigure(string Name, string AltText);
