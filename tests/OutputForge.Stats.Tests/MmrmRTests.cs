using System.Text.Json;
using MathNet.Numerics.LinearAlgebra;

namespace OutputForge.Stats.Tests;

/// <summary>
/// The mixed model for repeated measures on the invented study of Oracles/mmrm_data.csv (60 subjects, 4
/// visits, dropout at random and two intermittent gaps) against R 4.2.2 (script
/// Oracles/generate_mmrm_oracles.R, which says how each value was made): nlme 3.1-162 gls fits taken to
/// the optimum by Newton steps with numDeriv derivatives (coefficients, SE, log restricted likelihood,
/// Sigma), LS means with emmeans 1.8.4-1's coefficient vectors, Satterthwaite df from numDeriv's Hessian,
/// Type 3 Wald F with sum-to-zero contrasts, and pbkrtest 0.5.2's Kenward-Roger adjusted covariance and df.
/// </summary>
public sealed class MmrmRTests
{
    private const double Estimates = 1e-6;
    private const double DegreesOfFreedom = 1e-4;

    private static readonly Dictionary<string, MmrmFit> Fits = [];

    internal static MmrmFit FitStudy(string code, MmrmEstimationMethod method = MmrmEstimationMethod.RestrictedMaximumLikelihood)
    {
        lock (Fits)
        {
            var key = code + method;
            if (!Fits.TryGetValue(key, out var fit))
            {
                fit = Mmrm.Fit(MmrmOracles.StudyData(), new MmrmModel(MmrmOracles.Terms, MmrmOracles.StructureOf(code), method));
                Fits[key] = fit;
            }
            return fit;
        }
    }

    internal static void SameFit(JsonElement expected, MmrmFit fit, string what)
    {
        Assert.True(fit.IsEstimable, fit.NotEstimableReason);
        Assert.True(fit.Converged, what + " did not converge");
        var names = expected.GetProperty("coefficientNames").EnumerateArray().Select(e => e.GetString()!).ToList();
        var b = MmrmOracles.Numbers(expected.GetProperty("coefficients"));
        var se = MmrmOracles.Numbers(expected.GetProperty("standardErrors"));
        Assert.Equal(names.Count, fit.Coefficients.Count);
        for (var k = 0; k < names.Count; k++)
        {
            var j = MmrmOracles.Column(fit, names[k]);
            EfficacyOracles.Close(b[k], fit.Coefficients[j], Estimates, $"{what} {names[k]}");
            EfficacyOracles.Close(se[k], fit.StandardError(j), Estimates, $"{what} SE of {names[k]}");
        }
        EfficacyOracles.Close(expected.GetProperty("logLik").GetDouble(), fit.LogLikelihood, 1e-10, what + " log-likelihood");
        var sigma = expected.GetProperty("sigma").EnumerateArray().Select(MmrmOracles.Numbers).ToArray();
        for (var a = 0; a < sigma.Length; a++)
        {
            for (var c = 0; c < sigma.Length; c++)
            {
                EfficacyOracles.Close(sigma[a][c], fit.Sigma[a, c], 1e-5, $"{what} Sigma[{a},{c}]");
            }
        }
    }

    /// <summary>Compares each LS mean or difference of a section: its coefficient vector, estimate, SE, Satterthwaite df and interval, and the Kenward-Roger SE and df.</summary>
    internal static void SameContrasts(JsonElement rows, MmrmFit fit, Func<string, Vector<double>> weights, string what, bool kenwardRoger = true)
    {
        foreach (var row in rows.EnumerateArray())
        {
            var label = row.GetProperty("label").GetString()!;
            var c = weights(label);
            var expectedC = MmrmOracles.Numbers(row.GetProperty("coefficients"));
            for (var j = 0; j < c.Count; j++)
            {
                Assert.True(Math.Abs(expectedC[j] - c[j]) < 1e-12, $"{what} {label}: weight of column {j} is {c[j]}, emmeans uses {expectedC[j]}");
            }
            var s = fit.Contrast(c, MmrmDegreesOfFreedom.Satterthwaite, 0.95);
            Assert.True(s.IsEstimable, s.NotEstimableReason);
            EfficacyOracles.Close(row.GetProperty("estimate").GetDouble(), s.Estimate, Estimates, $"{what} {label} estimate");
            EfficacyOracles.Close(row.GetProperty("se").GetDouble(), s.StandardError, Estimates, $"{what} {label} SE");
            EfficacyOracles.Close(row.GetProperty("satterthwaiteDf").GetDouble(), s.DegreesOfFreedom, DegreesOfFreedom, $"{what} {label} Satterthwaite df");
            // A bound can be near zero, so its agreement is measured against the SE (the interval's scale);
            // through the t quantile it inherits the oracle's df error (numDeriv, up to about 5e-5), hence 1e-5.
            foreach (var (bound, actual) in new[] { ("lower", s.Lower), ("upper", s.Upper) })
            {
                var expectedBound = row.GetProperty(bound).GetDouble();
                Assert.True(Math.Abs(expectedBound - actual) <= 1e-5 * Math.Max(Math.Abs(expectedBound), s.StandardError),
                    $"{what} {label} {bound}: expected {expectedBound:R}, got {actual:R}");
            }
            // A p-value far in the tail moves with the df (1e-9 shifts by 1e-4 for a 1e-6 change in df).
            EfficacyOracles.Close(row.GetProperty("p").GetDouble(), s.PValue, 1e-3, $"{what} {label} p");
            if (kenwardRoger)
            {
                var k = fit.Contrast(c, MmrmDegreesOfFreedom.KenwardRoger, 0.95);
                Assert.True(k.IsEstimable, k.NotEstimableReason);
                EfficacyOracles.Close(row.GetProperty("krSe").GetDouble(), k.StandardError, Estimates, $"{what} {label} Kenward-Roger SE");
                EfficacyOracles.Close(row.GetProperty("krDf").GetDouble(), k.DegreesOfFreedom, DegreesOfFreedom, $"{what} {label} Kenward-Roger df");
            }
        }
    }

    /// <summary>"ACT - PBO @ W08" and "PBO @ W04" and "ACT" labels of the script, as LS-mean weight vectors.</summary>
    internal static Vector<double> Weights(MmrmFit fit, string label)
    {
        var parts = label.Split(" @ ");
        Dictionary<string, string> At(string arm) => parts.Length == 2 ? new() { ["ARM"] = arm, ["AVISIT"] = parts[1] } : new() { ["ARM"] = arm };
        var arms = parts[0].Split(" - ");
        var c = fit.Design.LeastSquaresMeanWeights(At(arms[0]));
        return arms.Length == 2 ? c - fit.Design.LeastSquaresMeanWeights(At(arms[1])) : c;
    }

    internal static void SameType3(JsonElement rows, MmrmFit fit, string what)
    {
        var satterthwaite = fit.Type3Tests(MmrmDegreesOfFreedom.Satterthwaite);
        var kenwardRoger = fit.Type3Tests(MmrmDegreesOfFreedom.KenwardRoger);
        foreach (var row in rows.EnumerateArray())
        {
            var term = row.GetProperty("term").GetString()!;
            var s = satterthwaite.Single(t => t.Term == term);
            var k = kenwardRoger.Single(t => t.Term == term);
            Assert.True(s.IsEstimable, s.NotEstimableReason);
            Assert.True(k.IsEstimable, k.NotEstimableReason);
            Assert.Equal(row.GetProperty("numDf").GetInt32(), s.NumeratorDegreesOfFreedom);
            EfficacyOracles.Close(row.GetProperty("F").GetDouble(), s.F, Estimates, $"{what} {term} F");
            EfficacyOracles.Close(row.GetProperty("nlmeF").GetDouble(), s.F, 1e-4, $"{what} {term} F (nlme anova at nlme's estimate)");
            EfficacyOracles.Close(row.GetProperty("satterthwaiteDf").GetDouble(), s.DenominatorDegreesOfFreedom, DegreesOfFreedom, $"{what} {term} Satterthwaite df");
            EfficacyOracles.Close(row.GetProperty("krF").GetDouble(), k.F, Estimates, $"{what} {term} Kenward-Roger F");
            EfficacyOracles.Close(row.GetProperty("krDf").GetDouble(), k.DenominatorDegreesOfFreedom, DegreesOfFreedom, $"{what} {term} Kenward-Roger df");
            EfficacyOracles.Close(row.GetProperty("krP").GetDouble(), k.PValue, 1e-4, $"{what} {term} Kenward-Roger p");
        }
    }

    [Theory]
    [InlineData("UN")]
    [InlineData("CS")]
    [InlineData("CSH")]
    [InlineData("AR1")]
    [InlineData("ARH")]
    [InlineData("TOEP")]
    public void Reml_fit_matches_nlme_gls(string structure) =>
        SameFit(MmrmOracles.Study.GetProperty(structure), FitStudy(structure), structure);

    /// <summary>nlme's own estimate (its optimiser stops with a gradient near 1e-5): ours is at least as likely and within 1e-5.</summary>
    internal static void CloseToNlmeOwnEstimate(JsonElement expected, MmrmFit fit, string what)
    {
        var nlme = expected.GetProperty("nlme");
        var names = expected.GetProperty("coefficientNames").EnumerateArray().Select(e => e.GetString()!).ToList();
        var b = MmrmOracles.Numbers(nlme.GetProperty("coefficients"));
        for (var k = 0; k < names.Count; k++)
        {
            var j = MmrmOracles.Column(fit, names[k]);
            Assert.True(Math.Abs(b[k] - fit.Coefficients[j]) <= 1e-5 * Math.Max(1, Math.Abs(b[k])), $"{what} {names[k]}: nlme {b[k]:R}, ours {fit.Coefficients[j]:R}");
        }
        var nlmeLogLik = nlme.GetProperty("logLik").GetDouble();
        Assert.True(fit.LogLikelihood >= nlmeLogLik - 1e-10 * Math.Abs(nlmeLogLik), $"{what}: log-likelihood {fit.LogLikelihood:R} below nlme's {nlmeLogLik:R}");
        Assert.True(fit.LogLikelihood - nlmeLogLik < 1e-6, $"{what}: log-likelihood {fit.LogLikelihood:R} far above nlme's {nlmeLogLik:R}");
    }

    /// <summary>emmeans' own gls numbers: the estimates agree to 1e-5 (nlme's estimate); its Satterthwaite df, from a finite-difference approximate covariance of theta, to 2%.</summary>
    internal static void CloseToEmmeans(JsonElement rows, MmrmFit fit, string what)
    {
        foreach (var row in rows.EnumerateArray())
        {
            var label = row.GetProperty("label").GetString()!;
            var emmeans = row.GetProperty("emmeans");
            var s = fit.Contrast(Weights(fit, label), MmrmDegreesOfFreedom.Satterthwaite, 0.95);
            Assert.True(Math.Abs(emmeans.GetProperty("estimate").GetDouble() - s.Estimate) <= 1e-5 * Math.Max(1, Math.Abs(s.Estimate)), $"{what} {label} estimate");
            EfficacyOracles.Close(emmeans.GetProperty("se").GetDouble(), s.StandardError, 1e-5, $"{what} {label} SE (emmeans)");
            EfficacyOracles.Close(emmeans.GetProperty("df").GetDouble(), s.DegreesOfFreedom, 2e-2, $"{what} {label} df (emmeans)");
        }
    }

    [Theory]
    [InlineData("UN")]
    [InlineData("CS")]
    [InlineData("CSH")]
    [InlineData("AR1")]
    [InlineData("ARH")]
    [InlineData("TOEP")]
    public void Fit_is_at_least_as_good_as_nlme_own_and_close_to_emmeans(string structure)
    {
        var fit = FitStudy(structure);
        var expected = MmrmOracles.Study.GetProperty(structure);
        CloseToNlmeOwnEstimate(expected, fit, structure);
        CloseToEmmeans(expected.GetProperty("lsmeansByVisit"), fit, structure);
        CloseToEmmeans(expected.GetProperty("differencesByVisit"), fit, structure);
    }

    [Fact]
    public void Ml_unstructured_fit_matches_nlme_gls()
    {
        var fit = FitStudy("UN", MmrmEstimationMethod.MaximumLikelihood);
        var expected = MmrmOracles.Study.GetProperty("UN_ML");
        SameFit(expected, fit, "UN ML");
        SameContrasts(expected.GetProperty("lsmeansByVisit"), fit, l => Weights(fit, l), "UN ML", kenwardRoger: false);
    }

    [Theory]
    [InlineData("UN")]
    [InlineData("CS")]
    [InlineData("CSH")]
    [InlineData("AR1")]
    [InlineData("ARH")]
    [InlineData("TOEP")]
    public void Ls_means_and_differences_match_emmeans_and_pbkrtest(string structure)
    {
        var fit = FitStudy(structure);
        var expected = MmrmOracles.Study.GetProperty(structure);
        foreach (var section in new[] { "lsmeansByVisit", "lsmeansOverall", "differencesByVisit", "differencesOverall" })
        {
            SameContrasts(expected.GetProperty(section), fit, l => Weights(fit, l), $"{structure} {section}");
        }
    }

    [Theory]
    [InlineData("UN")]
    [InlineData("CS")]
    [InlineData("CSH")]
    [InlineData("AR1")]
    [InlineData("ARH")]
    [InlineData("TOEP")]
    public void Kenward_roger_adjusted_covariance_matches_pbkrtest(string structure)
    {
        var fit = FitStudy(structure);
        var expected = MmrmOracles.Study.GetProperty(structure).GetProperty("krAdjustedCovariance").EnumerateArray().Select(MmrmOracles.Numbers).ToArray();
        var names = MmrmOracles.Study.GetProperty(structure).GetProperty("coefficientNames").EnumerateArray().Select(e => e.GetString()!).ToList();
        var adjusted = fit.KenwardRogerCovariance;
        Assert.NotNull(adjusted);
        for (var a = 0; a < names.Count; a++)
        {
            for (var b = 0; b < names.Count; b++)
            {
                var scale = Math.Sqrt(expected[a][a] * expected[b][b]);
                var difference = Math.Abs(expected[a][b] - adjusted[MmrmOracles.Column(fit, names[a]), MmrmOracles.Column(fit, names[b])]);
                Assert.True(difference <= Estimates * scale, $"{structure} Phi_A[{names[a]},{names[b]}]: expected {expected[a][b]:R}, difference {difference:E2}");
            }
        }
    }

    [Theory]
    [InlineData("UN")]
    [InlineData("CS")]
    [InlineData("CSH")]
    [InlineData("AR1")]
    [InlineData("ARH")]
    [InlineData("TOEP")]
    public void Type3_tests_match_nlme_emmeans_and_pbkrtest(string structure) =>
        SameType3(MmrmOracles.Study.GetProperty(structure).GetProperty("type3"), FitStudy(structure), structure);

    [Fact]
    public void The_kenward_roger_oracle_path_reproduces_a_published_example()
    {
        // Before trusting it, the generator runs its gls + pbkrtest path on the sugar beets split plot of
        // Halekoh and Hojsgaard (J Stat Softw 59(9), 2014; values recalled from memory and printed alike by
        // pbkrtest 0.5.2's KRmodcomp): harvest effect F = 15.2 on 1 and 2.00 df, p = 0.0599.
        var check = MmrmOracles.KenwardRogerCrossCheck;
        var published = check.GetProperty("published");
        var path = check.GetProperty("oraclePath");
        Assert.Equal(published.GetProperty("F").GetDouble(), Math.Round(path.GetProperty("F").GetDouble(), 1));
        Assert.Equal(published.GetProperty("ddf").GetDouble(), Math.Round(path.GetProperty("ddf").GetDouble(), 2));
        Assert.Equal(published.GetProperty("p").GetDouble(), Math.Round(path.GetProperty("p").GetDouble(), 4));
        EfficacyOracles.Close(check.GetProperty("KRmodcomp").GetProperty("ddf").GetDouble(), path.GetProperty("ddf").GetDouble(), 1e-4, "ddf against KRmodcomp");
    }

    [Fact]
    public void Compound_symmetry_kenward_roger_matches_the_random_intercept_model_of_lme4_and_pbkrtest()
    {
        // The same model written as a random subject intercept (lme4 1.1-31, REML) and analysed by emmeans
        // with lmer.df = "kenward-roger" (pbkrtest 0.5.2): an oracle independent of the V and dV/dtheta the
        // script builds for pbkrtest's internals. lmer's optimiser stops a little earlier, hence 1e-5.
        var fit = FitStudy("CS");
        var lmer = MmrmOracles.Study.GetProperty("CS_lmer");
        EfficacyOracles.Close(lmer.GetProperty("logLik").GetDouble(), fit.LogLikelihood, 1e-9, "REML log-likelihood");
        var lsSe = MmrmOracles.Numbers(lmer.GetProperty("lsmeanSe"));
        var lsDf = MmrmOracles.Numbers(lmer.GetProperty("lsmeanDf"));
        var i = 0;
        foreach (var visit in MmrmOracles.StudyVisits)
        {
            foreach (var arm in MmrmOracles.StudyArms)
            {
                var k = fit.LeastSquaresMean(new Dictionary<string, string> { ["ARM"] = arm, ["AVISIT"] = visit }, MmrmDegreesOfFreedom.KenwardRoger, 0.95);
                EfficacyOracles.Close(lsSe[i], k.StandardError, 1e-5, $"{arm} {visit} SE");
                EfficacyOracles.Close(lsDf[i], k.DegreesOfFreedom, 1e-4, $"{arm} {visit} df");
                i++;
            }
        }
        var dSe = MmrmOracles.Numbers(lmer.GetProperty("differenceSe"));
        var dDf = MmrmOracles.Numbers(lmer.GetProperty("differenceDf"));
        for (var v = 0; v < MmrmOracles.StudyVisits.Length; v++)
        {
            var at = MmrmOracles.StudyVisits[v];
            var k = fit.LeastSquaresMeanDifference(new Dictionary<string, string> { ["ARM"] = "ACT", ["AVISIT"] = at },
                new Dictionary<string, string> { ["ARM"] = "PBO", ["AVISIT"] = at }, MmrmDegreesOfFreedom.KenwardRoger, 0.95);
            EfficacyOracles.Close(dSe[v], k.StandardError, 1e-5, $"difference at {at} SE");
            EfficacyOracles.Close(dDf[v], k.DegreesOfFreedom, 1e-4, $"difference at {at} df");
        }
    }
}
