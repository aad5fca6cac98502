namespace OutputForge.Choices;

/// <summary>Whether a demographics variable is summarized by descriptive statistics or by n (%) per level.</summary>
public enum DemographicVariableType
{
    Continuous,
    Categorical,
}
