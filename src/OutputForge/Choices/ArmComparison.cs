namespace OutputForge.Choices;

/// <summary>Which arms one test of a categorical-by-visit table compares.</summary>
public enum ArmComparison
{
    EachVsControl,
    AllArms,
}
