namespace OutputForge.Tests.Support;

/// <summary>
/// A hand-countable study of eight invented subjects (four per arm) with a subject-level and an
/// adverse-event dataset, for the population, disposition, demographics and adverse-event kinds.
/// Each test writes the one table spec it needs.
/// </summary>
public sealed class SummaryStudy : IDisposable
{
    // S03 is randomized and in the ITT but was never dosed (SAFFL N); S04 is randomized only.
    public const string Adsl =
        "STUDYID,USUBJID,TRT01P,TRT01PN,TRT01A,TRT01AN,RANDFL,ITTFL,SAFFL,AGE,SEX,WEIGHTBL,EOSSTT,DCSREAS\n" +
        "T2,S01,Placebo,0,Placebo,0,Y,Y,Y,30,F,60.5,COMPLETED,\n" +
        "T2,S02,Placebo,0,Placebo,0,Y,Y,Y,41,M,70.0,DISCONTINUED,ADVERSE EVENT\n" +
        "T2,S03,Placebo,0,,,Y,Y,N,52,F,,COMPLETED,\n" +
        "T2,S04,Placebo,0,,,Y,N,N,63,M,80.3,DISCONTINUED,WITHDRAWAL BY SUBJECT\n" +
        "T2,S05,Active,1,Active,1,Y,Y,Y,35,F,55.0,COMPLETED,\n" +
        "T2,S06,Active,1,Active,1,Y,Y,Y,46,F,65.2,COMPLETED,\n" +
        "T2,S07,Active,1,Active,1,Y,Y,Y,57,M,75.1,DISCONTINUED,ADVERSE EVENT\n" +
        "T2,S08,Active,1,Active,1,Y,Y,Y,68,F,85.4,COMPLETED,\n";

    // S01 has nausea twice (mild, then severe); S03's event is outside the safety population;
    // S07's headache is not treatment-emergent.
    public const string Adae =
        "STUDYID,USUBJID,AEBODSYS,AEDECOD,AESEV,AESER,TRTEMFL\n" +
        "T2,S01,Gastrointestinal disorders,Nausea,MILD,N,Y\n" +
        "T2,S01,Gastrointestinal disorders,Nausea,SEVERE,N,Y\n" +
        "T2,S01,Gastrointestinal disorders,Abdominal pain,MILD,N,Y\n" +
        "T2,S02,Nervous system disorders,Headache,MODERATE,N,Y\n" +
        "T2,S03,Gastrointestinal disorders,Nausea,MILD,N,Y\n" +
        "T2,S05,Gastrointestinal disorders,Nausea,MODERATE,Y,Y\n" +
        "T2,S06,Gastrointestinal disorders,Nausea,MILD,N,Y\n" +
        "T2,S07,Nervous system disorders,Headache,MILD,N,\n" +
        "T2,S08,Nervous system disorders,Dizziness,SEVERE,N,Y\n";

    public const string StudyJson = """
        {
          "study": { "id": "T2", "title": "Summary test study" },
          "data": { "folder": "data", "datasets": { "adsl": "adsl.csv", "adae": "adae.csv" } },
          "treatment": { "variable": "TRT01P", "order": "TRT01PN", "control": "Placebo" },
          "populations": {
            "randomized": { "label": "All Randomized Subjects", "where": "RANDFL = 'Y'" },
            "itt": { "label": "ITT Population", "where": "ITTFL = 'Y'" },
            "safety": { "label": "Safety Population", "where": "SAFFL = 'Y'", "treatment": "TRT01A", "order": "TRT01AN" }
          },
          "tables": ["t.json"]
        }
        """;

    private readonly TempFolder _folder = new();

    public SummaryStudy(string table, string? adsl = null, string? adae = null)
    {
        _folder.Write("study.json", StudyJson);
        _folder.Write("t.json", table);
        _folder.Write("data/adsl.csv", adsl ?? Adsl);
        _folder.Write("data/adae.csv", adae ?? Adae);
    }

    public string Folder => _folder.Path;
    public string DataFolder => _folder.File("data");

    /// <summary>Loads the spec and data and runs the table's analysis.</summary>
    public OutputForge.Results.TableResult Analyze()
    {
        var package = OutputForge.Spec.SpecLoader.Load(Folder);
        var data = OutputForge.Data.StudyData.Load(package.Study, DataFolder);
        return OutputForge.Kinds.TableKinds.For(package.Tables[0]).Analysis.Analyze(package.Study, package.Tables[0], data);
    }

    /// <summary>The laid-out text of a cell, as every renderer shows it.</summary>
    public static string Displayed(OutputForge.Results.TableResult result, string row, string column)
    {
        var cell = result.Rows.Single(r => r.Key == row).Cells.Single(c => c.Column == column);
        return OutputForge.Layout.CellText.Compose(cell, result).Text;
    }

    public static double? Value(OutputForge.Results.TableResult result, string row, string column, string statistic) =>
        result.Rows.Single(r => r.Key == row).Cells.Single(c => c.Column == column).Values.Single(v => v.Statistic == statistic).Value;

    public void Dispose() => _folder.Dispose();
}
