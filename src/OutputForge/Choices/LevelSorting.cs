namespace OutputForge.Choices;

/// <summary>The order of the levels of a categorical variable, or of adverse event rows, where the spec lists none.</summary>
public enum LevelSorting
{
    Alphabetical,
    Frequency,
}
