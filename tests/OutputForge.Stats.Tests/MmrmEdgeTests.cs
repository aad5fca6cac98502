namespace OutputForge.Stats.Tests;

/// <summary>
/// Data the mixed model cannot handle as asked: each gives a not-estimable result with its reason or a
/// note, never an exception (the invented study of Oracles/mmrm_data.csv, altered record by record).
/// </summary>
public sealed class MmrmEdgeTests
{
    private sealed record Row(string Subject, string Arm, string Strat, double Base, string Visit, double Chg);

    private static List<Row> StudyRows() => EfficacyOracles.ReadCsv("mmrm_data.csv")
        .Select(r => new Row(r["USUBJID"], r["ARM"], r["STRAT"], EfficacyOracles.Number(r["BASE"]), r["AVISIT"], EfficacyOracles.Number(r["CHG"])))
        .ToList();

    private static MmrmData Data(List<Row> rows, string[]? visits = null, string[]? strata = null)
    {
        visits ??= MmrmOracles.StudyVisits;
        strata ??= ["LOW", "HIGH"];
        var visit = new LinearModelFactor("AVISIT", visits, rows.Select(r => Array.IndexOf(visits, r.Visit)).ToList());
        var arm = new LinearModelFactor("ARM", MmrmOracles.StudyArms, rows.Select(r => Array.IndexOf(MmrmOracles.StudyArms, r.Arm)).ToList());
        var strat = new LinearModelFactor("STRAT", strata, rows.Select(r => Array.IndexOf(strata, r.Strat)).ToList());
        return new MmrmData(rows.Select(r => r.Chg).ToList(), rows.Select(r => r.Subject).ToList(), visit, [arm, strat],
            [new LinearModelCovariate("BASE", rows.Select(r => r.Base).ToList())]);
    }

    private static MmrmFit Fit(MmrmData data, MmrmCovarianceStructure structure = MmrmCovarianceStructure.Unstructured,
        MmrmEstimationMethod method = MmrmEstimationMethod.RestrictedMaximumLikelihood) =>
        Mmrm.Fit(data, new MmrmModel(MmrmOracles.Terms, structure, method));

    private static void NotEstimable(MmrmFit fit, string expectedReasonPart)
    {
        Assert.False(fit.IsEstimable);
        Assert.Contains(expectedReasonPart, fit.NotEstimableReason);
        var lsMean = fit.LeastSquaresMean(new Dictionary<string, string> { ["ARM"] = "ACT" }, MmrmDegreesOfFreedom.KenwardRoger, 0.95);
        Assert.False(lsMean.IsEstimable);
        Assert.All(fit.Type3Tests(MmrmDegreesOfFreedom.Satterthwaite), t => Assert.False(t.IsEstimable));
    }

    [Fact]
    public void A_class_level_without_records_makes_the_design_singular()
    {
        NotEstimable(Fit(Data(StudyRows(), strata: ["LOW", "HIGH", "MID"])), "the design is singular: STRAT[MID]");
    }

    [Fact]
    public void Two_records_of_one_subject_at_one_visit_are_reported()
    {
        var rows = StudyRows();
        rows.Add(rows[0] with { Chg = rows[0].Chg + 1 });
        NotEstimable(Fit(Data(rows)), $"subject {rows[0].Subject} has more than one record at visit {rows[0].Visit}");
    }

    [Fact]
    public void A_visit_without_observations_is_reported()
    {
        NotEstimable(Fit(Data(StudyRows(), visits: [.. MmrmOracles.StudyVisits, "W20"])), "no observation at visit W20");
    }

    [Fact]
    public void Unstructured_covariance_of_two_visits_never_seen_together_is_not_estimable()
    {
        var rows = StudyRows();
        // Of each subject seen at both, alternately drop the first or the last visit.
        var both = rows.GroupBy(r => r.Subject).Where(g => g.Any(r => r.Visit == "W04") && g.Any(r => r.Visit == "W16"))
            .Select((g, i) => (g.Key, Drop: i % 2 == 0 ? "W04" : "W16")).ToDictionary(p => p.Key, p => p.Drop);
        rows.RemoveAll(r => both.TryGetValue(r.Subject, out var drop) && r.Visit == drop);
        NotEstimable(Fit(Data(rows)), "no subject was seen at both visit W04 and visit W16");
        // The structured covariances need no such pair: AR(1) borrows the lag-3 correlation from rho.
        var ar1 = Fit(Data(rows), MmrmCovarianceStructure.Autoregressive1);
        Assert.True(ar1.IsEstimable, ar1.NotEstimableReason);
        Assert.True(ar1.Converged);
    }

    [Fact]
    public void Subjects_seen_once_are_used()
    {
        var rows = StudyRows();
        var once = rows.GroupBy(r => r.Subject).Count(g => g.Count() == 1);
        Assert.True(once > 0, "the invented study has subjects who left after the first visit");
        var fit = Fit(Data(rows));
        Assert.True(fit.IsEstimable && fit.Converged);
        Assert.Equal(rows.Count - fit.Design.ColumnCount, fit.ResidualDegreesOfFreedom);
    }

    [Fact]
    public void One_visit_is_too_few_for_a_structured_covariance_but_not_for_unstructured()
    {
        var rows = StudyRows().Where(r => r.Visit == "W04").ToList();
        var data = Data(rows, visits: ["W04"]);
        var terms = new[] { MmrmTerm.Factor("ARM"), MmrmTerm.Factor("STRAT"), MmrmTerm.Numeric("BASE") };
        var ar1 = Mmrm.Fit(data, new MmrmModel(terms, MmrmCovarianceStructure.Autoregressive1));
        Assert.False(ar1.IsEstimable);
        Assert.Contains("needs at least 2 visits", ar1.NotEstimableReason);
        // With one visit, unstructured REML is the ordinary linear model: the same estimates and SE as
        // LinearModel (itself checked against R lm and NIST StRD).
        var un = Mmrm.Fit(data, new MmrmModel(terms, MmrmCovarianceStructure.Unstructured));
        var design = LinearModelDesign.Build(rows.Count, [data.Covariates[0]], [data.Factors[0], data.Factors[1]]);
        var lm = LinearModel.Fit(data.Response, design);
        Assert.True(un.IsEstimable && un.Converged);
        foreach (var name in design.ColumnNames)
        {
            var j = un.Design.ColumnNames.ToList().IndexOf(name);
            var k = design.ColumnNames.ToList().IndexOf(name);
            Assert.Equal(lm.Coefficients[k], un.Coefficients[j], 1e-9);
            Assert.Equal(lm.StandardError(k), un.StandardError(j), 1e-9);
        }
        Assert.Equal(lm.ResidualVariance, un.Sigma[0, 0], 1e-9);
        Assert.Equal(lm.ResidualDegreesOfFreedom, un.ResidualDegreesOfFreedom);
    }

    [Fact]
    public void Kenward_roger_needs_a_reml_fit()
    {
        var fit = Fit(Data(StudyRows()), method: MmrmEstimationMethod.MaximumLikelihood);
        var result = fit.LeastSquaresMean(new Dictionary<string, string> { ["ARM"] = "ACT" }, MmrmDegreesOfFreedom.KenwardRoger, 0.95);
        Assert.False(result.IsEstimable);
        Assert.Contains("REML", result.NotEstimableReason);
        Assert.True(fit.LeastSquaresMean(new Dictionary<string, string> { ["ARM"] = "ACT" }, MmrmDegreesOfFreedom.Satterthwaite, 0.95).IsEstimable);
    }

    [Fact]
    public void A_covariance_at_the_edge_of_its_space_is_noted_not_hidden()
    {
        // Every subject's responses differ from the visit means by one constant: no within-subject
        // variation at all, so the compound-symmetry within variance goes to zero (the boundary).
        var rows = StudyRows();
        var shift = rows.Select(r => r.Subject).Distinct().Select((s, i) => (s, i)).ToDictionary(p => p.s, p => (p.i % 7) - 3.0);
        var visitMean = new Dictionary<string, double> { ["W04"] = -1, ["W08"] = -2, ["W12"] = -3, ["W16"] = -4 };
        var flat = rows.Select(r => r with { Chg = visitMean[r.Visit] + shift[r.Subject] }).ToList();
        var fit = Fit(Data(flat), MmrmCovarianceStructure.CompoundSymmetry);
        Assert.True(fit.IsEstimable, fit.NotEstimableReason);
        Assert.False(fit.Converged);
        Assert.Contains(fit.Notes, n => n.Contains("did not converge"));
        Assert.Contains(fit.Notes, n => n.Contains("edge of the parameter space"));
        var kenwardRoger = fit.LeastSquaresMean(new Dictionary<string, string> { ["ARM"] = "ACT" }, MmrmDegreesOfFreedom.KenwardRoger, 0.95);
        Assert.False(kenwardRoger.IsEstimable);
        Assert.Contains("not positive definite", kenwardRoger.NotEstimableReason);
        var satterthwaite = fit.Type3Tests(MmrmDegreesOfFreedom.Satterthwaite);
        Assert.All(satterthwaite, t => Assert.False(t.IsEstimable));
    }

    [Fact]
    public void Residual_and_between_within_degrees_of_freedom_follow_their_definitions()
    {
        var rows = StudyRows();
        var fit = Fit(Data(rows));
        var n = rows.Count;
        var subjects = rows.Select(r => r.Subject).Distinct().Count();
        // 13 columns; the intercept, ARM[ACT], STRAT[HIGH] and BASE are constant within each subject.
        Assert.Equal(13, fit.Design.ColumnCount);
        const int between = 4;
        var strat = fit.LeastSquaresMeanDifference(new Dictionary<string, string> { ["STRAT"] = "HIGH" },
            new Dictionary<string, string> { ["STRAT"] = "LOW" }, MmrmDegreesOfFreedom.BetweenWithin, 0.95);
        Assert.Equal(subjects - between, strat.DegreesOfFreedom);
        var atVisit = fit.LeastSquaresMeanDifference(new Dictionary<string, string> { ["ARM"] = "ACT", ["AVISIT"] = "W16" },
            new Dictionary<string, string> { ["ARM"] = "PBO", ["AVISIT"] = "W16" }, MmrmDegreesOfFreedom.BetweenWithin, 0.95);
        Assert.Equal(n - subjects - (13 - between), atVisit.DegreesOfFreedom);
        var residual = fit.LeastSquaresMeanDifference(new Dictionary<string, string> { ["ARM"] = "ACT", ["AVISIT"] = "W16" },
            new Dictionary<string, string> { ["ARM"] = "PBO", ["AVISIT"] = "W16" }, MmrmDegreesOfFreedom.Residual, 0.95);
        Assert.Equal(n - 13, residual.DegreesOfFreedom);
        Assert.Equal(atVisit.StandardError, residual.StandardError, 12);
    }

    [Fact]
    public void An_interaction_without_its_main_effects_is_refused()
    {
        var terms = new[] { MmrmTerm.Factor("ARM"), MmrmTerm.Interaction("ARM", "AVISIT") };
        var error = Assert.Throws<ArgumentException>(() => Mmrm.Fit(Data(StudyRows()), new MmrmModel(terms, MmrmCovarianceStructure.Unstructured)));
        Assert.Contains("needs the term AVISIT", error.Message);
    }
}
