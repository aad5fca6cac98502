using MathNet.Numerics.LinearAlgebra;
using OutputForge.Stats.Survival;

namespace OutputForge.Stats.Models;

/// <summary>
/// The log partial likelihood of a (stratified) Cox model, with its score vector and observed
/// information matrix, for Newton-Raphson. Efron's approximation for d tied events with risk-set sums
/// S0, S1, S2 and tied-set sums T0, T1, T2 uses, for r = 0..d-1, the weight w = r/d in
/// log(S0 - w T0), with Breslow's w = 0 (Therneau and Grambsch, Modeling Survival Data, 2000, section 3.3).
/// </summary>
internal sealed class CoxPartialLikelihood
{
    private readonly SurvivalData _data;
    private readonly Matrix<double> _x;
    private readonly CoxTies _ties;
    private readonly List<List<int>> _strata;

    /// <summary>The covariates of observation i at i p .. i p + p - 1 (row-major), for the sums over the risk sets.</summary>
    private readonly double[] _rows;

    public CoxPartialLikelihood(SurvivalData data, Matrix<double> x, CoxTies ties, IReadOnlyList<int>? stratum)
    {
        _data = data;
        _x = x;
        _ties = ties;
        _rows = new double[x.RowCount * x.ColumnCount];
        for (var i = 0; i < x.RowCount; i++)
        {
            for (var a = 0; a < x.ColumnCount; a++)
            {
                _rows[i * x.ColumnCount + a] = x[i, a];
            }
        }
        // Within a stratum, observations in decreasing time so that the risk set grows as we walk.
        _strata = Enumerable.Range(0, data.Count)
            .GroupBy(i => stratum?[i] ?? 0)
            .OrderBy(g => g.Key)
            .Select(g => g.OrderByDescending(i => data.Times[i]).ToList())
            .ToList();
    }

    public sealed record Evaluation(double LogLikelihood, Vector<double> Score, Matrix<double> Information);

    /// <summary>
    /// The sums are kept in plain arrays rather than MathNet vectors and matrices, which allocated a new vector or
    /// matrix for every observation. Each element is computed by the same operations in the same order as the
    /// vector form (s1 + risk x, s2 + risk (x x'), a2 / a0 as a2 times 1 / a0, as MathNet divides a matrix), so the
    /// results are the same to the last bit.
    /// </summary>
    public Evaluation Evaluate(Vector<double> beta)
    {
        var p = beta.Count;
        var eta = _x * beta;
        var loglik = 0.0;
        var score = new double[p];
        var information = new double[p, p];
        var s1 = new double[p];
        var s2 = new double[p, p];
        var t1 = new double[p];
        var t2 = new double[p, p];
        var mean = new double[p];
        var tied = new List<int>();
        foreach (var rows in _strata)
        {
            var s0 = 0.0;
            Array.Clear(s1);
            Array.Clear(s2);
            var position = 0;
            while (position < rows.Count)
            {
                var time = _data.Times[rows[position]];
                tied.Clear();
                while (position < rows.Count && _data.Times[rows[position]] == time)
                {
                    var i = rows[position++];
                    var risk = Math.Exp(eta[i]);
                    s0 += risk;
                    AddWeighted(s1, s2, risk, i);
                    if (_data.Events[i])
                    {
                        tied.Add(i);
                    }
                }
                if (tied.Count == 0)
                {
                    continue;
                }
                var t0 = 0.0;
                Array.Clear(t1);
                Array.Clear(t2);
                foreach (var i in tied)
                {
                    var risk = Math.Exp(eta[i]);
                    loglik += eta[i];
                    for (var a = 0; a < p; a++)
                    {
                        score[a] += _rows[i * p + a];
                    }
                    t0 += risk;
                    AddWeighted(t1, t2, risk, i);
                }
                var d = tied.Count;
                for (var r = 0; r < d; r++)
                {
                    var w = _ties == CoxTies.Efron ? (double)r / d : 0.0;
                    var a0 = s0 - w * t0;
                    var reciprocal = 1.0 / a0;
                    for (var a = 0; a < p; a++)
                    {
                        mean[a] = Less(s1[a], w, t1[a]) / a0;
                    }
                    loglik -= Math.Log(a0);
                    for (var a = 0; a < p; a++)
                    {
                        score[a] -= mean[a];
                        for (var b = 0; b < p; b++)
                        {
                            information[a, b] += Less(s2[a, b], w, t2[a, b]) * reciprocal - mean[a] * mean[b];
                        }
                    }
                }
            }
        }
        return new Evaluation(loglik, Vector<double>.Build.Dense(score), Matrix<double>.Build.DenseOfArray(information));
    }

    /// <summary>
    /// sum - w tied, where MathNet's scaling by w = 0 gives exact zeros (and so the sum itself, even when the tied
    /// sum is infinite after an overflowing Newton step).
    /// </summary>
    private static double Less(double sum, double w, double tied) => w == 0 ? sum : sum - w * tied;

    /// <summary>sum1 + risk x_i and sum2 + risk (x_i x_i'), element by element.</summary>
    private void AddWeighted(double[] sum1, double[,] sum2, double risk, int i)
    {
        var p = sum1.Length;
        var row = i * p;
        for (var a = 0; a < p; a++)
        {
            var xa = _rows[row + a];
            sum1[a] += risk * xa;
            for (var b = 0; b < p; b++)
            {
                sum2[a, b] += risk * (xa * _rows[row + b]);
            }
        }
    }
}
