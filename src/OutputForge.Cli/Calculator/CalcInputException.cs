namespace OutputForge.Cli.Calculator;

/// <summary>A calculator argument that cannot be used; the message names the option and what was expected.</summary>
public sealed class CalcInputException(string message) : Exception(message);
