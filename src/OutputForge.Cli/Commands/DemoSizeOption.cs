using System.CommandLine;
using OutputForge.Demo;

namespace OutputForge.Cli.Commands;

/// <summary>
/// `demo --size`: "standard" is the ordinary demo study; "pooled" enlarges it to the pooled-analysis
/// speed target (20,000 subjects unless --subjects says otherwise, weekly efficacy parameters, more
/// adverse events, and the 60-table spec set in specs/pooled, which the demo then runs).
/// </summary>
public static class DemoSizeOption
{
    public const string Standard = "standard";
    public const string Pooled = "pooled";

    public static Option<string> Create()
    {
        var option = new Option<string>("--size")
        {
            Description = $"standard: the ordinary demo study ({DemoSpecFiles.TableCount} tables); pooled: a pooled-analysis study for speed measurements (about 2.1 million BDS records, 200,000 adverse events, {PooledSpecSet.TableCount} tables).",
            DefaultValueFactory = _ => Standard,
        };
        option.AcceptOnlyFromAmong(Standard, Pooled);
        return option;
    }

    public static DemoStudyOptions Options(string? size, int? subjects, int loadCopies)
    {
        var pooled = size == Pooled;
        var count = subjects ?? (pooled ? PooledStudyOptions.TargetSubjects : new DemoStudyOptions().Subjects);
        return new DemoStudyOptions(count, LoadCopies: loadCopies) { Pooled = pooled ? PooledStudyOptions.Target : null };
    }
}
