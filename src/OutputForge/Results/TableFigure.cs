namespace OutputForge.Results;

/// <summary>
/// A picture that belongs to a table (e.g. a forest plot): a PNG written beside the table's other
/// outputs as "table-{id}-{Name}.png" and embedded after the table in the documents that show it.
/// </summary>
/// <param name="Name">The file-name part after the table id, e.g. "forest" (letters, digits and dashes).</param>
/// <param name="AltText">What the picture shows, for readers who cannot see it (the image's description in Word).</param>
/// <param name="Png">The PNG bytes, the same for the same inputs.</param>
/// <param name="WidthPixels">Width in pixels.</param>
/// <param name="HeightPixels">Height in pixels.</param>
public sealed record TableFigure(string Name, string AltText, byte[] Png, int WidthPixels, int HeightPixels);
