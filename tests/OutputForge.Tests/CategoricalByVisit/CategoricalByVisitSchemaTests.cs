using OutputForge.Spec;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.CategoricalByVisit;

/// <summary>The table schema's rules for the categorical-by-visit kind, reported as located spec problems.</summary>
public sealed class CategoricalByVisitSchemaTests
{
    private const string Table = """
        {
          "id": "1", "title": ["Impression"], "population": "itt", "kind": "categorical-by-visit",
          "endpoint": { "dataset": "adeff", "parameter": "RESP" },
          "categoricalByVisit": { "categories": [{ "value": 1 }, { "value": 2 }], "test": "row-mean-scores" }
        }
        """;

    private static IReadOnlyList<SpecProblem> Problems(string table)
    {
        using var study = new MiniStudy(table: table);
        var problems = new List<SpecProblem>();
        SpecLoader.LoadCollecting(study.Folder, problems);
        return problems.Where(p => !p.IsWarning).ToList();
    }

    [Fact]
    public void A_valid_spec_loads() => Assert.Empty(Problems(Table));

    [Fact]
    public void The_kind_needs_its_settings_object()
    {
        var problems = Problems(Table.Replace("""
          "categoricalByVisit": { "categories": [{ "value": 1 }, { "value": 2 }], "test": "row-mean-scores" }
        """, "").Replace("\"RESP\" },", "\"RESP\" }"));
        Assert.Contains(problems, p => p.Message.Contains("categoricalByVisit", StringComparison.Ordinal));
    }

    [Fact]
    public void An_unknown_test_is_located_at_its_key()
    {
        var problem = Assert.Single(Problems(Table.Replace("row-mean-scores", "row-means")));
        Assert.Equal("$.categoricalByVisit.test", problem.JsonPath);
        Assert.Equal(4, problem.Line);
    }

    [Fact]
    public void A_single_category_is_refused()
    {
        var problem = Assert.Single(Problems(Table.Replace("""[{ "value": 1 }, { "value": 2 }]""", """[{ "value": 1 }]""")));
        Assert.Equal("$.categoricalByVisit.categories", problem.JsonPath);
    }
}
