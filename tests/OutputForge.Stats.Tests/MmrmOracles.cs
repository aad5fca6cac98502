using System.Text.Json;

namespace OutputForge.Stats.Tests;

/// <summary>
/// Values produced by Oracles/generate_mmrm_oracles.R (R 4.2.2 with nlme 3.1-162, emmeans 1.8.4-1,
/// pbkrtest 0.5.2, lme4 1.1-31; versions recorded inside the JSON), the invented repeated-measures study
/// that script drew (Oracles/mmrm_data.csv), and the CDISC pilot ADAS-Cog records read from ../shared.
/// </summary>
internal static class MmrmOracles
{
    private static readonly Lazy<JsonDocument> Document = new(() => JsonDocument.Parse(File.ReadAllText(
        System.IO.Path.Combine(RepositoryRoot.Path, "tests", "OutputForge.Stats.Tests", "Oracles", "mmrm_oracles.json"))));

    public static JsonElement Study => Document.Value.RootElement.GetProperty("study");
    public static JsonElement Pilot => Document.Value.RootElement.GetProperty("pilot");
    public static JsonElement KenwardRogerCrossCheck => Document.Value.RootElement.GetProperty("krCrossCheck");

    public const string PilotFile = "data/cdiscpilot01/dataset-json/adqsadas.json";

    /// <summary>The model of the script: CHG ~ ARM + AVISIT + STRAT + BASE + ARM:AVISIT + AVISIT:BASE.</summary>
    public static readonly MmrmTerm[] Terms =
    [
        MmrmTerm.Factor("ARM"), MmrmTerm.Factor("AVISIT"), MmrmTerm.Factor("STRAT"), MmrmTerm.Numeric("BASE"),
        MmrmTerm.Interaction("ARM", "AVISIT"), MmrmTerm.Slope("BASE", "AVISIT"),
    ];

    public static readonly string[] StudyArms = ["PBO", "ACT"];
    public static readonly string[] StudyVisits = ["W04", "W08", "W12", "W16"];

    public static MmrmData StudyData()
    {
        var rows = EfficacyOracles.ReadCsv("mmrm_data.csv");
        return Build(rows.Select(r => (r["USUBJID"], r["ARM"], r["STRAT"], EfficacyOracles.Number(r["BASE"]), r["AVISIT"],
            EfficacyOracles.Number(r["CHG"]))).ToList(), StudyArms, StudyVisits, ["LOW", "HIGH"]);
    }

    public static readonly string[] PilotArms = ["Placebo", "Xanomeline Low Dose", "Xanomeline High Dose"];
    public static readonly string[] PilotVisits = ["Week 8", "Week 16", "Week 24"];

    /// <summary>
    /// ADAS-Cog (11) total (PARAMCD ACTOT), change from baseline at Weeks 8, 16, 24, EFFFL = 'Y',
    /// ANL01FL = 'Y', DTYPE empty (observed cases): the records of the generator script.
    /// </summary>
    public static MmrmData PilotData()
    {
        using var document = JsonDocument.Parse(File.ReadAllText(SharedFile.Find(PilotFile)!));
        var root = document.RootElement;
        var names = root.GetProperty("columns").EnumerateArray().Select(c => c.GetProperty("name").GetString()!).ToList();
        int Col(string n) => names.IndexOf(n);
        string Text(JsonElement row, string n) => row[Col(n)].ValueKind == JsonValueKind.String ? row[Col(n)].GetString()! : "";
        double? Num(JsonElement row, string n) => row[Col(n)].ValueKind == JsonValueKind.Number ? row[Col(n)].GetDouble() : null;
        var records = new List<(string, string, string, double, string, double)>();
        foreach (var row in root.GetProperty("rows").EnumerateArray())
        {
            if (Text(row, "PARAMCD") != "ACTOT" || !PilotVisits.Contains(Text(row, "AVISIT")) || Text(row, "EFFFL") != "Y"
                || Text(row, "ANL01FL") != "Y" || Text(row, "DTYPE") != "")
            {
                continue;
            }
            if (Num(row, "CHG") is not { } chg || Num(row, "BASE") is not { } bl)
            {
                continue;
            }
            records.Add((Text(row, "USUBJID"), Text(row, "TRTP"), Text(row, "SITEGR1"), bl, Text(row, "AVISIT"), chg));
        }
        var sites = records.Select(r => r.Item3).Distinct().OrderBy(s => s, StringComparer.Ordinal).ToArray();
        return Build(records, PilotArms, PilotVisits, sites);
    }

    private static MmrmData Build(List<(string Subject, string Arm, string Strat, double Base, string Visit, double Chg)> rows,
        string[] arms, string[] visits, string[] strata)
    {
        var visit = new LinearModelFactor("AVISIT", visits, rows.Select(r => Array.IndexOf(visits, r.Visit)).ToList());
        var arm = new LinearModelFactor("ARM", arms, rows.Select(r => Array.IndexOf(arms, r.Arm)).ToList());
        var strat = new LinearModelFactor("STRAT", strata, rows.Select(r => Array.IndexOf(strata, r.Strat)).ToList());
        return new MmrmData(rows.Select(r => r.Chg).ToList(), rows.Select(r => r.Subject).ToList(), visit, [arm, strat],
            [new LinearModelCovariate("BASE", rows.Select(r => r.Base).ToList())]);
    }

    public static MmrmCovarianceStructure StructureOf(string code) => code switch
    {
        "UN" => MmrmCovarianceStructure.Unstructured,
        "CS" => MmrmCovarianceStructure.CompoundSymmetry,
        "CSH" => MmrmCovarianceStructure.HeterogeneousCompoundSymmetry,
        "AR1" => MmrmCovarianceStructure.Autoregressive1,
        "ARH" => MmrmCovarianceStructure.HeterogeneousAutoregressive1,
        _ => MmrmCovarianceStructure.Toeplitz,
    };

    public static double[] Numbers(JsonElement array) => array.EnumerateArray().Select(e => e.GetDouble()).ToArray();

    /// <summary>The column of <paramref name="fit"/> that R names <paramref name="rName"/> ("ARMACT:AVISITW08" for "ARM[ACT]:AVISIT[W08]").</summary>
    public static int Column(MmrmFit fit, string rName)
    {
        var j = fit.Design.ColumnNames.Select(n => n.Replace("[", "").Replace("]", "")).ToList().IndexOf(rName);
        Assert.True(j >= 0, $"no column for {rName}");
        return j;
    }
}
