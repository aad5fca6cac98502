using MathNet.Numerics.LinearAlgebra;

namespace OutputForge.Stats.Models;

/// <summary>
/// Mixed model for repeated measures: the linear model y = X beta + e with the errors of one subject
/// correlated by a structured or unstructured covariance Sigma over visits and independent between
/// subjects, fitted by restricted (or full) maximum likelihood. A subject missing some visits
/// contributes the rows and columns of Sigma at the visits it was seen at (ignorable missingness under
/// missing at random; Jennrich and Schluchter, Biometrics 42, 1986). beta is profiled out, and the
/// covariance parameters theta are found by Fisher scoring, switching to Newton-Raphson on the observed
/// information once close, with step halving that keeps Sigma positive definite and never lowers the
/// log-likelihood (Jennrich and Schluchter 1986, sections 3-4). Inference on beta is in <see cref="MmrmFit"/>.
/// </summary>
public static class Mmrm
{
    public const int MaximumIterations = 200;
    private const int MaximumHalvings = 40;

    public static MmrmFit Fit(MmrmData data, MmrmModel model)
    {
        var n = data.RecordCount;
        if (data.Subject.Count != n || data.Visit.LevelOfRow.Count != n)
        {
            throw new ArgumentException($"{n} responses but {data.Subject.Count} subjects and {data.Visit.LevelOfRow.Count} visits", nameof(data));
        }
        if (data.Response.Any(v => !double.IsFinite(v)))
        {
            throw new ArgumentException("responses must be finite numbers (leave a missing visit out)", nameof(data));
        }
        var visitCount = data.Visit.Levels.Count;
        if (data.Visit.LevelOfRow.Any(v => v < 0 || v >= visitCount))
        {
            throw new ArgumentException($"a record's visit is not one of the {visitCount} visit levels", nameof(data));
        }
        var design = new MmrmDesign(data, model.Terms);
        var covariance = WithinSubjectCovariance.Create(model.Structure, visitCount);
        var restricted = model.Method == MmrmEstimationMethod.RestrictedMaximumLikelihood;
        MmrmFit NotEstimable(string reason) => MmrmFit.NotEstimable(design, covariance, model.Method, reason);

        var subjects = new Dictionary<string, List<int>>(StringComparer.Ordinal);
        for (var r = 0; r < n; r++)
        {
            if (!subjects.TryGetValue(data.Subject[r], out var rows))
            {
                subjects[data.Subject[r]] = rows = [];
            }
            rows.Add(r);
        }
        var subjectRows = new List<int[]>();
        foreach (var (id, rows) in subjects)
        {
            var ordered = rows.OrderBy(r => data.Visit.LevelOfRow[r]).ToArray();
            for (var i = 1; i < ordered.Length; i++)
            {
                if (data.Visit.LevelOfRow[ordered[i]] == data.Visit.LevelOfRow[ordered[i - 1]])
                {
                    return NotEstimable($"subject {id} has more than one record at visit {data.Visit.Levels[data.Visit.LevelOfRow[ordered[i]]]}");
                }
            }
            subjectRows.Add(ordered);
        }
        var empty = Enumerable.Range(0, visitCount).Where(v => !data.Visit.LevelOfRow.Contains(v)).ToList();
        if (empty.Count > 0)
        {
            return NotEstimable($"no observation at visit {data.Visit.Levels[empty[0]]}");
        }
        if (visitCount < covariance.MinimumVisits)
        {
            return NotEstimable($"the {Describe(model.Structure)} covariance needs at least {covariance.MinimumVisits} visits");
        }
        var p = design.ColumnCount;
        var q = covariance.ParameterCount;
        if (n - p < q)
        {
            return NotEstimable($"{n} observations are too few for {p} fixed effects and {q} covariance parameters");
        }
        var x = design.ReferenceCoded;
        var likelihood = new MmrmLikelihood(x, data.Response, subjectRows, data.Visit.LevelOfRow, covariance, restricted);
        var (xtx, xty) = likelihood.OrdinaryCrossProducts();
        if (FirstDependentColumn(xtx) is { } dependent)
        {
            return NotEstimable($"the design is singular: {design.ColumnNames[dependent]} is not estimable (empty cell or collinear covariate)");
        }
        if (model.Structure == MmrmCovarianceStructure.Unstructured)
        {
            var together = new bool[visitCount, visitCount];
            foreach (var v in subjectRows.Select(rows => rows.Select(r => data.Visit.LevelOfRow[r]).ToArray()))
            {
                foreach (var a in v)
                {
                    foreach (var b in v)
                    {
                        together[a, b] = true;
                    }
                }
            }
            for (var a = 0; a < visitCount; a++)
            {
                for (var b = a + 1; b < visitCount; b++)
                {
                    if (!together[a, b])
                    {
                        return NotEstimable($"no subject was seen at both visit {data.Visit.Levels[a]} and visit {data.Visit.Levels[b]}: their unstructured covariance is not estimable");
                    }
                }
            }
        }

        var ols = xtx.Cholesky().Solve(xty);
        var empirical = PairwiseCovariance(Vector<double>.Build.DenseOfEnumerable(data.Response) - x * ols, subjectRows, data.Visit.LevelOfRow, visitCount);
        if (empirical.Diagonal().All(v => !(v > 0)))
        {
            return NotEstimable("the fixed effects fit every response exactly: there is no residual variation to estimate a covariance from");
        }
        var start = StartingEvaluation(likelihood, covariance, empirical);
        if (start is null)
        {
            return NotEstimable("no positive definite starting covariance could be found");
        }
        var (final, iterations, converged) = Iterate(likelihood, start);
        return new MmrmFit(data, design, covariance, model.Method, likelihood, final, iterations, converged);
    }

    /// <summary>
    /// The first column that is (numerically) a linear combination of the earlier ones, or null. The
    /// Cholesky factor of X'X scaled to unit diagonal has L_jj^2 = 1 - R^2 of column j on the columns before
    /// it (the squared |R_jj| / |x_j| of the QR decomposition); X'X comes from the pattern sums, so this
    /// costs nothing per record. A column is dependent when it is zero or its R^2 exceeds 1 - 1e-12.
    /// </summary>
    private static int? FirstDependentColumn(Matrix<double> xtx)
    {
        var p = xtx.RowCount;
        var l = Matrix<double>.Build.Dense(p, p);
        for (var j = 0; j < p; j++)
        {
            if (!(xtx[j, j] > 0))
            {
                return j;
            }
            for (var k = 0; k <= j; k++)
            {
                var sum = xtx[j, k] / Math.Sqrt(xtx[j, j] * xtx[k, k]);
                for (var i = 0; i < k; i++)
                {
                    sum -= l[j, i] * l[k, i];
                }
                if (k < j)
                {
                    l[j, k] = sum / l[k, k];
                }
                else if (sum < 1e-12)
                {
                    return j;
                }
                else
                {
                    l[j, j] = Math.Sqrt(sum);
                }
            }
        }
        return null;
    }

    private static MmrmEvaluation? StartingEvaluation(MmrmLikelihood likelihood, WithinSubjectCovariance covariance, Matrix<double> empirical)
    {
        var positive = empirical.Diagonal().Where(v => v > 0).DefaultIfEmpty(1).Average();
        var diagonal = Matrix<double>.Build.DenseOfDiagonalVector(empirical.Diagonal().Map(v => v > 0 ? v : positive));
        return likelihood.Evaluate(covariance.StartingValues(empirical), derivatives: true)
               ?? likelihood.Evaluate(covariance.StartingValues(diagonal), derivatives: true);
    }

    /// <summary>Moment estimate of Sigma from OLS residuals: each cell averages over the subjects seen at both visits.</summary>
    private static Matrix<double> PairwiseCovariance(Vector<double> residuals, List<int[]> subjectRows, IReadOnlyList<int> visitOfRow, int t)
    {
        var sum = Matrix<double>.Build.Dense(t, t);
        var count = Matrix<double>.Build.Dense(t, t);
        foreach (var rows in subjectRows)
        {
            foreach (var a in rows)
            {
                foreach (var b in rows)
                {
                    sum[visitOfRow[a], visitOfRow[b]] += residuals[a] * residuals[b];
                    count[visitOfRow[a], visitOfRow[b]] += 1;
                }
            }
        }
        return Matrix<double>.Build.Dense(t, t, (a, b) => count[a, b] > 0 ? sum[a, b] / count[a, b] : 0);
    }

    private static (MmrmEvaluation Final, int Iterations, bool Converged) Iterate(MmrmLikelihood likelihood, MmrmEvaluation current)
    {
        var decrement = double.PositiveInfinity;
        for (var iteration = 1; iteration <= MaximumIterations; iteration++)
        {
            // Scoring (expected information) is robust far from the optimum; Newton-Raphson (observed
            // information) converges quadratically near it.
            var newton = decrement < 1e-2 && MmrmLikelihood.PositiveDefinite(current.ObservedInformation!);
            var information = newton ? current.ObservedInformation! : current.ExpectedInformation!;
            if (!MmrmLikelihood.PositiveDefinite(information))
            {
                return (current, iteration, false);
            }
            var step = information.Cholesky().Solve(current.Gradient!);
            decrement = current.Gradient!.DotProduct(step);
            if (decrement < 1e-16)
            {
                return (current, iteration, true);
            }
            MmrmEvaluation? accepted = null;
            var length = 1.0;
            for (var halving = 0; halving < MaximumHalvings && accepted is null; halving++, length /= 2)
            {
                var candidate = likelihood.Evaluate(current.Theta + step * length, derivatives: false);
                if (candidate is not null && candidate.LogLikelihood >= current.LogLikelihood - 1e-12 * (1 + Math.Abs(current.LogLikelihood)))
                {
                    accepted = likelihood.Evaluate(candidate.Theta, derivatives: true);
                }
            }
            if (accepted is null)
            {
                // No step improves the likelihood: converged to rounding if the predicted gain is negligible.
                return (current, iteration, decrement < 1e-8);
            }
            current = accepted;
        }
        return (current, MaximumIterations, false);
    }

    internal static string Describe(MmrmCovarianceStructure structure) => structure switch
    {
        MmrmCovarianceStructure.Unstructured => "unstructured",
        MmrmCovarianceStructure.CompoundSymmetry => "compound symmetry",
        MmrmCovarianceStructure.HeterogeneousCompoundSymmetry => "heterogeneous compound symmetry",
        MmrmCovarianceStructure.Autoregressive1 => "first-order autoregressive",
        MmrmCovarianceStructure.HeterogeneousAutoregressive1 => "heterogeneous first-order autoregressive",
        _ => "Toeplitz",
    };
}
