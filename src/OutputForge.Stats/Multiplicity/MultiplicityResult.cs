namespace OutputForge.Stats.Multiplicity;

/// <summary>The decisions of one procedure at familywise level <see cref="Alpha"/>, one per hypothesis in the caller's order.</summary>
public sealed record MultiplicityResult(MultiplicityProcedure Procedure, double Alpha, IReadOnlyList<HypothesisDecision> Hypotheses);
