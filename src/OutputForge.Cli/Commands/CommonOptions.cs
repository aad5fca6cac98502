using System.CommandLine;
using OutputForge.Rendering;
using OutputForge.Common;

namespace OutputForge.Cli.Commands;

/// <summary>Options shared by the commands that write a table package.</summary>
public static class CommonOptions
{
    public static Option<string> Output(string description) => new("--out", "-o")
    {
        Description = description,
        Required = true,
    };

    /// <param name="alsoWritten">What the command writes whatever the formats (e.g. "results.json and manifest.json are always written."), or null.</param>
    public static Option<string[]> Formats(string? alsoWritten = null) => new("--format", "-f")
    {
        Description = $"Output formats, comma-separated or repeated: {string.Join(", ", OutputFormats.Names)} (default: {string.Join(",", OutputFormats.Default)})." +
                      (alsoWritten is null ? string.Empty : " " + alsoWritten),
        AllowMultipleArgumentsPerToken = true,
    };

    public static Option<bool> Quiet() => new("--quiet", "-q")
    {
        Description = "Print only warnings and errors.",
    };

    public static Option<bool> Verbose() => new("--verbose", "-v")
    {
        Description = "Also print details: each table's build time and the stages' timings.",
    };

    /// <summary>The log for a run: a progress line on a terminal, plain lines otherwise (redirected, CI, tests).</summary>
    public static Pipeline.IRunLog Log(TextWriter error, bool quiet, bool verbose)
    {
        var verbosity = quiet ? Verbosity.Quiet : verbose ? Verbosity.Verbose : Verbosity.Normal;
        return ReferenceEquals(error, Console.Error) && TerminalRunLog.Available
            ? new TerminalRunLog(verbosity)
            : new StderrRunLog(error, verbosity);
    }

    public static Option<string> ControlCharacters() => new("--control-characters")
    {
        Description = "Control characters in data values, which Word and Excel cannot store: 'refuse' (stop with an error naming file, line and variable; default) or 'replace' (show U+FFFD and warn).",
        DefaultValueFactory = _ => "refuse",
    };

    /// <summary>
    /// The tables --tables selects: null (every table) when the option is not given; a usage error when it is given with
    /// nothing in it (e.g. --tables ''), which would otherwise run no table and still rewrite results.json and the manifest.
    /// </summary>
    public static bool TryTableSelection(ParseResult parse, Option<string[]> option, TextWriter error, out string[]? selected)
    {
        selected = null;
        if (parse.GetResult(option) is null)
        {
            return true;
        }
        var values = parse.GetValue(option) ?? [];
        if (values.All(v => v.Split(',').All(string.IsNullOrWhiteSpace)))
        {
            error.WriteLine("outputforge: error: --tables: the selection is empty; give table ids or patterns (e.g. --tables 14.2.1.1,'14.3.*'), or leave out --tables for every table");
            return false;
        }
        selected = values;
        return true;
    }

    public static bool TryDataOptions(string? controlCharacters, TextWriter error, out Data.DataReadOptions options)
    {
        options = Data.DataReadOptions.Default;
        switch (controlCharacters)
        {
            case null or "refuse":
                return true;
            case "replace":
                options = new Data.DataReadOptions(Data.ControlCharacterPolicy.Replace);
                return true;
            default:
                error.WriteLine($"outputforge: error: --control-characters: expected 'refuse' or 'replace', not '{controlCharacters}'");
                return false;
        }
    }

    public static Option<bool> Combined() => new("--combined")
    {
        Description = "Also write all tables in one file: all-tables.docx (a contents page, then each table on new pages, in table-number order) and all-tables.xlsx (one sheet per table and a 'results' sheet with every number), for the formats requested.",
    };

    public static Option<string?> Timestamp() => new("--timestamp")
    {
        Description = "Run time to print in the outputs, as ISO 8601 (e.g. 2026-12-01T09:00:00Z); default: the SOURCE_DATE_EPOCH environment variable (seconds since 1970) if set, else now. The same specs, data and timestamp give the same outputs.",
    };

    /// <summary>The run time from --timestamp or SOURCE_DATE_EPOCH; null for "now". Invalid text is a usage error.</summary>
    public static bool TryRunTime(string? text, TextWriter error, out DateTimeOffset? time)
    {
        time = null;
        if (text is not null)
        {
            if (DateTimeOffset.TryParse(text, System.Globalization.CultureInfo.InvariantCulture,
                    System.Globalization.DateTimeStyles.AssumeUniversal | System.Globalization.DateTimeStyles.AdjustToUniversal, out var parsed))
            {
                time = parsed;
                return true;
            }
            error.WriteLine($"outputforge: error: --timestamp: '{text}' is not an ISO 8601 date and time (e.g. 2026-12-01T09:00:00Z)");
            return false;
        }
        var epoch = Environment.GetEnvironmentVariable("SOURCE_DATE_EPOCH");
        if (string.IsNullOrWhiteSpace(epoch))
        {
            return true;
        }
        if (long.TryParse(epoch, System.Globalization.NumberStyles.Integer, System.Globalization.CultureInfo.InvariantCulture, out var seconds))
        {
            time = DateTimeOffset.FromUnixTimeSeconds(seconds);
            return true;
        }
        error.WriteLine($"outputforge: error: SOURCE_DATE_EPOCH: '{epoch}' is not a whole number of seconds since 1970-01-01");
        return false;
    }

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
