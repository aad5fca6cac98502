namespace OutputForge.Pipeline;

/// <summary>A combination of command-line choices a run refuses (e.g. the output folder inside the data folder): a usage error.</summary>
public sealed class UsageException(string message) : Exception(message);
