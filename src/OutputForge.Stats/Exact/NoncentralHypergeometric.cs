using MathNet.Numerics;

namespace OutputForge.Stats.Exact;

/// <summary>
/// Fisher's noncentral hypergeometric distribution of the first cell a of a 2 x 2 table given both
/// margins: P(a = u; theta) proportional to C(n1, u) C(n2, m - u) theta^u for u from
/// max(0, m - n2) to min(n1, m), where n1, n2 are the group sizes and m the total number of events
/// (Cornfield 1956, Proc. Third Berkeley Symp. 4:135-148; Agresti 2013, Categorical Data Analysis
/// 3rd ed., section 16.6). Probabilities are computed on the log scale and normalised with the
/// largest term, so extreme odds ratios neither overflow nor underflow the sums.
/// </summary>
internal sealed class NoncentralHypergeometric
{
    private readonly double[] _logWeights;

    public NoncentralHypergeometric(int n1, int n2, int events)
    {
        Lowest = Math.Max(0, events - n2);
        Highest = Math.Min(n1, events);
        _logWeights = new double[Highest - Lowest + 1];
        for (int u = Lowest; u <= Highest; u++)
        {
            _logWeights[u - Lowest] = SpecialFunctions.BinomialLn(n1, u) + SpecialFunctions.BinomialLn(n2, events - u);
        }
    }

    public int Lowest { get; }

    public int Highest { get; }

    /// <summary>The probabilities of Lowest..Highest at log odds ratio <paramref name="logTheta"/>.</summary>
    public double[] Probabilities(double logTheta)
    {
        var log = new double[_logWeights.Length];
        double maximum = double.NegativeInfinity;
        for (int k = 0; k < log.Length; k++)
        {
            log[k] = _logWeights[k] + logTheta * (Lowest + k);
            maximum = Math.Max(maximum, log[k]);
        }
        double total = 0;
        for (int k = 0; k < log.Length; k++)
        {
            log[k] = Math.Exp(log[k] - maximum);
            total += log[k];
        }
        for (int k = 0; k < log.Length; k++)
        {
            log[k] /= total;
        }
        return log;
    }

    /// <summary>E(a; theta), increasing in theta.</summary>
    public double Mean(double logTheta)
    {
        var p = Probabilities(logTheta);
        double mean = 0;
        for (int k = 0; k < p.Length; k++)
        {
            mean += (Lowest + k) * p[k];
        }
        return mean;
    }

    /// <summary>P(a &lt;= x; theta), decreasing in theta.</summary>
    public double AtMost(int x, double logTheta)
    {
        var p = Probabilities(logTheta);
        double sum = 0;
        for (int u = Lowest; u <= x; u++)
        {
            sum += p[u - Lowest];
        }
        return sum;
    }

    /// <summary>P(a &gt;= x; theta), increasing in theta.</summary>
    public double AtLeast(int x, double logTheta)
    {
        var p = Probabilities(logTheta);
        double sum = 0;
        for (int u = x; u <= Highest; u++)
        {
            sum += p[u - Lowest];
        }
        return sum;
    }
}
