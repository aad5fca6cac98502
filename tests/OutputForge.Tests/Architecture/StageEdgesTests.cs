using System.Reflection;
using System.Text.RegularExpressions;
using OutputForge.Pipeline;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.Architecture;

/// <summary>
/// The stages of the core assembly use each other in one direction only (docs/architecture.md, "Stage edges"): each stage
/// may name the types of the stages listed for it and no others, so a cycle such as Pipeline ↔ Workflow cannot come back
/// unnoticed. A stage is a folder and namespace under OutputForge (OutputForge.Kinds.Subgroups is the Kinds stage).
/// </summary>
public class StageEdgesTests
{
    private static readonly Assembly Core = typeof(PackageRunner).Assembly;

    /// <summary>What each stage may use besides itself, the Stats assembly and outside libraries.</summary>
    public static readonly Dictionary<string, string[]> Allowed = new(StringComparer.Ordinal)
    {
        ["Common"] = [],
        ["Naming"] = [],
        ["Files"] = [],
        ["Expressions"] = ["Naming"],
        ["Choices"] = ["Naming"],
        ["Spec"] = ["Common", "Naming", "Files", "Expressions", "Choices"],
        ["Data"] = ["Common", "Naming", "Files", "Expressions", "Choices", "Spec"],
        ["Results"] = [],
        ["Analysis"] = ["Naming", "Expressions", "Choices", "Spec", "Data", "Results"],
        ["Kinds"] = ["Naming", "Expressions", "Choices", "Spec", "Data", "Results", "Analysis"],
        ["Layout"] = ["Common", "Naming", "Choices", "Spec", "Results"],
        ["Templates"] = ["Common", "Naming", "Files", "Spec", "Results", "Layout"],
        ["Rendering"] = ["Results", "Layout"],
        ["Pipeline"] = ["Common", "Naming", "Files", "Expressions", "Choices", "Spec", "Data", "Results", "Analysis", "Kinds", "Layout", "Templates", "Rendering"],
        ["Workflow"] = ["Common", "Naming", "Files", "Expressions", "Choices", "Spec", "Data", "Results", "Analysis", "Kinds", "Layout", "Templates", "Rendering", "Pipeline"],
        ["Demo"] = ["Common", "Naming", "Files", "Expressions", "Choices", "Spec", "Data", "Kinds"],
    };

    /// <summary>
    /// Crossings kept on purpose, each by type: the spec reads a table's kind settings and composes the table schema
    /// through the kind registry (a kind's folder holds its settings and schema fragment as well as its analysis), so
    /// the loader and <c>TableSpec.Settings</c> name the registry, and nothing else of Kinds.
    /// </summary>
    public static readonly (string From, Type Used)[] KeptCrossings =
    [
        ("Spec", typeof(OutputForge.Kinds.TableKinds)),
        ("Spec", typeof(OutputForge.Kinds.TableSchemaComposition)),
    ];

    [Fact]
    public void Every_stage_uses_only_the_stages_below_it()
    {
        var crossings = Core.GetTypes()
            .Where(t => !t.IsNested && StageOf(t) is not null)
            .SelectMany(t => TypeReferences.Of(t).Select(u => (From: t, u.Used, u.Where)))
            .Where(r => r.Used.Assembly == Core && StageOf(r.Used) is { } to && to != StageOf(r.From) && !Allowed[StageOf(r.From)!].Contains(to)
                && !KeptCrossings.Contains((StageOf(r.From)!, r.Used)))
            .Select(r => $"{StageOf(r.From)} -> {StageOf(r.Used)}: {r.From.FullName} ({r.Where}) uses {r.Used.FullName}")
            .Distinct()
            .Order(StringComparer.Ordinal)
            .ToList();
        Assert.True(crossings.Count == 0, "stage edges crossed:\n" + string.Join("\n", crossings));
    }

    /// <summary>The libraries that draw pictures and write documents; only Rendering may use them.</summary>
    private static readonly string[] DrawingLibraries = ["ScottPlot", "ClosedXML", "DocumentFormat.OpenXml", "SkiaSharp"];

    [Fact]
    public void Only_rendering_draws_pictures_and_writes_documents()
    {
        var uses = Core.GetTypes()
            .Where(t => !t.IsNested && StageOf(t) is { } stage && stage != "Rendering")
            .SelectMany(t => TypeReferences.Of(t).Select(u => (From: t, u.Used, u.Where)))
            .Where(r => DrawingLibraries.Contains(r.Used.Assembly.GetName().Name))
            .Select(r => $"{StageOf(r.From)}: {r.From.FullName} ({r.Where}) uses {r.Used.FullName}")
            .Distinct()
            .Order(StringComparer.Ordinal)
            .ToList();
        Assert.True(uses.Count == 0, "drawing or document library used outside Rendering:\n" + string.Join("\n", uses));
    }

    [Fact]
    public void Every_source_file_names_only_the_stages_its_stage_may_use()
    {
        // The compiled code does not show a constant's owner (the compiler copies its value), so the source is read too:
        // a using directive or a fully qualified name of a stage this folder may not use is a crossing as well.
        var core = Path.Combine(RepositoryRoot.Path, "src", "OutputForge");
        var named = new Regex(@"\bOutputForge\.(?<stage>[A-Z]\w*)\b");
        var crossings = new List<string>();
        foreach (var file in Directory.EnumerateFiles(core, "*.cs", SearchOption.AllDirectories))
        {
            var relative = Path.GetRelativePath(core, file).Replace('\\', '/');
            var stage = relative.Split('/')[0];
            if (!Allowed.TryGetValue(stage, out var allowed) || relative.Contains("/obj/") || relative.StartsWith("obj/", StringComparison.Ordinal) || relative.StartsWith("bin/", StringComparison.Ordinal))
            {
                continue;
            }
            var lines = File.ReadAllLines(file);
            for (var i = 0; i < lines.Length; i++)
            {
                foreach (Match match in named.Matches(lines[i]))
                {
                    var to = match.Groups["stage"].Value;
                    if (to != stage && Allowed.ContainsKey(to) && !allowed.Contains(to) && !KeptCrossings.Any(k => k.From == stage && k.Used.Namespace == "OutputForge." + to))
                    {
                        crossings.Add($"{relative}:{i + 1}: {stage} names {to}: {lines[i].Trim()}");
                    }
                }
            }
        }
        Assert.True(crossings.Count == 0, "stage edges crossed in source:\n" + string.Join("\n", crossings));
    }

    [Fact]
    public void Every_stage_of_the_core_assembly_is_ranked()
    {
        var unranked = Core.GetTypes().Select(StageOf).OfType<string>().Distinct().Where(s => !Allowed.ContainsKey(s)).ToList();
        Assert.Empty(unranked);
    }

    [Fact]
    public void The_allowed_edges_have_no_cycle()
    {
        // Each stage's allowed stages are ranked before it, so following the edges can never come back.
        var ranked = new List<string>();
        foreach (var (stage, uses) in Allowed)
        {
            Assert.All(uses, u => Assert.Contains(u, ranked));
            ranked.Add(stage);
        }
    }

    [Fact]
    public void The_scan_finds_a_reference_written_with_a_partial_namespace()
    {
        // Proof that the scan reads method bodies: the run calls the kind registry as "Kinds.TableKinds.For" inside
        // namespace OutputForge.Pipeline, with no using directive.
        var used = Core.GetTypes().Where(t => StageOf(t) == "Pipeline").SelectMany(TypeReferences.Of).Select(u => u.Used);
        Assert.Contains(typeof(OutputForge.Kinds.TableKinds), used);
    }

    /// <summary>The stage of a type of the core assembly: the namespace part after "OutputForge"; null for compiler-made types outside it.</summary>
    private static string? StageOf(Type type)
    {
        var parts = (type.Namespace ?? string.Empty).Split('.');
        return parts.Length >= 2 && parts[0] == "OutputForge" ? parts[1] : null;
    }
}
