using System.Text.Json.Nodes;
using OutputForge.Kinds;
using OutputForge.Spec;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.Kinds;

/// <summary>The registry of table kinds against the kinds' folders, the composed table schema and the shipped one.</summary>
public sealed class TableKindRegistryTests
{
    public static TheoryData<string> KindNames() => [.. TableKinds.Names];

    [Theory]
    [MemberData(nameof(KindNames))]
    public void A_registered_kind_has_settings_a_schema_fragment_an_analysis_and_a_stand_in_in_its_folder(string name)
    {
        var kind = TableKinds.Find(name)!;
        Assert.NotNull(kind.SettingsType);
        Assert.NotNull(kind.Analysis);
        Assert.NotNull(kind.StandIn);
        Assert.True(TableSchemaComposition.HasFragment(kind), $"{kind.SchemaFragment} is not embedded with settings, whenKind and rules");
        // One folder per kind: its settings, analysis and stand-in share the kind's namespace under Kinds.
        var folder = kind.SettingsType.Namespace!;
        Assert.StartsWith("OutputForge.Kinds.", folder);
        Assert.Equal(folder, kind.Analysis.GetType().Namespace);
        Assert.Equal(folder, kind.StandIn.GetType().Namespace);
        // The fragment sits in that folder, named for the kind (src/OutputForge/Kinds/<Kind>/<name>.schema.json).
        var path = Path.Combine(RepositoryRoot.Path, "src", "OutputForge", "Kinds", folder["OutputForge.Kinds.".Length..], name + ".schema.json");
        Assert.True(File.Exists(path), path);
    }

    [Fact]
    public void Names_settings_keys_and_settings_types_are_each_used_once()
    {
        Assert.Equal(TableKinds.All.Count, TableKinds.All.Select(k => k.Name).Distinct().Count());
        Assert.Equal(TableKinds.All.Count, TableKinds.All.Select(k => k.SettingsKey).Distinct().Count());
        Assert.Equal(TableKinds.All.Count, TableKinds.All.Select(k => k.SettingsType).Distinct().Count());
    }

    [Fact]
    public void The_schema_kind_enum_is_the_registry_and_each_kind_has_its_settings_and_rule()
    {
        var schema = JsonNode.Parse(SpecSchemas.Text(SpecSchemas.Table))!;
        Assert.Equal(TableKinds.Names, schema["properties"]!["kind"]!["enum"]!.AsArray().Select(v => v!.GetValue<string>()));
        foreach (var kind in TableKinds.All)
        {
            Assert.Equal("object", schema["properties"]![kind.SettingsKey]?["type"]?.GetValue<string>());
        }
        var ruled = schema["allOf"]!.AsArray().Select(r => r?["if"]?["properties"]?["kind"]?["const"]?.GetValue<string>()).OfType<string>().ToList();
        Assert.Equal(ruled.Distinct(), ruled);
        Assert.All(ruled, name => Assert.Contains(name, TableKinds.Names));
    }

    [Fact]
    public void The_shipped_table_schema_is_the_composed_one()
    {
        // specs/schema/table.schema.json is for editors and readers; `outputforge demo` writes the composed schema,
        // so a changed fragment is shipped by copying the demo's specs/schema/table.schema.json over it.
        var shipped = File.ReadAllText(Path.Combine(RepositoryRoot.Path, "specs", "schema", "table.schema.json"));
        Assert.Equal(SpecSchemas.Text(SpecSchemas.Table), shipped.ReplaceLineEndings("\n"));
    }

    [Fact]
    public void Each_demo_table_carries_the_settings_of_its_own_kind()
    {
        var package = SpecLoader.Load(Path.Combine(RepositoryRoot.Path, "specs", "demo"));
        foreach (var table in package.Tables)
        {
            var kind = TableKinds.For(table);
            if (table.KindKeys?[kind.SettingsKey] is not null)
            {
                Assert.IsType(kind.SettingsType, table.KindSettings);
            }
            else
            {
                Assert.Null(table.KindSettings);
            }
        }
        Assert.Contains(package.Tables, t => t.KindSettings is not null);
    }

    [Fact]
    public void Optional_settings_default_and_required_settings_missing_are_a_located_error()
    {
        var source = new SpecSource("table.json", JsonPositionMap.Build("{\"kind\": \"continuous\"}"u8.ToArray()));
        TableSpec Table(string kind) => new() { Id = "1", Title = ["T"], Population = "itt", Kind = kind, Source = source };

        Assert.NotNull(Table("time-to-event").Settings<OutputForge.Kinds.TimeToEvent.TimeToEventSettings>());
        Assert.NotNull(Table("responders").Settings<OutputForge.Kinds.Responders.ResponderSettings>());
        var error = Assert.Throws<SpecException>(() => Table("continuous").Settings<OutputForge.Kinds.Continuous.ContinuousSettings>());
        Assert.Equal("the continuous kind needs a \"continuous\" settings object", error.Problems.Single().Message);
        Assert.Equal(JsonPositionMap.ToJsonPath("/kind"), error.Problems.Single().JsonPath);
        Assert.Equal(1, error.Problems.Single().Line);
    }
}
