namespace OutputForge.Stats.Models;

/// <summary>How the Cox partial likelihood treats tied event times.</summary>
public enum CoxTies
{
    /// <summary>Efron (JASA 72, 1977): the default of R survival's coxph.</summary>
    Efron,
    /// <summary>Breslow (Biometrics 30, 1974); the default of several other packages (recalled from memory).</summary>
    Breslow,
}
