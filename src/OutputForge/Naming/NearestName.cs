namespace OutputForge.Naming;

/// <summary>
/// Finds the valid name closest to a mistyped one (Levenshtein distance, case-insensitive), so an
/// error can say "did you mean ...". Returns null when nothing is close enough to be a likely typo.
/// </summary>
public static class NearestName
{
    public static string? Find(string wrong, IEnumerable<string> candidates)
    {
        string? best = null;
        var bestDistance = int.MaxValue;
        foreach (var candidate in candidates)
        {
            var distance = Distance(wrong.ToUpperInvariant(), candidate.ToUpperInvariant());
            if (distance < bestDistance || (distance == bestDistance && string.CompareOrdinal(candidate, best) < 0))
            {
                best = candidate;
                bestDistance = distance;
            }
        }
        // A name more than about half rewritten is a different name, not a typo.
        var limit = Math.Max(2, wrong.Length / 2);
        return bestDistance <= limit ? best : null;
    }

    /// <summary>The hint appended to an error message: " (did you mean 'X'?)" or, failing that, the valid names.</summary>
    public static string Hint(string wrong, IReadOnlyCollection<string> candidates)
    {
        var nearest = Find(wrong, candidates);
        if (nearest is not null)
        {
            return $" (did you mean '{nearest}'?)";
        }
        if (candidates.Count == 0)
        {
            return string.Empty;
        }
        var shown = candidates.OrderBy(c => c, StringComparer.Ordinal).Take(12).ToList();
        var more = candidates.Count > shown.Count ? ", ..." : string.Empty;
        return $" (valid: {string.Join(", ", shown)}{more})";
    }

    private static int Distance(string a, string b)
    {
        var previous = new int[b.Length + 1];
        var current = new int[b.Length + 1];
        for (var j = 0; j <= b.Length; j++)
        {
            previous[j] = j;
        }
        for (var i = 1; i <= a.Length; i++)
        {
            current[0] = i;
            for (var j = 1; j <= b.Length; j++)
            {
                var cost = a[i - 1] == b[j - 1] ? 0 : 1;
                current[j] = Math.Min(Math.Min(current[j - 1] + 1, previous[j] + 1), previous[j - 1] + cost);
            }
            (previous, current) = (current, previous);
        }
        return previous[b.Length];
    }
}
