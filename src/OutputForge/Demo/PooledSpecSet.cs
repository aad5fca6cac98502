using System.Text;
using System.Text.Json;
using System.Text.Json.Nodes;

namespace OutputForge.Demo;

/// <summary>
/// The pooled study's spec set (specs/pooled): 60 tables of all nine kinds, made from the demo's own
/// table specs repeated across the weekly efficacy parameters, populations, visits and subgroups, with
/// the demo's study spec listing them. Written beside specs/demo so the schema references still resolve.
/// </summary>
public static class PooledSpecSet
{
    public const int TableCount = 60;
    private const string DemoPrefix = "OutputForge.DemoSpecs.";
    private static readonly JsonSerializerOptions Indented = new() { WriteIndented = true, Encoder = System.Text.Encodings.Web.JavaScriptEncoder.UnsafeRelaxedJsonEscaping };

    private static readonly (string Condition, string Label)[] Subgroups =
    [
        ("SEX = 'F'", "Female Subjects"), ("SEX = 'M'", "Male Subjects"),
        ("AGEGR1 = '<65'", "Subjects Aged under 65 Years"), ("AGEGR1 = '>=65'", "Subjects Aged 65 Years or Over"),
    ];

    /// <summary>Writes specs/pooled/study.json and specs/pooled/tables/*.json under <paramref name="root"/>; returns the study file's path.</summary>
    public static string Write(string root, int weeklyParameters)
    {
        var folder = Path.Combine(root, "specs", "pooled");
        Directory.CreateDirectory(Path.Combine(folder, "tables"));
        var files = new List<string>();
        foreach (var (slug, table) in Tables(weeklyParameters))
        {
            var file = $"tables/{table["id"]!.GetValue<string>()}-{slug}.json";
            WriteJson(Path.Combine(folder, file), table);
            files.Add(file);
        }
        var study = Demo("study.json");
        study["tables"] = new JsonArray(files.Select(f => (JsonNode)JsonValue.Create(f)).ToArray());
        var studyFile = Path.Combine(folder, "study.json");
        WriteJson(studyFile, study);
        return studyFile;
    }

    /// <summary>The tables with the slug of their file name, in package order.</summary>
    internal static IEnumerable<(string Slug, JsonObject Table)> Tables(int weeklyParameters)
    {
        var weekly = WeeklyEfficacyParameter.All.Take(weeklyParameters).ToList();
        var list = new List<(string, JsonObject)>();

        list.Add(("populations", Retitled(DemoTable("14.1.1-populations.json"), "14.1.1.1")));
        list.Add(("populations-65-or-over", Subgroup(DemoTable("14.1.1-populations.json"), "14.1.1.2", Subgroups[3])));
        list.Add(("disposition", Retitled(DemoTable("14.1.2-disposition.json"), "14.1.2.1")));
        var chiSquare = Population(DemoTable("14.1.2-disposition.json"), "14.1.2.2", "safety", "Safety Population");
        foreach (var block in chiSquare["disposition"]!["blocks"]!.AsArray())
            block!["test"] = "chi-square";
        list.Add(("disposition-safety-chi-square", chiSquare));
        list.Add(("demographics", Retitled(DemoTable("14.1.3-demographics.json"), "14.1.3.1")));
        list.Add(("demographics-safety", Population(ChiSquareDemographics(), "14.1.3.2", "safety", "Safety Population")));
        list.Add(("demographics-pp", Population(ChiSquareDemographics(), "14.1.3.3", "perprotocol", "Per-Protocol Population")));
        list.Add(("demographics-female", Subgroup(ChiSquareDemographics(), "14.1.3.4", Subgroups[0])));

        var responders = new List<(string, JsonObject)>
        {
            ("itch-responders-week4-itt", DemoTable("14.2.1.3-itch-responders-week4-itt.json")),
            ("itch-responders-week8-itt", DemoTable("14.2.1.4-itch-responders-week8-itt.json")),
            ("itch-responders-week12-itt", DemoTable("14.2.1.1-itch-responders-week12-itt.json")),
            ("itch-responders-week12-pp", DemoTable("14.2.1.2-itch-responders-week12-pp.json")),
        };
        var subgroupSlugs = new[] { "female", "male", "under-65", "65-or-over" };
        for (var g = 0; g < Subgroups.Length; g++)
            responders.Add(($"itch-responders-week12-itt-{subgroupSlugs[g]}", Subgroup(DemoTable("14.2.1.1-itch-responders-week12-itt.json"), "", Subgroups[g])));
        foreach (var p in weekly)
            responders.Add(($"{p.Code.ToLowerInvariant()}-responders-week12-itt", WeeklyResponders(p, 12)));
        foreach (var p in weekly.Take(1))
            responders.Add(($"{p.Code.ToLowerInvariant()}-responders-week4-itt", WeeklyResponders(p, 4)));
        Number(list, responders, "14.2.1");

        var continuous = new List<(string, JsonObject)>
        {
            ("itch-change-by-visit-itt", DemoTable("14.2.2.1-itch-change-by-visit-itt.json")),
            ("itch-change-week12-pp", DemoTable("14.2.2.2-itch-change-week12-pp.json")),
        };
        foreach (var p in weekly)
            continuous.Add(($"{p.Code.ToLowerInvariant()}-change-by-visit-itt", WeeklyChange(p, DemoTable("14.2.2.1-itch-change-by-visit-itt.json"))));
        foreach (var p in weekly)
            continuous.Add(($"{p.Code.ToLowerInvariant()}-change-week12-pp", WeeklyChange(p, DemoTable("14.2.2.2-itch-change-week12-pp.json"))));
        for (var g = 0; g < 2; g++)
            continuous.Add(($"itch-change-by-visit-itt-{subgroupSlugs[g]}", Subgroup(DemoTable("14.2.2.1-itch-change-by-visit-itt.json"), "", Subgroups[g])));
        Number(list, continuous, "14.2.2");

        Number(list,
        [
            ("time-to-itch-response-itt", DemoTable("14.2.3.1-time-to-itch-response-itt.json")),
            ("time-to-discontinuation-itt", DemoTable("14.2.3.2-time-to-discontinuation-itt.json")),
            ("time-to-itch-response-efficacy", Population(DemoTable("14.2.3.1-time-to-itch-response-itt.json"), "", "efficacy", "Efficacy Evaluable Population")),
            ("time-to-itch-response-pp", Population(DemoTable("14.2.3.1-time-to-itch-response-itt.json"), "", "perprotocol", "Per-Protocol Population")),
            ("time-to-discontinuation-safety", Population(DemoTable("14.2.3.2-time-to-discontinuation-itt.json"), "", "safety", "Safety Population")),
            ("time-to-itch-response-itt-female", Subgroup(DemoTable("14.2.3.1-time-to-itch-response-itt.json"), "", Subgroups[0])),
        ], "14.2.3");

        Number(list,
        [
            ("itch-impression-by-visit-itt", DemoTable("14.2.4.1-itch-impression-by-visit-itt.json")),
            ("itch-impression-by-visit-locf-itt", DemoTable("14.2.4.2-itch-impression-by-visit-locf-itt.json")),
        ], "14.2.4");
        Number(list, [("itch-responders-week12-subgroups-itt", DemoTable("14.2.5.1-itch-responders-week12-subgroups-itt.json"))], "14.2.5");

        var severe = DemoTable("14.3.1.1-teae-soc-pt.json");
        severe["title"] = new JsonArray("Severe Treatment-Emergent Adverse Events by System Organ Class and Preferred Term");
        severe["adverseEvents"]!["where"] = "TRTEMFL = 'Y' and AESEV = 'SEVERE'";
        severe["adverseEvents"]!["anyLabel"] = "Subjects with at least one severe TEAE";
        var related = DemoTable("14.3.1.1-teae-soc-pt.json");
        related["title"] = new JsonArray("Possibly or Probably Related Treatment-Emergent Adverse Events by System Organ Class and Preferred Term");
        related["adverseEvents"]!["where"] = "TRTEMFL = 'Y' and AEREL in ('POSSIBLY RELATED', 'PROBABLY RELATED')";
        related["adverseEvents"]!["anyLabel"] = "Subjects with at least one related TEAE";
        Number(list,
        [
            ("teae-soc-pt", DemoTable("14.3.1.1-teae-soc-pt.json")),
            ("teae-soc-pt-severity", DemoTable("14.3.1.2-teae-soc-pt-severity.json")),
            ("common-teae", DemoTable("14.3.1.3-common-teae.json")),
            ("serious-teae", DemoTable("14.3.1.4-serious-teae.json")),
            ("severe-teae", severe),
            ("related-teae", related),
        ], "14.3.1");
        return list;
    }

    /// <summary>
    /// The demo's demographics with chi-square instead of Fisher's exact test for race: only the demo's own
    /// disposition and demographics tables (14.1.2.1, 14.1.3.1) ask for Fisher's exact r x c test, whose cost
    /// at this size is measured separately.
    /// </summary>
    private static JsonObject ChiSquareDemographics()
    {
        var table = DemoTable("14.1.3-demographics.json");
        foreach (var variable in table["demographics"]!["variables"]!.AsArray())
        {
            if (variable!["test"]?.GetValue<string>() == "fisher")
                variable["test"] = "chi-square";
        }
        return table;
    }

    private static void Number(List<(string, JsonObject)> list, List<(string Slug, JsonObject Table)> section, string prefix)
    {
        for (var i = 0; i < section.Count; i++)
            list.Add((section[i].Slug, Retitled(section[i].Table, $"{prefix}.{i + 1}")));
    }

    private static JsonObject Retitled(JsonObject table, string id)
    {
        if (id.Length > 0) table["id"] = id;
        return table;
    }

    private static JsonObject Population(JsonObject table, string id, string population, string label)
    {
        table["population"] = population;
        AddTitleLine(table, label);
        return Retitled(table, id);
    }

    private static JsonObject Subgroup(JsonObject table, string id, (string Condition, string Label) subgroup)
    {
        table["subset"] = subgroup.Condition;
        AddTitleLine(table, $"Subgroup: {subgroup.Label}");
        return Retitled(table, id);
    }

    private static void AddTitleLine(JsonObject table, string line) => table["title"]!.AsArray().Add(line);

    private static JsonObject WeeklyResponders(WeeklyEfficacyParameter p, int week)
    {
        var table = DemoTable("14.2.1.1-itch-responders-week12-itt.json");
        var name = p.Name[..p.Name.IndexOf(" (", StringComparison.Ordinal)];
        table["title"] = new JsonArray($"{name} Responders (At Least 30% Reduction from Baseline) at Week {week}", "Non-Responder Imputation");
        var endpoint = table["endpoint"]!;
        endpoint["parameter"] = p.Code;
        endpoint["visit"] = WeeklyEfficacyParameter.VisitName(week);
        endpoint["response"] = "PCHG <= -30";
        endpoint["label"] = $"{name} responder at Week {week}";
        table["footnotes"] = new JsonArray($"Responder: {p.Name} reduced by at least 30% from baseline.");
        return table;
    }

    private static JsonObject WeeklyChange(WeeklyEfficacyParameter p, JsonObject table)
    {
        var name = p.Name[..p.Name.IndexOf(" (", StringComparison.Ordinal)];
        var title = table["title"]!.AsArray();
        title[0] = title[0]!.GetValue<string>().Replace("Weekly Mean Itch Score", name, StringComparison.Ordinal);
        table["endpoint"]!["parameter"] = p.Code;
        table["endpoint"]!["label"] = p.Name;
        return table;
    }

    private static JsonObject DemoTable(string file) => Demo("tables/" + file);

    private static JsonObject Demo(string relative)
    {
        var assembly = typeof(PooledSpecSet).Assembly;
        var resource = assembly.GetManifestResourceNames()
            .Single(r => r.StartsWith(DemoPrefix, StringComparison.Ordinal) && r[DemoPrefix.Length..].Replace('\\', '/') == relative);
        using var stream = assembly.GetManifestResourceStream(resource)!;
        return JsonNode.Parse(stream)!.AsObject();
    }

    private static void WriteJson(string path, JsonNode node) =>
        File.WriteAllText(path, node.ToJsonString(Indented) + "\n", new UTF8Encoding(false));
}
