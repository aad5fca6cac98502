namespace OutputForge.Stats.Multiplicity;

/// <summary>A procedure that controls the familywise error rate over several hypotheses in the strong sense.</summary>
public enum MultiplicityProcedure
{
    /// <summary>Single-step Bonferroni: each hypothesis at alpha / m.</summary>
    Bonferroni,
    /// <summary>Holm (1979) step-down.</summary>
    Holm,
    /// <summary>Hochberg (1988) step-up (valid under positive dependence, Sarkar 1998).</summary>
    Hochberg,
    /// <summary>Hommel (1988): the closed test of Simes tests.</summary>
    Hommel,
    /// <summary>Fixed sequence: each hypothesis at full alpha in a prespecified order, stopping at the first non-rejection.</summary>
    FixedSequence,
    /// <summary>Fallback (Wiens 2003): weighted alpha in a prespecified order, a rejected hypothesis's level passed on to the next.</summary>
    Fallback,
    /// <summary>Single-step weighted Bonferroni: hypothesis i at w_i alpha.</summary>
    WeightedBonferroni,
    /// <summary>The graphical approach of Bretz, Maurer, Brannath and Posch (2009): weights and a transition matrix.</summary>
    Graphical,
}
