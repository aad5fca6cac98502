using System.Text.RegularExpressions;

namespace OutputForge.Layout;

/// <summary>
/// Lines the numbers of each value column up: every one-line cell is padded so that the last
/// digit of its first number's integer part stands in the same character position in the whole
/// column. That puts the decimal points of estimates under each other, the counts right-aligned,
/// and the opening parentheses of "n (%)" cells in one line ("37 (24.8)" over "112 (75.2)"), and
/// every padded text of a column is then equally long, so centering the block keeps it aligned.
/// </summary>
/// <remarks>
/// Why padding, computed here, rather than Word decimal tab stops: a decimal tab aligns on one
/// character only and puts a count without a decimal point ("0", "26") where the points go, it
/// cannot serve "n (%)" and intervals in the same column, and it exists neither in the text preview
/// nor in a spreadsheet. Padding decided once in Layout makes Word and the text preview agree
/// character for character. The pads are no-break spaces (U+00A0), which Word and LibreOffice
/// never drop or squeeze at a line end as they may do with ordinary spaces. The alignment is exact
/// in a monospaced font (the default Courier New) and close in a proportional one. The Excel
/// sheet keeps the unpadded texts and numeric cells, which a reader copies or filters.
/// </remarks>
public static partial class NumberAlignment
{
    public const char Pad = '\u00A0';

    /// <summary>A number's integer digits, or a shell's placeholder digits ("x", "xx"), which align the same way.</summary>
    [GeneratedRegex(@"\d+|\bx+\b")]
    private static partial Regex Digits();

    public static IReadOnlyList<BodyRow> Apply(IReadOnlyList<BodyRow> rows)
    {
        if (rows.Count == 0)
            return rows;
        int columns = rows.Max(r => r.Cells.Count);
        var cells = rows.Select(r => r.Cells.ToArray()).ToArray();
        for (int c = 0; c < columns; c++)
        {
            var members = Enumerable.Range(0, rows.Count)
                .Where(r => c < cells[r].Length && IsAlignable(cells[r][c].Text))
                .ToList();
            if (members.Count < 2)
                continue;
            int anchor = members.Max(r => Anchor(cells[r][c].Text));
            int length = members.Max(r => anchor - Anchor(cells[r][c].Text) + cells[r][c].Text.Length);
            foreach (var r in members)
            {
                var text = cells[r][c].Text;
                var padded = new string(Pad, anchor - Anchor(text)) + text;
                padded += new string(Pad, length - padded.Length);
                cells[r][c] = cells[r][c] with { Aligned = padded == text ? null : padded };
            }
        }
        return rows.Select((row, r) => row with { Cells = cells[r] }).ToList();
    }

    /// <summary>One-line, non-empty texts take part; multi-line cells keep their own layout.</summary>
    private static bool IsAlignable(string text) => text.Trim().Length > 0 && !text.Contains('\n');

    /// <summary>The character position just after the integer digits of the first number (the text's end if it has none).</summary>
    public static int Anchor(string text)
    {
        var match = Digits().Match(text);
        return match.Success ? match.Index + match.Length : text.Length;
    }
}
