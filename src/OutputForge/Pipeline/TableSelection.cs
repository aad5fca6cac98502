using System.Text.RegularExpressions;
using OutputForge.Spec;

namespace OutputForge.Pipeline;

/// <summary>
/// Which tables a run produces: all, or those whose id equals one of the given ids or matches one
/// of the given patterns ("14.2.*": '*' any run of characters, '?' one character; case-insensitive).
/// </summary>
public static class TableSelection
{
    /// <exception cref="TableSelectionException">A pattern matches no table id.</exception>
    public static IReadOnlyList<TableSpec> Select(IReadOnlyList<TableSpec> tables, IReadOnlyList<string>? patterns)
    {
        if (patterns is null || patterns.Count == 0)
        {
            return tables;
        }
        var expanded = patterns.SelectMany(p => p.Split(',', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries)).ToList();
        var unmatched = expanded.Where(p => !tables.Any(t => Matches(t.Id, p))).ToList();
        if (unmatched.Count > 0)
        {
            throw new TableSelectionException($"--tables: no table id matches {string.Join(", ", unmatched.Select(u => $"'{u}'"))} (ids: {string.Join(", ", tables.Select(t => t.Id))})");
        }
        return tables.Where(t => expanded.Any(p => Matches(t.Id, p))).ToList();
    }

    public static bool Matches(string id, string pattern)
    {
        var regex = "^" + Regex.Escape(pattern).Replace(@"\*", ".*").Replace(@"\?", ".") + "$";
        return Regex.IsMatch(id, regex, RegexOptions.IgnoreCase | RegexOptions.CultureInvariant);
    }
}
