namespace OutputForge.Stats.Models;

/// <summary>
/// Whether the responses are separated by the model's columns (Albert and Anderson 1984, Biometrika
/// 71:1-10): complete when every fitted probability is 0 or 1, quasi-complete when some are; in both
/// cases the maximum-likelihood estimate does not exist and the fit only approaches its limit.
/// </summary>
public enum Separation { None, QuasiComplete, Complete }
