namespace OutputForge.Pipeline;

/// <summary>A run that cannot proceed for a reason outside the spec and the data (e.g. the output folder).</summary>
public sealed class RunException(string message) : Exception(message);
