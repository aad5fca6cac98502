namespace OutputForge.Stats;

/// <summary>Validation shared by the two-group comparisons (events out of subjects in group 1 and group 2).</summary>
internal static class TwoGroupCounts
{
    public static void Validate(int events1, int n1, int events2, int n2)
    {
        Arm(events1, n1, 1);
        Arm(events2, n2, 2);
    }

    public static string EmptyGroupReason(int n1, int n2)
        => n1 == 0 && n2 == 0 ? "no subjects in either group" : $"no subjects in group {(n1 == 0 ? 1 : 2)}";

    private static void Arm(int events, int n, int group)
    {
        if (n < 0)
        {
            throw new ArgumentOutOfRangeException(group == 1 ? "n1" : "n2", n, $"The number of subjects in group {group} cannot be negative.");
        }
        if (events < 0 || events > n)
        {
            throw new ArgumentOutOfRangeException(group == 1 ? "events1" : "events2", events, $"The number of events in group {group} must lie between 0 and {n}.");
        }
    }
}
