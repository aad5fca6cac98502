using System.Collections.Concurrent;
using OutputForge.Analysis;
using OutputForge.Data;
using OutputForge.Kinds;
using OutputForge.Spec;
using OutputForge.Tests.Support;
using OutputForge.Tests.Validation;
using OutputForge.Workflow.Shells;

namespace OutputForge.Tests.Kinds;

/// <summary>
/// What each kind's analysis declares it reads (ITableAnalysis.Reads) against what it looks up, with every lookup of
/// the data recorded, on every demo table; and against what the kind's shell stand-in provides.
/// </summary>
public sealed class TableKindReadsTests(DemoStudyData demo) : IClassFixture<DemoStudyData>
{
    public static TheoryData<string> DemoTableIds() => [.. DemoStudyTables.Read().TableIds];

    [Theory]
    [MemberData(nameof(DemoTableIds))]
    public void The_analysis_looks_up_only_variables_its_kind_declares(string id)
    {
        var table = demo.Package.Tables.Single(t => t.Id == id);
        Assert.Equal(string.Empty, string.Join(", ", Undeclared(demo.Package.Study, table, demo.Data)));
    }

    [Theory]
    [MemberData(nameof(DemoTableIds))]
    public void On_the_shell_stand_in_the_analysis_looks_up_only_declared_variables(string id)
    {
        var table = demo.Package.Tables.Single(t => t.Id == id);
        Assert.Equal(string.Empty, string.Join(", ", Undeclared(demo.Package.Study, table, ShellData.For(demo.Package.Study, table).ToStudyData())));
    }

    [Theory]
    [MemberData(nameof(DemoTableIds))]
    public void The_shell_stand_in_provides_every_declared_variable(string id)
    {
        var table = demo.Package.Tables.Single(t => t.Id == id);
        var declared = TableKinds.For(table).Analysis.Reads(demo.Package.Study, table);
        var standIn = ShellData.For(demo.Package.Study, table).ToStudyData();
        Assert.Equal(string.Empty, string.Join(", ", Missing(declared, standIn)));
    }

    [CdiscPilotDataFact]
    public void On_the_CDISC_pilot_validation_tables_the_analyses_look_up_only_declared_variables()
    {
        foreach (var studyFile in new[] { "study.json", "cibic-study.json" })
        {
            var package = SpecLoader.Load(Path.Combine(CdiscPilotFiles.Specs, studyFile));
            var data = StudyData.Load(package.Study, CdiscPilotFiles.DataFolder!);
            Assert.All(package.Tables, table => Assert.Equal($"{table.Id}: ", $"{table.Id}: " + string.Join(", ", Undeclared(package.Study, table, data))));
        }
    }

    [Fact]
    public void A_variable_the_declaration_lacks_or_the_stand_in_lacks_is_reported()
    {
        var study = demo.Package.Study;
        var table = demo.Package.Tables.First(t => t.Kind == "continuous");
        var declared = TableKinds.For(table).Analysis.Reads(study, table);
        var value = table.Settings<OutputForge.Kinds.Continuous.ContinuousSettings>().Value;

        var undeclared = Undeclared(study, table, demo.Data, new VariableReads().Add(table.Endpoint!.Dataset, value));
        Assert.Contains($"adsl.{AdamConformance.SubjectVariable}", undeclared);
        Assert.DoesNotContain($"{table.Endpoint.Dataset}.{value}", undeclared);

        var standIn = ShellData.For(study, table).ToStudyData();
        Assert.Equal(["adsl.NOT_IN_THE_STAND_IN"], Missing(declared.Add("adsl", "NOT_IN_THE_STAND_IN"), standIn));
    }

    private static List<string> Undeclared(StudySpec study, TableSpec table, StudyData data) =>
        Undeclared(study, table, data, TableKinds.For(table).Analysis.Reads(study, table));

    private static List<string> Undeclared(StudySpec study, TableSpec table, StudyData data, VariableReads declared) =>
        Lookups(study, table, data)
            .Where(l => !declared.Contains(l.Dataset, l.Variable))
            .Select(l => $"{l.Dataset}.{l.Variable}")
            .Distinct()
            .Order(StringComparer.Ordinal)
            .ToList();

    private static List<string> Missing(VariableReads declared, StudyData standIn)
    {
        bool Has(string dataset, string variable) => standIn.Datasets.Any(d => d.Name == dataset && d.Find(variable) is not null);
        return declared.ByDataset
            .SelectMany(d => d.Value.Where(v => !declared.IsProvided(d.Key, v, Has)).Select(v => $"{d.Key}.{v}"))
            .ToList();
    }

    private static List<(string Dataset, string Variable)> Lookups(StudySpec study, TableSpec table, StudyData data)
    {
        var lookups = new ConcurrentQueue<(string, string)>();
        var recorded = StudyData.FromDatasets(data.Folder, data.Datasets.Select(d => d.WithLookupsTold((name, variable) => lookups.Enqueue((name, variable)))));
        lookups.Clear();
        TableKinds.For(table).Analysis.Analyze(study, table, recorded);
        return [.. lookups];
    }
}
