using System.Text.RegularExpressions;

namespace OutputForge.Tests.Workflow;

/// <summary>
/// A cell of placeholders only: x for digits, "0." before the decimals of a p-value, and the
/// punctuation of the patterns ("x (xx.x)", "x (xx%)", "(x.xx, x.xx)", "x.x, x.x", "x (xx.x) [x]", "x/x (xx.x)").
/// No digit other than that 0, and no letter other than x (so no "NE"), can match.
/// </summary>
public static partial class ShellCellPattern
{
    [GeneratedRegex(@"^(?:[x., ()\[\]%\u00a0/-]|0\.x)*$")]
    public static partial Regex Placeholders();
}
