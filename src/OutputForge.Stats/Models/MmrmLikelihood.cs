using MathNet.Numerics.LinearAlgebra;

namespace OutputForge.Stats.Models;

/// <summary>
/// The (restricted) log-likelihood of the linear model y = X beta + e with e ~ N(0, V), V block diagonal
/// with the block of subject i the rows and columns of Sigma(theta) at the visits it was seen at, with
/// beta profiled out: beta(theta) = (X'V^-1 X)^-1 X'V^-1 y. Jennrich and Schluchter (1986) for the
/// repeated-measures form; Harville (JASA 72, 1977) for REML:
///   l_R = -1/2 [ (N - p) log 2pi + log|V| + log|X'V^-1 X| + r'V^-1 r ],   l = -1/2 [ N log 2pi + log|V| + r'V^-1 r ].
/// First and second derivatives in theta (with P = V^-1 - V^-1 X Phi X'V^-1, Phi = (X'V^-1 X)^-1, V_j = dV/dtheta_j):
///   dl_R/dtheta_j = -1/2 tr(P V_j) + 1/2 r'V^-1 V_j V^-1 r,   expected information 1/2 tr(P V_j P V_k),
///   d2 l_R = 1/2 tr(P V_j P V_k) - 1/2 tr(P V_jk) - y'P V_j P V_k P y + 1/2 y'P V_jk P y
/// (Wolfinger, Tobias and Sall, SIAM J Sci Comput 15, 1994, for these derivatives; recalled from memory
/// and re-derived from dP/dtheta_j = -P V_j P); for ML, V^-1 replaces P in the trace terms.
/// Subjects sharing a pattern of observed visits share V_i, so every sum over subjects is formed once,
/// from the pattern's sums of x_ia x_ib' and x_ia y_ib, and costs nothing per subject afterwards.
/// </summary>
internal sealed class MmrmLikelihood
{
    private readonly Matrix<double> _x;
    private readonly double[] _y;
    private readonly WithinSubjectCovariance _covariance;
    private readonly bool _restricted;
    private readonly List<VisitPattern> _patterns;
    private readonly int _p;

    public MmrmLikelihood(Matrix<double> x, IReadOnlyList<double> y, IReadOnlyList<int[]> subjectRows,
        IReadOnlyList<int> visitOfRow, WithinSubjectCovariance covariance, bool restricted)
    {
        _x = x;
        _y = y.ToArray();
        _covariance = covariance;
        _restricted = restricted;
        _p = x.ColumnCount;
        var byKey = new Dictionary<string, VisitPattern>(StringComparer.Ordinal);
        _patterns = [];
        foreach (var rows in subjectRows)
        {
            var visits = rows.Select(r => visitOfRow[r]).ToArray();
            var key = string.Join(",", visits);
            if (!byKey.TryGetValue(key, out var pattern))
            {
                pattern = new VisitPattern(visits, _p);
                byKey[key] = pattern;
                _patterns.Add(pattern);
            }
            pattern.Add(rows, x, _y);
        }
    }

    public int ObservationCount => _y.Length;
    public int ColumnCount => _p;
    public bool Restricted => _restricted;

    /// <summary>X'X and X'y (ordinary least squares), from the same pattern sums with identity weights.</summary>
    public (Matrix<double> XtX, Vector<double> XtY) OrdinaryCrossProducts()
    {
        var xtx = new double[_p * _p];
        var xty = new double[_p];
        foreach (var pattern in _patterns)
        {
            var identity = Matrix<double>.Build.DenseIdentity(pattern.Visits.Length);
            pattern.ContractXX(identity, xtx);
            pattern.ContractXY(identity, xty);
        }
        return (Matrix<double>.Build.Dense(_p, _p, xtx), Vector<double>.Build.DenseOfArray(xty));
    }

    /// <summary>The log-likelihood at theta and, when asked, its gradient and expected and observed information; null where Sigma(theta) or X'V^-1 X is not positive definite.</summary>
    public MmrmEvaluation? Evaluate(Vector<double> theta, bool derivatives)
    {
        var sigma = _covariance.Sigma(theta);
        if (!PositiveDefinite(sigma))
        {
            return null;
        }
        var p = _p;
        var xtvix = new double[p * p];
        var xtviy = new double[p];
        var logDetV = 0.0;
        var inverses = new Matrix<double>[_patterns.Count];
        for (var k = 0; k < _patterns.Count; k++)
        {
            var pattern = _patterns[k];
            var block = pattern.Sub(sigma);
            var cholesky = block.Cholesky();
            logDetV += pattern.SubjectCount * cholesky.DeterminantLn;
            var a = cholesky.Solve(Matrix<double>.Build.DenseIdentity(block.RowCount));
            a = (a + a.Transpose()) * 0.5;
            inverses[k] = a;
            pattern.ContractXX(a, xtvix);
            pattern.ContractXY(a, xtviy);
        }
        var information = Matrix<double>.Build.Dense(p, p, xtvix);
        if (!PositiveDefinite(information))
        {
            return null;
        }
        var infoCholesky = information.Cholesky();
        var phi = infoCholesky.Solve(Matrix<double>.Build.DenseIdentity(p));
        phi = (phi + phi.Transpose()) * 0.5;
        var beta = infoCholesky.Solve(Vector<double>.Build.DenseOfArray(xtviy));
        var residuals = Vector<double>.Build.DenseOfArray(_y) - _x * beta;
        var quadratic = 0.0;
        var residualProducts = new Matrix<double>[_patterns.Count];
        for (var k = 0; k < _patterns.Count; k++)
        {
            residualProducts[k] = _patterns[k].ResidualProducts(residuals);
            quadratic += (inverses[k] * residualProducts[k]).Trace();
        }
        var n = _y.Length;
        var logLik = _restricted
            ? -0.5 * ((n - p) * Math.Log(2 * Math.PI) + logDetV + infoCholesky.DeterminantLn + quadratic)
            : -0.5 * (n * Math.Log(2 * Math.PI) + logDetV + quadratic);
        var evaluation = new MmrmEvaluation(theta, logLik, beta, phi, residuals);
        if (derivatives)
        {
            AddDerivatives(evaluation, inverses, residualProducts);
        }
        return evaluation;
    }

    private void AddDerivatives(MmrmEvaluation e, Matrix<double>[] inverses, Matrix<double>[] residualProducts)
    {
        var d1 = _covariance.FirstDerivatives(e.Theta);
        var d2 = _covariance.SecondDerivatives(e.Theta);
        var q = d1.Length;
        var p = _p;
        var gradient = new double[q];
        var expected = new double[q, q];
        var observed = new double[q, q];
        var m = new double[q][];
        var xvu = new double[q][];
        for (var j = 0; j < q; j++)
        {
            m[j] = new double[p * p];
            xvu[j] = new double[p];
        }
        var traceAD = new double[q];
        var traceDG = new double[q];
        var traceBD = new double[q, q];
        var traceDADG = new double[q, q];
        var traceFPhi = new double[q, q];
        var traceAD2 = new double[q, q];
        var traceD2G = new double[q, q];
        var traceAD2APhi = new double[q, q];
        for (var k = 0; k < _patterns.Count; k++)
        {
            var pattern = _patterns[k];
            var a = inverses[k];
            var g = a * residualProducts[k] * a;
            var phiTraces = pattern.PhiTraces(e.Phi);
            var crossResiduals = pattern.CrossResiduals(e.Residuals);
            var d = d1.Select(pattern.Sub).ToArray();
            var b = d.Select(dj => a * dj * a).ToArray();
            // Products formed once per parameter, so that each pair (j, l) costs only an O(m^2) trace of a product.
            var traceMatrix = pattern.PhiTraceMatrix(phiTraces);
            var da = d.Select(dj => dj * a).ToArray();
            var dg = d.Select(dj => dj * g).ToArray();
            var daT = d.Select(dj => dj * a * traceMatrix).ToArray();
            var count = pattern.SubjectCount;
            for (var j = 0; j < q; j++)
            {
                traceAD[j] += count * TraceOfProduct(a, d[j]);
                traceDG[j] += TraceOfProduct(d[j], g);
                pattern.ContractXX(b[j], m[j]);
                pattern.ContractCross(b[j], crossResiduals, xvu[j]);
                for (var l = j; l < q; l++)
                {
                    traceBD[j, l] += count * TraceOfProduct(b[j], d[l]);
                    traceDADG[j, l] += TraceOfProduct(da[j], dg[l]);
                    // tr(Phi Q_jl) = sum_ab (B_j D_l A)_ab T_ab = tr(B_j D_l A T).
                    traceFPhi[j, l] += TraceOfProduct(b[j], daT[l]);
                    if (d2 is not null)
                    {
                        var djl = pattern.Sub(d2[j, l]);
                        traceAD2[j, l] += count * TraceOfProduct(a, djl);
                        traceD2G[j, l] += TraceOfProduct(djl, g);
                        traceAD2APhi[j, l] += TraceOfProduct(a * djl * a, traceMatrix);
                    }
                }
            }
        }
        var mMatrices = m.Select(v => Matrix<double>.Build.Dense(p, p, v)).ToArray();
        var phiM = mMatrices.Select(mj => e.Phi * mj).ToArray();
        var xvuVectors = xvu.Select(Vector<double>.Build.DenseOfArray).ToArray();
        for (var j = 0; j < q; j++)
        {
            var traceP = traceAD[j] - (_restricted ? phiM[j].Trace() : 0);
            gradient[j] = -0.5 * traceP + 0.5 * traceDG[j];
            for (var l = j; l < q; l++)
            {
                var tracePVPV = traceBD[j, l] - (_restricted ? 2 * traceFPhi[j, l] - TraceOfProduct(phiM[j], phiM[l]) : 0);
                expected[j, l] = expected[l, j] = 0.5 * tracePVPV;
                var uPu = traceDADG[j, l] - xvuVectors[j].DotProduct(e.Phi * xvuVectors[l]);
                var tracePD2 = traceAD2[j, l] - (_restricted ? traceAD2APhi[j, l] : 0);
                var hessian = 0.5 * tracePVPV - 0.5 * tracePD2 - uPu + 0.5 * traceD2G[j, l];
                observed[j, l] = observed[l, j] = -hessian;
            }
        }
        e.Gradient = Vector<double>.Build.DenseOfArray(gradient);
        e.ExpectedInformation = Matrix<double>.Build.DenseOfArray(expected);
        e.ObservedInformation = Matrix<double>.Build.DenseOfArray(observed);
        e.M = mMatrices;
    }

    /// <summary>
    /// Kenward and Roger's (1997) Q_jk = X'V^-1 V_j V^-1 V_k V^-1 X (its symmetric part, which is all the
    /// adjustment uses since it is weighted by a symmetric W) and R_jk = X'V^-1 V_jk V^-1 X (null when
    /// Sigma is linear in theta).
    /// </summary>
    public (Matrix<double>[,] Q, Matrix<double>[,]? R) KenwardRogerTerms(Vector<double> theta)
    {
        var sigma = _covariance.Sigma(theta);
        var d1 = _covariance.FirstDerivatives(theta);
        var d2 = _covariance.SecondDerivatives(theta);
        var q = d1.Length;
        var p = _p;
        var qSums = new double[q, q][];
        var rSums = d2 is null ? null : new double[q, q][];
        for (var j = 0; j < q; j++)
        {
            for (var l = j; l < q; l++)
            {
                qSums[j, l] = new double[p * p];
                if (rSums is not null)
                {
                    rSums[j, l] = new double[p * p];
                }
            }
        }
        foreach (var pattern in _patterns)
        {
            var block = pattern.Sub(sigma);
            var a = block.Cholesky().Solve(Matrix<double>.Build.DenseIdentity(block.RowCount));
            var d = d1.Select(pattern.Sub).ToArray();
            for (var j = 0; j < q; j++)
            {
                var bj = a * d[j] * a;
                for (var l = j; l < q; l++)
                {
                    var f = bj * d[l] * a;
                    pattern.ContractXX((f + f.Transpose()) * 0.5, qSums[j, l]);
                    if (rSums is not null)
                    {
                        pattern.ContractXX(a * pattern.Sub(d2![j, l]) * a, rSums[j, l]);
                    }
                }
            }
        }
        var qMatrices = new Matrix<double>[q, q];
        var rMatrices = rSums is null ? null : new Matrix<double>[q, q];
        for (var j = 0; j < q; j++)
        {
            for (var l = j; l < q; l++)
            {
                qMatrices[j, l] = Matrix<double>.Build.Dense(p, p, qSums[j, l]);
                qMatrices[l, j] = qMatrices[j, l];
                if (rMatrices is not null)
                {
                    rMatrices[j, l] = Matrix<double>.Build.Dense(p, p, rSums![j, l]);
                    rMatrices[l, j] = rMatrices[j, l];
                }
            }
        }
        return (qMatrices, rMatrices);
    }

    /// <summary>tr(U V) = sum_ab U_ab V_ba without forming the product.</summary>
    private static double TraceOfProduct(Matrix<double> u, Matrix<double> v)
    {
        // Column-major storage: u[a, b] = uv[b * n + a], v[b, a] = vv[a * n + b].
        var uv = u.AsColumnMajorArray() ?? u.ToColumnMajorArray();
        var vv = v.AsColumnMajorArray() ?? v.ToColumnMajorArray();
        var n = u.RowCount;
        var sum = 0.0;
        for (var a = 0; a < n; a++)
        {
            for (var b = 0; b < n; b++)
            {
                sum += uv[b * n + a] * vv[a * n + b];
            }
        }
        return sum;
    }

    /// <summary>Cholesky succeeds and every pivot is clearly positive.</summary>
    internal static bool PositiveDefinite(Matrix<double> m)
    {
        for (var i = 0; i < m.RowCount; i++)
        {
            if (!(m[i, i] > 0) || !double.IsFinite(m[i, i]))
            {
                return false;
            }
        }
        try
        {
            var l = m.Cholesky().Factor;
            var maxDiagonal = Enumerable.Range(0, m.RowCount).Max(i => m[i, i]);
            for (var i = 0; i < m.RowCount; i++)
            {
                if (!(l[i, i] * l[i, i] > 1e-13 * maxDiagonal))
                {
                    return false;
                }
            }
            return true;
        }
        catch (ArgumentException)
        {
            return false;
        }
    }
}
