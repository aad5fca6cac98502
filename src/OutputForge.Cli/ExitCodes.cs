namespace OutputForge.Cli;

/// <summary>The program's exit codes (documented in the README).</summary>
public static class ExitCodes
{
    public const int Success = 0;
    /// <summary>The command line itself is wrong (unknown option, missing value).</summary>
    public const int Usage = 1;
    /// <summary>A spec or a dataset is wrong; the message names the file and position.</summary>
    public const int InputError = 2;
    /// <summary>The outputs could not be written.</summary>
    public const int OutputError = 3;
    /// <summary>A fault of OutputForge itself.</summary>
    public const int InternalError = 70;
}
