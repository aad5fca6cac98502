namespace OutputForge.Stats.Models;

/// <summary>How the coefficients of an adjusted logistic regression are estimated.</summary>
public enum LogisticEstimation
{
    /// <summary>Maximum likelihood, or Firth's penalized likelihood when the responses are separated (the ML estimates then do not exist).</summary>
    FirthWhenSeparated,

    /// <summary>Maximum likelihood only: a separated design is not estimable.</summary>
    MaximumLikelihood,

    /// <summary>Firth's (1993) penalized likelihood always.</summary>
    Firth,
}
