using OutputForge.Data;
using OutputForge.Results;
using OutputForge.Spec;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.Oracles;

/// <summary>
/// A study spec written into a temp folder that reads the CDISC pilot datasets in place from
/// ../shared/data/cdiscpilot01/csv (never copied), with one table spec, analysed in-process.
/// </summary>
internal static class PilotStudy
{
    public static TableResult Analyze(OutputForge.Analysis.ITableAnalysis analysis, string tableJson)
    {
        using var folder = new TempFolder();
        var data = RepositoryRoot.Shared(PilotDataFactAttribute.Folder)!.Replace('\\', '/');
        folder.Write("study.json", $$"""
            {
              "study": { "id": "CDISCPILOT01", "title": "CDISC pilot" },
              "data": { "folder": "{{data}}", "datasets": { "adsl": "adsl.csv", "adqscibc": "adqscibc.csv", "adtte": "adtte.csv" } },
              "treatment": { "variable": "TRT01P", "order": "TRT01PN", "control": "Placebo" },
              "populations": {
                "efficacy": { "label": "Efficacy Population", "where": "EFFFL = 'Y'" },
                "safety": { "label": "Safety Population", "where": "SAFFL = 'Y'", "treatment": "TRT01A", "order": "TRT01AN" }
              },
              "tables": ["t.json"]
            }
            """);
        folder.Write("t.json", tableJson);
        var package = SpecLoader.Load(folder.Path);
        var study = StudyData.Load(package.Study, data);
        return analysis.Analyze(package.Study, package.Tables[0], study);
    }
}
