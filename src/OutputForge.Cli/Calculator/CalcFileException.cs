namespace OutputForge.Cli.Calculator;

/// <summary>A calculator input file that cannot be used; the message names the file, the line and what was expected (exit code 2).</summary>
public sealed class CalcFileException(string message) : Exception(message);
