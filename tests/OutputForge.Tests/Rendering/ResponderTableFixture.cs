using System.Globalization;
using OutputForge.Layout;

namespace OutputForge.Tests.Rendering;

/// <summary>
/// Display-ready tables for the renderer tests, for the invented study QF217-301. The texts are
/// renderer input: the renderers must reproduce them verbatim. The interval texts were worked out
/// once (Wilson score interval and Newcombe's hybrid score interval, z = 1.959964) so that the
/// sample reads like a real table; they are not checked here, the statistics tests do that.
/// </summary>
public static class ResponderTableFixture
{
    public static readonly IReadOnlyList<LayoutColumn> Columns =
    [
        new("label", CellAlignment.Left),
        new("placebo", CellAlignment.Center),
        new("qf217-10", CellAlignment.Center),
        new("qf217-30", CellAlignment.Center),
    ];

    public static readonly IReadOnlyList<HeaderRow> HeaderRows =
    [
        new([new HeaderCell(""), new HeaderCell(""), new HeaderCell("QF-217", Span: 2)]),
        new([new HeaderCell(""), new HeaderCell("Placebo\n(N=150)"), new HeaderCell("10 mg\n(N=151)"), new HeaderCell("30 mg\n(N=149)")]),
    ];

    public static TableDocument Responders(PageSettings? page = null) => new(
        TableId: "14.2.1",
        Titles: ["Proportion of Responders at Week 12", "Primary Efficacy Analysis"],
        Population: "Intent-to-Treat Population",
        StudyLine: "Study QF217-301",
        Columns: Columns,
        HeaderRows: HeaderRows,
        Rows: ResponderRows(),
        Footnotes:
        [
            "[a] Responders are subjects with at least a 50% reduction from baseline in the weekly symptom score at Week 12; subjects without a Week 12 assessment are counted as non-responders.",
            "[b] Wilson score interval.",
            "[c] Newcombe hybrid score interval for the difference QF-217 minus placebo.",
            "[d] Chi-square test of QF-217 versus placebo.",
            "[e] Breslow-Day test of homogeneity of the odds ratios across regions.",
        ],
        SourceLine: "Source: specs/demo/t-14-2-1.json; data: adsl.csv, adrs.csv; run 2026-12-01 21:00 UTC; OutputForge 0.1.0",
        Page: page ?? PageSettings.Default);

    private static BodyRow[] ResponderRows() =>
    [
        Section("Response at Week 12 [a]"),
        Data("Responders, n (%)", Text("38 (25.3)"), Text("72 (47.7)"), Text("81 (54.4)")),
        Data("Non-responders, n (%)", Text("112 (74.7)"), Text("79 (52.3)"), Text("68 (45.6)")),
        Data("95% CI for the proportion [b]", Text("(19.0, 32.8)"), Text("(39.9, 55.6)"), Text("(46.4, 62.2)")),
        BodyRow.Blank(3),
        Section("Comparison with placebo"),
        Data("Difference in proportions (%)", LayoutCell.Empty, Number("22.3", 22.349, "0.0"), Number("29.0", 29.029, "0.0")),
        Data("95% CI for the difference [c]", LayoutCell.Empty, Text("(11.5, 32.5)"), Text("(18.0, 39.0)")),
        Data("p-value [d]", LayoutCell.Empty, Text("<0.001"), Text("<0.001")),
        Data("p-value for homogeneity across regions [e]", LayoutCell.Empty, Number("0.412", 0.41207, "0.000"), Number("0.687", 0.68731, "0.000")),
        BodyRow.Blank(3),
        Section("Change from baseline in weekly symptom score at Week 12"),
        Data("n", Number("150", 150, "0"), Number("151", 151, "0"), Number("149", 149, "0")),
        Data("Mean (SD)", Text("-1.2 (3.41)"), Text("-3.8 (3.55)"), Text("-4.4 (3.62)")),
        Data("Median", Number("-1.0", -1.0, "0.0"), Number("-3.5", -3.5, "0.0"), Number("-4.5", -4.5, "0.0")),
        Data("Min, Max", Text("-9.0, 6.0"), Text("-12.5, 4.0"), Text("-13.0, 3.5")),
    ];

    /// <summary>
    /// A 200-row table (20 body systems of 1 + 9 rows) with the responder columns, for pagination.
    /// The counts follow a fixed pattern; percentages are of the arm's N.
    /// </summary>
    public static TableDocument LongTable(PageSettings? page = null)
    {
        int[] n = [150, 151, 149];
        var rows = new List<BodyRow>();
        for (int system = 1; system <= 20; system++)
        {
            rows.Add(new BodyRow($"Body system {system:00}", 0,
                n.Select((arm, a) => Text(Count(system * 3 + a, arm))).ToArray(), RowKind.Section));
            for (int term = 1; term <= 9; term++)
            {
                rows.Add(Data($"Adverse event term {system:00}.{term}",
                    n.Select((arm, a) => Text(Count((system + term * (a + 2)) % 17, arm))).ToArray()));
            }
        }
        return Responders(page) with
        {
            TableId = "14.3.1.1",
            Titles = ["Treatment-Emergent Adverse Events by Body System and Term"],
            Population = "Safety Population",
            Rows = rows,
            Footnotes = ["Subjects are counted once per body system and once per term."],
            SourceLine = "Source: specs/demo/t-14-3-1-1.json; data: adsl.csv, adae.csv; run 2026-12-01 21:00 UTC; OutputForge 0.1.0",
        };
    }

    /// <summary>The responder table with texts a spreadsheet would read as formulas or numbers.</summary>
    public static TableDocument WithFormulaLikeTexts() => Responders() with
    {
        Rows =
        [
            Data("=1+1", Text("=1+1"), Text("+2"), Text("@SUM(A1)")),
            Data("-1.5", Text("-1.5"), Text("0.003"), Text("1E5")),
        ],
    };

    private static string Count(int count, int armN) =>
        string.Create(CultureInfo.InvariantCulture, $"{count} ({Math.Round(100.0 * count / armN, 1, MidpointRounding.AwayFromZero):0.0})");

    private static BodyRow Section(string label) => new(label, 0, [LayoutCell.Empty, LayoutCell.Empty, LayoutCell.Empty], RowKind.Section);

    private static BodyRow Data(string label, params LayoutCell[] cells) => new(label, 1, cells);

    private static LayoutCell Text(string text) => new(text);

    private static LayoutCell Number(string text, double value, string format) => new(text, value, format);
}
