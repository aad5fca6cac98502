using MathNet.Numerics.LinearAlgebra;

namespace OutputForge.Stats;

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

    public CoxPartialLikelihood(SurvivalData data, Matrix<double> x, CoxTies ties, IReadOnlyList<int>? stratum)
    {
        _data = data;
        _x = x;
        _ties = ties;
        // Within a stratum, observations in decreasing time so that the risk set grows as we walk.
        _strata = Enumerable.Range(0, data.Count)
            .GroupBy(i => stratum?[i] ?? 0)
            .OrderBy(g => g.Key)
            .Select(g => g.OrderByDescending(i => data.Times[i]).ToList())
            .ToList();
    }

    public sealed record Evaluation(double LogLikelihood, Vector<double> Score, Matrix<double> Information);

    public Evaluation Evaluate(Vector<double> beta)
    {
        var p = beta.Count;
        var eta = _x * beta;
        var loglik = 0.0;
        var score = Vector<double>.Build.Dense(p);
        var information = Matrix<double>.Build.Dense(p, p);
        foreach (var rows in _strata)
        {
            var s0 = 0.0;
            var s1 = Vector<double>.Build.Dense(p);
            var s2 = Matrix<double>.Build.Dense(p, p);
            var position = 0;
            while (position < rows.Count)
            {
                var time = _data.Times[rows[position]];
                var tied = new List<int>();
                while (position < rows.Count && _data.Times[rows[position]] == time)
                {
                    var i = rows[position++];
                    var risk = Math.Exp(eta[i]);
                    var xi = _x.Row(i);
                    s0 += risk;
                    s1 += risk * xi;
                    s2 += risk * xi.OuterProduct(xi);
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
                var t1 = Vector<double>.Build.Dense(p);
                var t2 = Matrix<double>.Build.Dense(p, p);
                foreach (var i in tied)
                {
                    var risk = Math.Exp(eta[i]);
                    var xi = _x.Row(i);
                    loglik += eta[i];
                    score += xi;
                    t0 += risk;
                    t1 += risk * xi;
                    t2 += risk * xi.OuterProduct(xi);
                }
                var d = tied.Count;
                for (var r = 0; r < d; r++)
                {
                    var w = _ties == CoxTies.Efron ? (double)r / d : 0.0;
                    var a0 = s0 - w * t0;
                    var a1 = s1 - w * t1;
                    var a2 = s2 - w * t2;
                    var mean = a1 / a0;
                    loglik -= Math.Log(a0);
                    score -= mean;
                    information += a2 / a0 - mean.OuterProduct(mean);
                }
            }
        }
        return new Evaluation(loglik, score, information);
    }
}
