using MathNet.Numerics.LinearAlgebra;

namespace OutputForge.Stats.Models;

/// <summary>
/// The subjects seen at one set of visits, with the sums that the likelihood needs from their records:
/// S_ab = sum_i (x_ia x_ib' + x_ib x_ia') for visits a &lt; b (x_ia x_ia' for a = b), and likewise for
/// x and y. A symmetric m x m weight C then gives sum_i X_i' C X_i = sum_(a&lt;=b) C_ab S_ab.
/// </summary>
internal sealed class VisitPattern
{
    private readonly int _p;
    private readonly double[][] _xx;
    private readonly double[][] _xy;
    private readonly List<int[]> _subjects = [];
    private readonly List<double[][]> _subjectX = [];

    public VisitPattern(int[] visits, int p)
    {
        Visits = visits;
        _p = p;
        var m = visits.Length;
        _xx = new double[m * m][];
        _xy = new double[m * m][];
        for (var a = 0; a < m; a++)
        {
            for (var b = a; b < m; b++)
            {
                _xx[a * m + b] = new double[p * p];
                _xy[a * m + b] = new double[p];
            }
        }
    }

    /// <summary>The positions (0-based visit levels) seen, in time order.</summary>
    public int[] Visits { get; }

    public int SubjectCount => _subjects.Count;

    private int M => Visits.Length;

    /// <summary>Adds one subject, its rows in the order of <see cref="Visits"/>.</summary>
    public void Add(int[] rows, Matrix<double> x, double[] y)
    {
        var p = _p;
        var xr = rows.Select(r => x.Row(r).ToArray()).ToArray();
        _subjects.Add(rows);
        _subjectX.Add(xr);
        // Design rows are mostly zeros (one visit's indicators among many), so only non-zero cells are visited.
        var nonZero = xr.Select(row => Enumerable.Range(0, p).Where(u => row[u] != 0).ToArray()).ToArray();
        for (var a = 0; a < M; a++)
        {
            for (var b = a; b < M; b++)
            {
                var xx = _xx[a * M + b];
                var xy = _xy[a * M + b];
                var xa = xr[a];
                var xb = xr[b];
                foreach (var u in nonZero[a])
                {
                    xy[u] += xa[u] * y[rows[b]];
                    foreach (var v in nonZero[b])
                    {
                        xx[u * p + v] += xa[u] * xb[v];
                        if (a != b)
                        {
                            xx[v * p + u] += xa[u] * xb[v];
                        }
                    }
                }
                if (a != b)
                {
                    foreach (var u in nonZero[b])
                    {
                        xy[u] += xb[u] * y[rows[a]];
                    }
                }
            }
        }
    }

    /// <summary>The rows and columns of a T x T matrix at this pattern's visits.</summary>
    public Matrix<double> Sub(Matrix<double> full) => Matrix<double>.Build.Dense(M, M, (a, b) => full[Visits[a], Visits[b]]);

    /// <summary>target += sum_i X_i' C X_i for symmetric C (only C_ab with a &lt;= b is read).</summary>
    public void ContractXX(Matrix<double> c, double[] target)
    {
        for (var a = 0; a < M; a++)
        {
            for (var b = a; b < M; b++)
            {
                var w = c[a, b];
                if (w == 0)
                {
                    continue;
                }
                var s = _xx[a * M + b];
                for (var u = 0; u < s.Length; u++)
                {
                    target[u] += w * s[u];
                }
            }
        }
    }

    /// <summary>target += sum_i X_i' C y_i for symmetric C.</summary>
    public void ContractXY(Matrix<double> c, double[] target)
    {
        for (var a = 0; a < M; a++)
        {
            for (var b = a; b < M; b++)
            {
                var w = c[a, b];
                var s = _xy[a * M + b];
                for (var u = 0; u < s.Length; u++)
                {
                    target[u] += w * s[u];
                }
            }
        }
    }

    /// <summary>sum_i r_i r_i' (m x m) for the residual vector of all records.</summary>
    public Matrix<double> ResidualProducts(Vector<double> residuals)
    {
        var s = Matrix<double>.Build.Dense(M, M);
        foreach (var rows in _subjects)
        {
            for (var a = 0; a < M; a++)
            {
                for (var b = 0; b < M; b++)
                {
                    s[a, b] += residuals[rows[a]] * residuals[rows[b]];
                }
            }
        }
        return s;
    }

    /// <summary>tr(Phi S_ab) for a &lt;= b (stored at a*m + b).</summary>
    public double[] PhiTraces(Matrix<double> phi)
    {
        var t = new double[M * M];
        var p = _p;
        for (var a = 0; a < M; a++)
        {
            for (var b = a; b < M; b++)
            {
                var s = _xx[a * M + b];
                var sum = 0.0;
                for (var u = 0; u < p; u++)
                {
                    for (var v = 0; v < p; v++)
                    {
                        sum += phi[v, u] * s[u * p + v];
                    }
                }
                t[a * M + b] = sum;
            }
        }
        return t;
    }

    /// <summary>
    /// The m x m symmetric matrix T with T_ab = tr(Phi sum_i x_ia x_ib'), so that sum_ab C_ab T_ab =
    /// <see cref="ContractTraces"/>(C) = tr(C T) for any C.
    /// </summary>
    public Matrix<double> PhiTraceMatrix(double[] phiTraces) =>
        Matrix<double>.Build.Dense(M, M, (a, b) => a == b ? phiTraces[a * M + a] : 0.5 * phiTraces[Math.Min(a, b) * M + Math.Max(a, b)]);

    /// <summary>sum_ab C_ab tr(Phi sum_i x_ia x_ib') for any C, from <see cref="PhiTraces"/>.</summary>
    public double ContractTraces(Matrix<double> c, double[] phiTraces)
    {
        var sum = 0.0;
        for (var a = 0; a < M; a++)
        {
            sum += c[a, a] * phiTraces[a * M + a];
            for (var b = a + 1; b < M; b++)
            {
                sum += 0.5 * (c[a, b] + c[b, a]) * phiTraces[a * M + b];
            }
        }
        return sum;
    }

    /// <summary>sum_i x_ia r_ib for every pair of visit positions (a, b), stored at a*m + b.</summary>
    public double[][] CrossResiduals(Vector<double> residuals)
    {
        var p = _p;
        var result = new double[M * M][];
        for (var i = 0; i < result.Length; i++)
        {
            result[i] = new double[p];
        }
        for (var i = 0; i < _subjects.Count; i++)
        {
            var rows = _subjects[i];
            var xr = _subjectX[i];
            for (var a = 0; a < M; a++)
            {
                for (var b = 0; b < M; b++)
                {
                    var r = residuals[rows[b]];
                    var target = result[a * M + b];
                    var xa = xr[a];
                    for (var u = 0; u < p; u++)
                    {
                        target[u] += xa[u] * r;
                    }
                }
            }
        }
        return result;
    }

    /// <summary>target += sum_i X_i' C r_i = sum_ab C_ab sum_i x_ia r_ib.</summary>
    public void ContractCross(Matrix<double> c, double[][] crossResiduals, double[] target)
    {
        for (var a = 0; a < M; a++)
        {
            for (var b = 0; b < M; b++)
            {
                var w = c[a, b];
                var s = crossResiduals[a * M + b];
                for (var u = 0; u < s.Length; u++)
                {
                    target[u] += w * s[u];
                }
            }
        }
    }
}
