using System.Text.Json;
using OutputForge.Layout;
using OutputForge.Results;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.Layout;

/// <summary>
/// A record of results.json read alone says which subjects it counts (the spec's population and subset) and which
/// footnotes of the headings above it apply (docs/results.md). Tables invented here.
/// </summary>
public sealed class RecordPopulationAndHeadingTests
{
    private static readonly RunFacts Run = new(DateTimeOffset.UnixEpoch, "0", new Dictionary<string, string>());

    private static ResultRow Row(string key, int indent, ResultRowKind kind = ResultRowKind.Data) =>
        new(key, key, indent, kind == ResultRowKind.Data ? [new ResultCell("a", "{n}", [StatisticValue.Count("n", 1)])] : [], kind);

    [Fact]
    public void A_heading_footnote_reaches_the_records_of_the_rows_beneath_it_until_a_blank_row()
    {
        // A visit heading with footnote [a], a block at indent 1, a row at indent 2 with its own footnote [b]; after the
        // blank row a second visit without footnotes. A system organ class row (data, indent 0) with [c] over its terms.
        ResultRow[] rows =
        [
            Row("week-4", 0, ResultRowKind.Section) with { NoteRefs = ["visit"] },
            Row("block", 1),
            Row("value", 2) with { NoteRefs = ["own"] },
            Row("blank", 0, ResultRowKind.Blank),
            Row("week-8", 0, ResultRowKind.Section),
            Row("week-8-value", 1),
            Row("soc", 0) with { NoteRefs = ["coding"] },
            Row("term", 1),
        ];
        var table = new TableResult("1", ["T"], "Pop", [new ResultColumn("a", "A", 3)], rows, [], [], [], new TableProvenance("t.json", ["adsl"]))
        {
            Notes = [ResultNote.Footnote("visit", NoteKind.Text, ("text", "Visit window.")), ResultNote.Footnote("own", NoteKind.Text, ("text", "Own.")),
                ResultNote.Footnote("coding", NoteKind.Text, ("text", "Coding."))],
        };
        var records = TableLayoutBuilder.Build(table, "S", Run, PageSettings.Default).Records.Where(r => r.Row != "header").ToDictionary(r => r.Row);

        Assert.Equal(["[a]"], records["block"].HeadingFootnotes);
        Assert.Equal(["[a]"], records["value"].HeadingFootnotes);
        Assert.Equal(["[b]"], records["value"].Footnotes);
        Assert.Empty(records["week-8-value"].HeadingFootnotes);
        Assert.Empty(records["soc"].HeadingFootnotes);
        Assert.Equal(["[c]"], records["soc"].Footnotes);
        Assert.Equal(["[c]"], records["term"].HeadingFootnotes);
        Assert.Empty(records["term"].Footnotes);
    }

    [Fact]
    public void Every_record_of_a_run_names_the_population_and_subset_of_its_table()
    {
        using var study = new MiniStudy(table: MiniStudy.TableJson.Replace("\"population\": \"itt\",", "\"population\": \"itt\", \"subset\": \"AGE < 60\",", StringComparison.Ordinal));
        var error = new StringWriter();
        Assert.Equal(0, OutputForge.Cli.Program.Run(["run", "--spec", study.Folder, "--out", study.OutputFolder, "--quiet", "--format", "txt"], error));
        using var json = JsonDocument.Parse(File.ReadAllText(Path.Combine(study.OutputFolder, "results.json")));
        var records = json.RootElement.GetProperty("records").EnumerateArray().ToList();
        Assert.NotEmpty(records);
        Assert.All(records, r =>
        {
            var population = r.GetProperty("population");
            Assert.Equal("itt", population.GetProperty("name").GetString());
            Assert.Equal("ITTFL = 'Y'", population.GetProperty("where").GetString());
            Assert.Equal("AGE < 60", population.GetProperty("subset").GetString());
        });
    }
}
