namespace OutputForge.Tests.Support;

/// <summary>
/// A tiny study written into a temp folder (invented subjects), for spec and error tests:
/// a study spec, one responder table spec and two CSV datasets. Tests change one piece at a time.
/// </summary>
public sealed class MiniStudy : IDisposable
{
    public const string Adsl =
        "STUDYID,USUBJID,TRT01P,TRT01PN,ITTFL,AGE\n" +
        "T1,T1-001,Placebo,0,Y,40\n" +
        "T1,T1-002,Placebo,0,Y,51\n" +
        "T1,T1-003,Active,1,Y,38\n" +
        "T1,T1-004,Active,1,Y,66\n" +
        "T1,T1-005,Active,1,N,70\n";

    public const string Adeff =
        "STUDYID,USUBJID,PARAMCD,AVISIT,AVALC,ANL01FL\n" +
        "T1,T1-001,RESP,Week 4,N,Y\n" +
        "T1,T1-002,RESP,Week 4,Y,Y\n" +
        "T1,T1-003,RESP,Week 4,Y,Y\n" +
        "T1,T1-004,RESP,Week 4,Y,Y\n";

    public const string StudyJson = """
        {
          "study": { "id": "T1", "title": "Test study" },
          "data": { "folder": "data", "datasets": { "adsl": "adsl.csv", "adeff": "adeff.csv" } },
          "treatment": { "variable": "TRT01P", "order": "TRT01PN", "control": "Placebo" },
          "populations": { "itt": { "label": "ITT Population", "where": "ITTFL = 'Y'" } },
          "tables": ["t1.json"]
        }
        """;

    public const string TableJson = """
        {
          "id": "1",
          "title": ["Responders"],
          "population": "itt",
          "kind": "responders",
          "endpoint": {
            "dataset": "adeff",
            "parameter": "RESP",
            "visit": "Week 4",
            "where": "ANL01FL = 'Y'",
            "response": "AVALC = 'Y'"
          }
        }
        """;

    private readonly TempFolder _folder = new();

    public MiniStudy(string? study = null, string? table = null, string? adsl = null, string? adeff = null)
    {
        _folder.Write("study.json", study ?? StudyJson);
        _folder.Write("t1.json", table ?? TableJson);
        _folder.Write("data/adsl.csv", adsl ?? Adsl);
        _folder.Write("data/adeff.csv", adeff ?? Adeff);
    }

    public string Folder => _folder.Path;
    public string StudyFile => _folder.File("study.json");
    public string DataFolder => _folder.File("data");
    public string OutputFolder => _folder.File("out");

    public void Dispose() => _folder.Dispose();
}
