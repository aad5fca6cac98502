using OutputForge.Layout;

namespace OutputForge.Rendering.Text;

/// <summary>A fixed-width line of characters on which column texts are placed.</summary>
public sealed class TextLine
{
    private readonly char[] _chars;

    public TextLine(int width)
    {
        _chars = new char[width];
        Array.Fill(_chars, ' ');
    }

    /// <summary>Places <paramref name="text"/> in the region [start, start+width) with the given alignment.</summary>
    public void Place(string text, int start, int width, CellAlignment alignment)
    {
        int offset = alignment switch
        {
            CellAlignment.Center => Math.Max(0, (width - text.Length) / 2),
            CellAlignment.Right => Math.Max(0, width - text.Length),
            _ => 0,
        };
        for (int i = 0; i < text.Length && start + offset + i < _chars.Length; i++)
            _chars[start + offset + i] = text[i];
    }

    public void Fill(char c, int start, int width) => Array.Fill(_chars, c, start, width);

    /// <summary>The line without trailing blanks, so that diffs show only real changes.</summary>
    public override string ToString() => new string(_chars).TrimEnd();
}
