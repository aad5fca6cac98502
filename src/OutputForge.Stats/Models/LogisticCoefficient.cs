namespace OutputForge.Stats.Models;

/// <summary>One coefficient of a fitted logistic regression on the logit scale: estimate, standard error, Wald z and its two-sided p-value.</summary>
public sealed record LogisticCoefficient(string Name, double Estimate, double StandardError, double Z, double WaldPValue);
