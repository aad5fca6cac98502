using OutputForge.Analysis;
using OutputForge.Results;

namespace OutputForge.Kinds.Subgroups;

/// <summary>
/// Row keys of the levels of one subgroup variable: the variable's key and the level's
/// ("agegr1-65-74"). Values that give the same key ("&lt;65" and "&gt;=65" both give "65") are told
/// apart by their position in print order ("agegr1-level-1"), so every key stays unique.
/// </summary>
internal static class SubgroupRowKeys
{
    public static IReadOnlyList<string> ForLevels(string variableKey, IReadOnlyList<SubgroupLevel> levels)
    {
        var keys = levels.Select(l => ResultKeys.FromLabel(l.Value)).ToList();
        var clash = keys.Any(k => k.Length == 0 || k == "interaction") || keys.Distinct(StringComparer.Ordinal).Count() != keys.Count;
        return keys.Select((k, i) => $"{variableKey}-{(clash ? $"level-{i + 1}" : k)}").ToList();
    }
}
