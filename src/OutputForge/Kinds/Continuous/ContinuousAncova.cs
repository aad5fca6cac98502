using OutputForge.Analysis;
using OutputForge.Stats;

namespace OutputForge.Kinds.Continuous;

/// <summary>
/// The ANCOVA of one visit: change from baseline = treatment + numeric covariates + factors, fitted by
/// least squares (OutputForge.Stats.Models.LinearModel); LS means per arm, LS mean differences (each active arm
/// minus control, then the spec's pairs) and, on request, the dose-response test: the same model with
/// treatment entered as its numeric dose, testing the slope. Observations missing any model variable
/// are left out; arms with no observation left get no LS mean. A model that cannot be fitted says why.
/// </summary>
internal sealed class ContinuousAncova
{
    public sealed record Comparison(TreatmentArm Arm, TreatmentArm Reference, LinearContrastResult? Result, string? NotEstimableReason);

    public required IReadOnlyDictionary<TreatmentArm, int> CountInModel { get; init; }
    public required IReadOnlyDictionary<TreatmentArm, LinearContrastResult> LsMeans { get; init; }
    public required IReadOnlyList<Comparison> Comparisons { get; init; }
    public LinearContrastResult? DoseSlope { get; init; }
    public string? DoseNotEstimableReason { get; init; }
    public string? NotEstimableReason { get; init; }
    public int Excluded { get; init; }

    public static ContinuousAncova Fit(IReadOnlyList<TreatmentArm> arms, IReadOnlyList<ModelObservation> candidates,
        IReadOnlyList<RecordVariable> covariates, IReadOnlyList<RecordVariable> factors, RecordVariable? dose,
        IReadOnlyList<(TreatmentArm First, TreatmentArm Second)> pairs, double level)
    {
        // Each model variable is read once per candidate (an ADSL variable costs a lookup by subject).
        var covariateValues = covariates.Select(c => candidates.Select(o => c.Number(o.Row, o.Subject)).ToArray()).ToList();
        var factorValues = factors.Select(f => candidates.Select(o => f.Text(o.Row, o.Subject)).ToArray()).ToList();
        var doseValues = dose is null ? null : candidates.Select(o => dose.Number(o.Row, o.Subject)).ToArray();
        var kept = Enumerable.Range(0, candidates.Count).Where(i =>
                covariateValues.All(v => double.IsFinite(v[i]))
                && factorValues.All(v => v[i] is not null)
                && (doseValues is null || double.IsFinite(doseValues[i])))
            .ToList();
        var observations = kept.Select(i => candidates[i]).ToList();
        var counts = arms.ToDictionary(a => a, a => observations.Count(o => o.Arm == a));
        var control = arms.First(a => a.IsControl);
        // Control first, so that reference coding makes the control the reference level.
        var fitted = arms.Where(a => counts[a] > 0).OrderBy(a => a.IsControl ? 0 : 1).ToList();
        var comparisonsWanted = arms.Where(a => !a.IsControl).Select(a => (First: a, Second: control)).Concat(pairs).ToList();
        ContinuousAncova Failed(string reason) => new()
        {
            CountInModel = counts,
            LsMeans = new Dictionary<TreatmentArm, LinearContrastResult>(),
            Comparisons = comparisonsWanted.Select(p => new Comparison(p.First, p.Second, null, reason)).ToList(),
            DoseNotEstimableReason = dose is null ? null : reason,
            NotEstimableReason = reason,
            Excluded = candidates.Count - observations.Count,
        };
        if (fitted.Count < 2)
        {
            return Failed("fewer than two arms have subjects with the analysed value and all covariates");
        }
        var treatment = new LinearModelFactor("treatment", fitted.Select(a => a.Value).ToList(),
            observations.Select(o => fitted.IndexOf(o.Arm)).ToList());
        var covariateColumns = covariates.Select((c, k) => new LinearModelCovariate(c.Name,
            kept.Select(i => covariateValues[k][i]).ToList())).ToList();
        var factorColumns = factors.Select((f, k) => Factor(f.Name, kept.Select(i => factorValues[k][i]!).ToList())).ToList();
        var response = observations.Select(o => o.Response).ToList();
        var fit = LinearModel.Fit(response, LinearModelDesign.Build(observations.Count, covariateColumns, [treatment, .. factorColumns]));
        if (!fit.IsEstimable)
        {
            return Failed(fit.NotEstimableReason!);
        }
        if (fit.HasDegenerateVariance)
        {
            return Failed(DegenerateVariance.Reason);
        }
        var lsMeans = fitted.ToDictionary(a => a, a => LeastSquaresMeans.Mean(fit, treatment, a.Value, level));
        var comparisons = comparisonsWanted.Select(p => counts[p.First] == 0 || counts[p.Second] == 0
                ? new Comparison(p.First, p.Second, null, $"no subjects of {(counts[p.First] == 0 ? p.First : p.Second).Label} in the model")
                : new Comparison(p.First, p.Second, LeastSquaresMeans.Difference(fit, treatment, p.First.Value, p.Second.Value, level), null))
            .ToList();
        LinearContrastResult? slope = null;
        string? doseReason = null;
        if (dose is not null)
        {
            var doseColumn = new LinearModelCovariate(dose.Name, kept.Select(i => doseValues![i]).ToList());
            var doseFit = LinearModel.Fit(response, LinearModelDesign.Build(observations.Count, [doseColumn, .. covariateColumns], factorColumns));
            if (doseFit.IsEstimable)
            {
                slope = doseFit.Coefficient(1, level);
            }
            else
            {
                doseReason = doseFit.NotEstimableReason;
            }
        }
        return new ContinuousAncova
        {
            CountInModel = counts,
            LsMeans = lsMeans,
            Comparisons = comparisons,
            DoseSlope = slope,
            DoseNotEstimableReason = doseReason,
            Excluded = candidates.Count - observations.Count,
        };
    }

    /// <summary>A class covariate with its observed levels in ordinal order (the first is the reference).</summary>
    private static LinearModelFactor Factor(string name, List<string> values)
    {
        var levels = values.Distinct().Order(StringComparer.Ordinal).ToList();
        return new LinearModelFactor(name, levels, values.Select(v => levels.IndexOf(v)).ToList());
    }
}
