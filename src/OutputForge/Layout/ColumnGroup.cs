namespace OutputForge.Layout;

/// <summary>
/// A spanning column header over the columns with the given keys (e.g. "QF-217" over the
/// "qf-217-10-mg" and "qf-217-30-mg" columns). <paramref name="Where"/> names the group in error
/// messages (e.g. the spec's JSON pointer).
/// </summary>
public sealed record ColumnGroup(string Label, IReadOnlyList<string> ColumnKeys, string Where);
