using System.Globalization;
using System.Text;
using OutputForge.Kinds.Subgroups;
using OutputForge.Data;
using OutputForge.Results;
using OutputForge.Spec;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.Subgroups;

/// <summary>
/// A small invented study for the subgroup kind: subjects given as (arm, sex, region, responder)
/// cells, written as ADSL and ADEFF into a <see cref="MiniStudy"/>, analysed in-process.
/// </summary>
internal static class SubgroupStudy
{
    public const string Study = """
        {
          "study": { "id": "T1", "title": "Test study" },
          "data": { "folder": "data", "datasets": { "adsl": "adsl.csv", "adeff": "adeff.csv" } },
          "treatment": { "variable": "TRT01P", "order": "TRT01PN", "control": "Placebo" },
          "populations": { "itt": { "label": "ITT Population", "where": "ITTFL = 'Y'" } },
          "tables": ["t1.json"]
        }
        """;

    public static string Table(string subgroups) => $$"""
        {
          "id": "9.1",
          "title": ["Responders by subgroup"],
          "population": "itt",
          "kind": "subgroups",
          "endpoint": { "dataset": "adeff", "parameter": "RESP", "visit": "Week 4", "response": "AVALC = 'Y'", "label": "Response at Week 4" },
          "subgroups": {{subgroups}}
        }
        """;

    /// <summary>One cell of subjects: arm, SEX, REGION1, how many respond and how many do not.</summary>
    public sealed record Cell(string Arm, string Sex, string Region, int Responders, int NonResponders);

    public static (string Adsl, string Adeff) Data(IEnumerable<Cell> cells)
    {
        var adsl = new StringBuilder("STUDYID,USUBJID,TRT01P,TRT01PN,ITTFL,SEX,REGION1\n");
        var adeff = new StringBuilder("STUDYID,USUBJID,PARAMCD,AVISIT,AVALC\n");
        var number = 0;
        foreach (var cell in cells)
        {
            for (var i = 0; i < cell.Responders + cell.NonResponders; i++)
            {
                var id = $"T1-{++number:0000}";
                var order = cell.Arm switch { "Placebo" => 0, "Low" => 1, _ => 2 };
                adsl.Append(CultureInfo.InvariantCulture, $"T1,{id},{cell.Arm},{order},Y,{cell.Sex},{cell.Region}\n");
                adeff.Append(CultureInfo.InvariantCulture, $"T1,{id},RESP,Week 4,{(i < cell.Responders ? "Y" : "N")}\n");
            }
        }
        return (adsl.ToString(), adeff.ToString());
    }

    public static TableResult Analyze(string subgroups, IEnumerable<Cell> cells)
    {
        var (adsl, adeff) = Data(cells);
        using var study = new MiniStudy(Study, Table(subgroups), adsl, adeff);
        var package = SpecLoader.Load(study.StudyFile);
        var data = StudyData.Load(package.Study, study.DataFolder);
        return new SubgroupAnalysis().Analyze(package.Study, package.Tables[0], data);
    }

    public static StatisticValue Value(TableResult result, string row, string column, string statistic) =>
        result.Rows.Single(r => r.Key == row).Cells.Single(c => c.Column == column).Values.Single(v => v.Statistic == statistic);
}
