namespace OutputForge.Cli;

/// <summary>How much the run log says: warnings and errors only, the usual lines, or details as well.</summary>
public enum Verbosity { Quiet, Normal, Verbose }
