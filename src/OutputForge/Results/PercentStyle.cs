namespace OutputForge.Results;

/// <summary>
/// Table-wide choices for "n (%)" cells that the Layout stage applies: whether a zero count shows
/// as "0" alone (common practice) or with its percentage, and whether a percentage that rounds to
/// 0 or 100 without being 0 or 100 shows as "&lt;0.1" / "&gt;99.9".
/// </summary>
public sealed record PercentStyle(bool ZeroAsCountOnly = true, bool EdgeMarks = false)
{
    public static readonly PercentStyle Default = new();
}
