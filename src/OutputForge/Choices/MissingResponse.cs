namespace OutputForge.Choices;

/// <summary>How the subjects of the population without an endpoint record are handled (the spec's endpoint.missing).</summary>
public enum MissingResponse
{
    NonResponder,
    Exclude,
    Observed,
}
