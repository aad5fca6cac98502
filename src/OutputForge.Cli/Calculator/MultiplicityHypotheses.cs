namespace OutputForge.Cli.Calculator;

/// <summary>
/// What `calc multiplicity` tests: the hypotheses' names (H1, H2, ... unless a file names them), their p-values, and
/// where the procedure takes them, the weights and the transition matrix.
/// </summary>
public sealed record MultiplicityHypotheses(
    IReadOnlyList<string> Names,
    IReadOnlyList<double> PValues,
    IReadOnlyList<double>? Weights,
    IReadOnlyList<IReadOnlyList<double>>? Transitions);
