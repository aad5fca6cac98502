using System.CommandLine;
using OutputForge.Cli.Commands;

namespace OutputForge.Cli;

public static class Program
{
    public static int Main(string[] args) => Run(args, Console.Error, Console.Out);

    /// <summary>The whole program, with stderr given, so tests can run it in-process.</summary>
    public static int Run(string[] args, TextWriter error) => Run(args, error, Console.Out);

    /// <summary>The whole program, with stderr and stdout given (the workflow commands print their summaries on stdout).</summary>
    public static int Run(string[] args, TextWriter error, TextWriter output)
    {
        var root = new RootCommand(
            "OutputForge turns a clinical trial's ADaM datasets into the summary tables of a clinical study report " +
            "(Word, Excel and results.json). Results must be verified under your own validated processes, the SAP and " +
            "applicable regulatory guidance.")
        {
            RunCommand.Create(error),
            DemoCommand.Create(error),
            CompareCommand.Create(output, error),
            ChangesCommand.Create(output, error),
            CheckCommand.Create(output, error),
            ShellsCommand.Create(error),
            CalcCommand.Create(output, error),
        };
        var parse = root.Parse(args);
        return parse.Invoke(new InvocationConfiguration { Error = error, Output = output });
    }
}
