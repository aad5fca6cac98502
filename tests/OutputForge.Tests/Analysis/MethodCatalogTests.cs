using System.Collections;
using System.Reflection;
using System.Text.Json;
using System.Text.Json.Nodes;
using OutputForge.Analysis;
using OutputForge.Choices;
using OutputForge.Cli;
using OutputForge.Kinds;
using OutputForge.Spec;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.Analysis;

/// <summary>
/// The method catalogue is the one list of option names: the composed table schema, the typed settings' defaults, the
/// `calc` command and docs/methods.md must all say what it says.
/// </summary>
public sealed class MethodCatalogTests
{
    [Fact]
    public void Docs_methods_page_lists_the_catalogue()
    {
        var page = File.ReadAllText(Path.Combine(RepositoryRoot.Path, "docs", "methods.md")).ReplaceLineEndings("\n");
        var start = page.IndexOf(MethodCatalogPage.Start, StringComparison.Ordinal);
        var end = page.IndexOf(MethodCatalogPage.End, StringComparison.Ordinal);
        Assert.True(start >= 0 && end > start, "docs/methods.md has no method catalogue section");
        Assert.Equal(MethodCatalogPage.Text(), page[start..(end + MethodCatalogPage.End.Length)]);
    }

    [Fact]
    public void Every_enum_of_the_composed_table_schema_is_a_catalogue_option()
    {
        var schema = TableSchemaComposition.Compose();
        var catalogue = MethodCatalog.All.Select(s => string.Join("|", s.Names)).ToHashSet(StringComparer.Ordinal);
        var enums = new List<(string Path, string Names)>();
        Walk(schema, "", (path, node) =>
        {
            Assert.False(node.ContainsKey("choices") || node.ContainsKey("range"), $"a catalogue marker is left at {path}");
            if (node["enum"] is JsonArray values && path != "/properties/kind")
            {
                enums.Add((path, string.Join("|", values.Select(v => v!.GetValue<string>()))));
            }
        });
        Assert.NotEmpty(enums);
        Assert.All(enums, e => Assert.True(catalogue.Contains(e.Names), $"{e.Path}: {e.Names} is not an option of the catalogue"));
        var used = enums.Select(e => e.Names).ToHashSet(StringComparer.Ordinal);
        Assert.All(MethodCatalog.All.Except(MethodCatalog.CalcOnly), set => Assert.True(used.Contains(string.Join("|", set.Names)), $"{set.Key} is used nowhere in the schema"));
        Assert.All(MethodCatalog.CalcOnly, set => Assert.False(used.Contains(string.Join("|", set.Names)), $"{set.Key} is in the schema: take it off the calc-only list"));
    }

    [Fact]
    public void The_level_range_of_the_schema_is_the_catalogues()
    {
        var level = TableSchemaComposition.Compose()["properties"]!["statistics"]!["properties"]!["level"]!;
        Assert.Equal(MethodCatalog.ConfidenceLevel.Minimum, level["exclusiveMinimum"]!.GetValue<double>());
        Assert.Equal(MethodCatalog.ConfidenceLevel.Maximum, level["exclusiveMaximum"]!.GetValue<double>());
        Assert.Equal(MethodCatalog.ConfidenceLevel.Default, level["default"]!.GetValue<double>());
        Assert.Equal(MethodCatalog.ConfidenceLevel.Default, new StatisticsSpec().Level);
    }

    /// <summary>
    /// Every typed option of the spec models (shared keys and each kind's settings) reads the catalogue's names, and its
    /// default in the code is the schema's default: walks the models by reflection beside the composed schema.
    /// </summary>
    [Fact]
    public void Typed_options_have_the_schema_names_and_defaults()
    {
        var schema = TableSchemaComposition.Compose();
        var properties = schema["properties"]!.AsObject();
        var checkedOptions = new List<string>();
        Compare(typeof(EndpointSpec), properties["endpoint"]!.AsObject(), schema, "endpoint", checkedOptions);
        Compare(typeof(StatisticsSpec), properties["statistics"]!.AsObject(), schema, "statistics", checkedOptions);
        foreach (var kind in TableKinds.All)
        {
            Compare(kind.SettingsType, properties[kind.SettingsKey]!.AsObject(), schema, kind.SettingsKey, checkedOptions);
        }
        // Every option family of a kind or of the shared keys was met at least once.
        Assert.True(checkedOptions.Count >= 20, string.Join(", ", checkedOptions));
    }

    [Fact]
    public void Calc_accepts_every_catalogue_name_and_only_those()
    {
        foreach (var name in MethodCatalog.ProportionInterval.Names)
        {
            Assert.Equal(0, Calc("proportion", "--events", "3", "--n", "10", "--method", name));
        }
        foreach (var name in MethodCatalog.DifferenceInterval.Names)
        {
            Assert.Equal(0, Calc("difference", "--events1", "3", "--n1", "10", "--events2", "5", "--n2", "10", "--method", name));
        }
        foreach (var name in MethodCatalog.TableTest.Names)
        {
            Assert.Equal(0, Calc("table", "--counts", "3,7;5,5", "--test", name));
        }
        foreach (var name in MethodCatalog.Multiplicity.Names)
        {
            string[] graph = name switch
            {
                "graphical" => ["--weights", "0.5,0.5", "--transitions", "0,1;1,0"],
                "fallback" or "weighted-bonferroni" => ["--weights", "0.5,0.5"],
                _ => [],
            };
            Assert.Equal(0, Calc(["multiplicity", "--p", "0.01,0.04", "--method", name, .. graph]));
        }
        Assert.Equal(ExitCodes.Usage, Calc("multiplicity", "--p", "0.01,0.04", "--method", "bonf"));
        // A name calc does not know is a command-line value it cannot use: a usage error (README, exit codes).
        Assert.Equal(ExitCodes.Usage, Calc("table", "--counts", "3,7;5,5", "--test", "pearson"));
    }

    [Fact]
    public void A_retired_option_name_in_a_spec_gets_a_located_error_naming_the_new_one()
    {
        const string table = """
            {
              "id": "1", "title": ["Impression"], "population": "itt", "kind": "categorical-by-visit",
              "endpoint": { "dataset": "adeff", "parameter": "RESP" },
              "categoricalByVisit": { "categories": [{ "value": 1 }, { "value": 2 }], "scores": "table" }
            }
            """;
        var problem = Assert.Single(Problems(table));
        Assert.Equal("$.categoricalByVisit.scores", problem.JsonPath);
        Assert.Equal(4, problem.Line);
        Assert.Equal(SpecProblemCode.RetiredName, problem.Code);
        Assert.Equal("category-values", problem.Suggestion);
        Assert.StartsWith("'table' is now called 'category-values'; expected one of", problem.Message, StringComparison.Ordinal);
        Assert.Equal("write 'category-values' instead", OutputForge.Workflow.Check.CheckHints.ForSpec(problem));
    }

    [Fact]
    public void The_retired_decimals_key_geomean_gets_an_error_naming_geometric_mean()
    {
        const string table = """
            {
              "id": "1", "title": ["Demographics"], "population": "itt", "kind": "demographics",
              "demographics": { "variables": [{ "variable": "AGE", "type": "continuous" }], "decimals": { "geomean": 1 } }
            }
            """;
        var problems = Problems(table);
        var problem = Assert.Single(problems, p => p.JsonPath == "$.demographics.decimals.geomean");
        Assert.Equal(SpecProblemCode.UnknownKey, problem.Code);
        Assert.Equal("geometricMean", problem.Suggestion);
        Assert.Equal("unknown key 'geomean' (now called 'geometricMean')", problem.Message);
    }

    [Fact]
    public void A_wrong_option_name_carries_the_accepted_names_as_data()
    {
        const string table = """
            {
              "id": "1", "title": ["Responders"], "population": "itt", "kind": "responders",
              "endpoint": { "dataset": "adeff", "parameter": "RESP", "response": "AVALC = 'Y'" },
              "statistics": { "proportionInterval": "wilsom" }
            }
            """;
        var problem = Assert.Single(Problems(table));
        Assert.Equal(SpecProblemCode.NotAChoice, problem.Code);
        Assert.Equal(MethodCatalog.ProportionInterval.Names, problem.Expected);
        Assert.Equal("wilson", problem.Suggestion);
        Assert.StartsWith("expected one of \"wald\", \"wilson\"", problem.Message, StringComparison.Ordinal);
    }

    private static IReadOnlyList<SpecProblem> Problems(string table)
    {
        using var study = new MiniStudy(table: table);
        var problems = new List<SpecProblem>();
        SpecLoader.LoadCollecting(study.Folder, problems);
        return problems.Where(p => !p.IsWarning).ToList();
    }

    private static int Calc(params string[] args) => Program.Run(["calc", .. args], new StringWriter(), new StringWriter());

    private static void Walk(JsonNode? node, string path, Action<string, JsonObject> visit)
    {
        switch (node)
        {
            case JsonObject obj:
                visit(path, obj);
                foreach (var (key, child) in obj)
                {
                    Walk(child, path + "/" + key, visit);
                }
                break;
            case JsonArray array:
                for (var i = 0; i < array.Count; i++)
                {
                    Walk(array[i], path + "/" + i, visit);
                }
                break;
        }
    }

    private static void Compare(Type model, JsonObject schemaObject, JsonObject root, string path, List<string> checkedOptions)
    {
        schemaObject = Resolve(schemaObject, root);
        var schemaProperties = schemaObject["properties"]!.AsObject();
        var instance = Activator.CreateInstance(model)!;
        foreach (var property in model.GetProperties(BindingFlags.Public | BindingFlags.Instance).Where(p => p.CanWrite || p.SetMethod is not null))
        {
            var key = JsonNamingPolicy.CamelCase.ConvertName(property.Name);
            if (schemaProperties[key] is not JsonObject propertySchema)
            {
                continue;
            }
            propertySchema = Resolve(propertySchema, root);
            var type = Nullable.GetUnderlyingType(property.PropertyType) ?? property.PropertyType;
            var itemType = type != typeof(string) && type.IsGenericType && typeof(IEnumerable).IsAssignableFrom(type) ? type.GetGenericArguments()[0] : null;
            if (MethodCatalog.ForType(itemType ?? type) is { } set)
            {
                var names = (itemType is null ? propertySchema : Resolve(propertySchema["items"]!.AsObject(), root))["enum"]!.AsArray().Select(v => v!.GetValue<string>()).ToList();
                Assert.True(names.All(set.Names.Contains), $"{path}.{key}: schema names {string.Join(", ", names)} are not all in {set.Key}");
                if (itemType is null && propertySchema["default"] is JsonValue schemaDefault && property.GetValue(instance) is { } codeDefault)
                {
                    var codeName = JsonSerializer.Serialize(codeDefault, SpecFileReader.ModelOptions).Trim('"');
                    Assert.True(schemaDefault.GetValue<string>() == codeName, $"{path}.{key}: schema default {schemaDefault} but code default {codeName}");
                }
                checkedOptions.Add($"{path}.{key}");
            }
            else if (propertySchema["properties"] is JsonObject && type.IsClass && type != typeof(string))
            {
                Compare(type, propertySchema, root, $"{path}.{key}", checkedOptions);
            }
            else if (itemType is not null && itemType.IsClass && itemType != typeof(string) && propertySchema["items"] is JsonObject items && Resolve(items, root)["properties"] is JsonObject)
            {
                Compare(itemType, items, root, $"{path}.{key}[]", checkedOptions);
            }
        }
    }

    private static JsonObject Resolve(JsonObject node, JsonObject root) =>
        node["$ref"] is JsonValue reference
            ? reference.GetValue<string>().TrimStart('#').Split('/', StringSplitOptions.RemoveEmptyEntries).Aggregate((JsonNode)root, (n, s) => n[s]!).AsObject()
            : node;

}
