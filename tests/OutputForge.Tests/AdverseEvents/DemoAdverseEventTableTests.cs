using System.Globalization;
using OutputForge.Tests.EndToEnd;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.AdverseEvents;

/// <summary>
/// The demo package's adverse-event table 14.3.1.1 in Word, against counts recomputed here from
/// adsl.csv and adae.csv with the test's own CSV reader: subjects (once each) and events per arm.
/// </summary>
public sealed class DemoAdverseEventTableTests(DemoRunFixture demo) : IClassFixture<DemoRunFixture>
{
    private static readonly string[] Arms = ["Placebo", "QF-217 10 mg", "QF-217 30 mg"];

    [Fact]
    public void Word_shows_recomputed_subject_and_event_counts_per_term()
    {
        Assert.True(demo.ExitCode == 0, demo.Log);
        var adsl = SimpleCsv.Read(demo.Data("adsl.csv")).Where(r => r["SAFFL"] == "Y").ToList();
        var armOf = adsl.ToDictionary(r => r["USUBJID"], r => r["TRT01A"]);
        var n = Arms.ToDictionary(a => a, a => adsl.Count(r => r["TRT01A"] == a));
        var events = SimpleCsv.Read(demo.Data("adae.csv")).Where(r => r["TRTEMFL"] == "Y" && armOf.ContainsKey(r["USUBJID"])).ToList();
        var rows = DocumentReader.WordTableRows(demo.Output("table-14.3.1.1.docx"));
        // Row 0 is the spanning "QF-217" header of the study's arm groups, row 1 the arm labels.
        Assert.Equal(Arms.Select(a => $"(N={n[a]})"), rows[2].Skip(1).Take(3));

        string Expected(IEnumerable<Dictionary<string, string>> selected, string arm)
        {
            var inArm = selected.Where(e => armOf[e["USUBJID"]] == arm).ToList();
            var subjects = inArm.Select(e => e["USUBJID"]).Distinct().Count();
            if (subjects == 0)
            {
                return "0";
            }
            var percent = decimal.Round(100m * subjects / n[arm], 1, MidpointRounding.AwayFromZero);
            return string.Create(CultureInfo.InvariantCulture, $"{subjects} ({percent:0.0}) [{inArm.Count}]");
        }

        var any = rows.Single(r => r[0] == "Subjects with at least one TEAE");
        Assert.Equal(Arms.Select(a => Expected(events, a)), any.Skip(1).Take(3));
        var checkedTerms = 0;
        foreach (var term in events.Select(e => e["AEDECOD"]).Distinct())
        {
            var row = rows.Single(r => r[0] == term);
            Assert.Equal(Arms.Select(a => Expected(events.Where(e => e["AEDECOD"] == term), a)), row.Skip(1).Take(3));
            checkedTerms++;
        }
        Assert.True(checkedTerms > 10, $"only {checkedTerms} terms checked");
    }
}
