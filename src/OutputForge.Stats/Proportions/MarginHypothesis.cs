namespace OutputForge.Stats.Proportions;

/// <summary>What a comparison against a margin sets out to show.</summary>
public enum MarginHypothesis
{
    /// <summary>The arm is not worse than the control by the margin or more: H0 difference at or beyond -margin on the worse side.</summary>
    NonInferiority,

    /// <summary>The arm is better than the control by more than the margin (0 for plain superiority).</summary>
    Superiority,
}

/// <summary>Which direction of the difference (arm minus control) is better for the subject.</summary>
public enum MarginDirection
{
    /// <summary>A larger value is better (a response rate, an improvement score).</summary>
    HigherIsBetter,

    /// <summary>A smaller value is better (an event rate, a symptom score).</summary>
    LowerIsBetter,
}

/// <summary>The conclusion of a comparison against a margin.</summary>
public enum MarginConclusion
{
    /// <summary>The null hypothesis is rejected at the one-sided alpha: non-inferiority (or superiority) is shown.</summary>
    Shown,

    /// <summary>The null hypothesis is not rejected.</summary>
    NotShown,

    /// <summary>The comparison could not be made (an empty group, no variance).</summary>
    NotEstimable,
}
