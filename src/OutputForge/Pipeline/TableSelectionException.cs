namespace OutputForge.Pipeline;

/// <summary>A --tables pattern that matches no table of the package: a command-line (usage) error, raised before any data is read.</summary>
public sealed class TableSelectionException(string message) : Exception(message);
