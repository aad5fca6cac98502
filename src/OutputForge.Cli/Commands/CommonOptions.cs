using System.CommandLine;
using OutputForge.Rendering;

namespace OutputForge.Cli.Commands;

/// <summary>Options shared by the commands that write a table package.</summary>
public static class CommonOptions
{
    public static Option<string> Output(string description) => new("--out", "-o")
    {
        Description = description,
        Required = true,
    };

    public static Option<string[]> Formats() => new("--format", "-f")
    {
        Description = $"Output formats, comma-separated or repeated: {string.Join(", ", OutputFormats.Names)} (default: {string.Join(",", OutputFormats.Default)}). results.json is always written.",
        AllowMultipleArgumentsPerToken = true,
    };

    public static Option<bool> Quiet() => new("--quiet", "-q")
    {
        Description = "Print only warnings and errors.",
    };

    /// <summary>Resolves format names to renderers; an unknown name is a usage error naming the valid ones.</summary>
    public static IReadOnlyList<ITableRenderer> Renderers(string[]? requested, TextWriter error, out bool valid)
    {
        var names = requested is null || requested.Length == 0
            ? OutputFormats.Default
            : requested.SelectMany(r => r.Split(',', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries)).Distinct().ToList();
        var renderers = new List<ITableRenderer>();
        valid = true;
        foreach (var name in names)
        {
            var renderer = OutputFormats.Find(name);
            if (renderer is null)
            {
                error.WriteLine($"outputforge: error: --format: unknown format '{name}' (valid: {string.Join(", ", OutputFormats.Names)})");
                valid = false;
                continue;
            }
            renderers.Add(renderer);
        }
        return renderers;
    }
}
