namespace OutputForge.Stats.Tests;

/// <summary>
/// The mixed model for repeated measures on public data: the CDISC pilot study's ADAS-Cog (11) total,
/// change from baseline at Weeks 8, 16 and 24 (EFFFL = 'Y', ANL01FL = 'Y', observed records only) with
/// arm, visit, pooled site, baseline, arm by visit and baseline by visit, read from ../shared and
/// compared with the values Oracles/generate_mmrm_oracles.R computed from the same records (R 4.2.2,
/// nlme 3.1-162 polished with numDeriv, emmeans 1.8.4-1 weights, pbkrtest 0.5.2).
/// </summary>
public sealed class MmrmPilotTests
{
    private static readonly Dictionary<string, MmrmFit> Fits = [];

    private static MmrmFit FitPilot(string code)
    {
        lock (Fits)
        {
            if (!Fits.TryGetValue(code, out var fit))
            {
                fit = Mmrm.Fit(MmrmOracles.PilotData(), new MmrmModel(MmrmOracles.Terms, MmrmOracles.StructureOf(code)));
                Fits[code] = fit;
            }
            return fit;
        }
    }

    [SharedFileFact(MmrmOracles.PilotFile)]
    public void The_analysis_set_has_the_records_and_subjects_of_the_reference()
    {
        var data = MmrmOracles.PilotData();
        Assert.Equal(MmrmOracles.Pilot.GetProperty("records").GetInt32(), data.RecordCount);
        Assert.Equal(539, data.RecordCount);
        Assert.Equal(MmrmOracles.Pilot.GetProperty("subjects").GetInt32(), data.Subject.Distinct().Count());
        Assert.Equal(234, data.Subject.Distinct().Count());
    }

    [SharedFileFact(MmrmOracles.PilotFile)]
    public void Unstructured_fit_ls_means_and_tests_match_r() => Check("UN");

    [SharedFileFact(MmrmOracles.PilotFile)]
    public void Compound_symmetry_fit_ls_means_and_tests_match_r() => Check("CS");

    [SharedFileFact(MmrmOracles.PilotFile)]
    public void Autoregressive_fit_ls_means_and_tests_match_r() => Check("AR1");

    private static void Check(string code)
    {
        var fit = FitPilot(code);
        var expected = MmrmOracles.Pilot.GetProperty(code);
        MmrmRTests.SameFit(expected, fit, "pilot " + code);
        MmrmRTests.CloseToNlmeOwnEstimate(expected, fit, "pilot " + code);
        foreach (var section in new[] { "lsmeansByVisit", "lsmeansOverall", "differencesByVisit", "differencesOverall" })
        {
            MmrmRTests.SameContrasts(expected.GetProperty(section), fit, l => PilotWeights(fit, l), $"pilot {code} {section}");
        }
        MmrmRTests.SameType3(expected.GetProperty("type3"), fit, "pilot " + code);
    }

    /// <summary>Labels "Placebo @ Week 8", "Xanomeline High Dose - Placebo @ Week 24", "Placebo".</summary>
    private static MathNet.Numerics.LinearAlgebra.Vector<double> PilotWeights(MmrmFit fit, string label) => MmrmRTests.Weights(fit, label);
}
