using MathNet.Numerics;

namespace OutputForge.Stats.Exact;

/// <summary>
/// Two-sided p-value of Fisher's exact test for a 2 x c (or r x 2) table, exact, by the network
/// algorithm of Mehta and Patel (1983, JASA 78:427-434) specialised to two rows, where a node is a
/// single number: how much of the first row total is still to be placed.
/// <para>
/// With x_j the first-row count of column j, V = sum_j g_j(x_j) with g_j(x) = -log x! - log (C_j - x)!,
/// and P(table) = exp(K + V). Each g_j is concave, which gives three exact shortcuts:
/// (1) the largest V any completion can add is the sum of the largest increments g_j(x + 1) - g_j(x)
/// over the remaining columns (greedy allocation is optimal for a separable concave objective under
/// a sum constraint; Ibaraki and Katoh 1988, Resource Allocation Problems, ch. 4), so "every completion
/// is no more probable than the observed table" is decided without enumeration;
/// (2) the sum of exp(V) over all completions is the binomial identity sum prod C(C_j, x_j) = C(S, t),
/// so such a sub-network is added in closed form;
/// (3) when two columns remain, V is a concave (unimodal) function of one count, so the completions
/// no more probable than a limit are its two tails, found by binary search on each side of the mode
/// and summed from running log-sums: no sorting and no cancellation (each tail is summed directly).
/// </para>
/// <para>
/// The smallest V a completion can add is bounded below by -sum log C_j! (every g_j is at least
/// g_j(0) = g_j(C_j)); a looser bound only means fewer paths are dropped early, never a different
/// result. Decisions use a margin of 1e-9 on the bounds so that rounding in the running sums can
/// only delay a decision. Work is bounded by <see cref="FisherNetworkEnumeration.WorkLimit"/> steps
/// and memory by <see cref="IncrementLimit"/>.
/// </para>
/// </summary>
internal sealed class FisherTwoRowEnumeration
{
    private const double LogTolerance = 1e-7;
    private const double BoundMargin = 1e-9;

    /// <summary>
    /// The largest-completion tables hold one increment per unit of every remaining column total, for
    /// each stage: beyond this many in all (n x (c - 2)) the table is refused before any allocation.
    /// </summary>
    internal const long IncrementLimit = 100_000_000;

    private readonly int[] _columns;
    private readonly double[] _logFactorial;
    private readonly int[] _suffixTotals;
    private long _work;

    private FisherTwoRowEnumeration(int[] columns, double[] logFactorial)
    {
        _columns = columns;
        _logFactorial = logFactorial;
        _suffixTotals = new int[columns.Length + 1];
        for (int j = columns.Length - 1; j >= 0; j--)
        {
            _suffixTotals[j] = _suffixTotals[j + 1] + columns[j];
        }
    }

    /// <summary>The p-value of a table with exactly two rows or two columns (at least 2 x 3), or null when the work limit was reached.</summary>
    public static double? PValue(int[,] table)
    {
        int[,] oriented = table.GetLength(0) == 2 ? table : Transpose(table);
        int c = oriented.GetLength(1);
        // The first row is the one with the smaller total (fewer nodes); the columns go in increasing
        // order of their totals so that the two largest are settled by the unimodal tails.
        int first = Enumerable.Range(0, c).Sum(j => oriented[0, j]) <= Enumerable.Range(0, c).Sum(j => oriented[1, j]) ? 0 : 1;
        int[] order = Enumerable.Range(0, c).OrderBy(j => oriented[0, j] + oriented[1, j]).ToArray();
        int[] columns = order.Select(j => oriented[0, j] + oriented[1, j]).ToArray();
        int[] observedFirst = order.Select(j => oriented[first, j]).ToArray();
        long n = columns.Sum(v => (long)v);
        if (n * (c - 2) > IncrementLimit)
        {
            return null;
        }
        int rowTotal = observedFirst.Sum();
        var logFactorial = new double[(int)n + 1];
        for (int k = 0; k <= n; k++)
        {
            logFactorial[k] = SpecialFunctions.FactorialLn(k);
        }
        var network = new FisherTwoRowEnumeration(columns, logFactorial);
        double observed = 0;
        for (int j = 0; j < c; j++)
        {
            observed += network.Cell(j, observedFirst[j]);
        }
        double constant = logFactorial[rowTotal] + logFactorial[(int)n - rowTotal] + columns.Sum(v => logFactorial[v]) - logFactorial[(int)n];
        return network.Enumerate(rowTotal, observed + LogTolerance, constant);
    }

    /// <summary>g_j(x) = -log x! - log (C_j - x)!: the part of V contributed by column j.</summary>
    private double Cell(int column, int x) => -_logFactorial[x] - _logFactorial[_columns[column] - x];

    private double? Enumerate(int rowTotal, double threshold, double constant)
    {
        int terminal = _columns.Length - 2;
        var largest = new double[terminal + 1][];
        for (int stage = 1; stage <= terminal; stage++)
        {
            largest[stage] = LargestCompletions(stage, Math.Min(rowTotal, _suffixTotals[stage]));
        }
        var current = new Dictionary<int, FisherPastValues> { [rowTotal] = FisherPastValues.Start() };
        double pValue = 0;
        for (int stage = 0; stage < terminal; stage++)
        {
            var next = new Dictionary<int, FisherValueCollector>();
            double smallestAfter = SmallestCompletion(stage + 1);
            foreach (var (left, pasts) in current)
            {
                int low = Math.Max(0, left - _suffixTotals[stage + 1]);
                int high = Math.Min(_columns[stage], left);
                for (int x = low; x <= high; x++)
                {
                    double step = Cell(stage, x);
                    int child = left - x;
                    double whole = threshold - step - largest[stage + 1][child] - BoundMargin;
                    double open = threshold - step - smallestAfter + BoundMargin;
                    int counted = pasts.CountAtMost(whole);
                    if (counted > 0)
                    {
                        pValue += Math.Exp(constant + step + LogCompletionTotal(stage + 1, child) + pasts.LogPrefix[counted]);
                    }
                    int carried = pasts.CountAtMost(open);
                    if (carried > counted)
                    {
                        if (!next.TryGetValue(child, out var childPaths))
                        {
                            childPaths = new FisherValueCollector(carried - counted);
                            next[child] = childPaths;
                        }
                        for (int i = counted; i < carried; i++)
                        {
                            childPaths.Add(pasts.Values[i] + step, pasts.Counts[i]);
                        }
                        _work += carried - counted;
                    }
                    if (++_work > FisherNetworkEnumeration.WorkLimit)
                    {
                        return null;
                    }
                }
            }
            current = next.ToDictionary(entry => entry.Key, entry => entry.Value.ToPastValues());
        }
        foreach (var (left, pasts) in current)
        {
            pValue += SettleLastTwoColumns(left, pasts, threshold, constant);
            _work += pasts.Values.Length + _columns[terminal];
            if (_work > FisherNetworkEnumeration.WorkLimit)
            {
                return null;
            }
        }
        return Math.Min(1, pValue);
    }

    /// <summary>
    /// The contribution of the past paths of a node with two columns left. With y the first-row count
    /// of the second-to-last column, h(y) = g(y) + g'(left - y) is concave, so {y : h(y) &lt;= limit} is a
    /// prefix and a suffix of the feasible range, whose sums come from running log-sums from each end.
    /// </summary>
    private double SettleLastTwoColumns(int left, FisherPastValues pasts, double threshold, double constant)
    {
        int a = _columns.Length - 2;
        int low = Math.Max(0, left - _columns[a + 1]);
        int high = Math.Min(_columns[a], left);
        int size = high - low + 1;
        var values = new double[size];
        int mode = 0;
        for (int k = 0; k < size; k++)
        {
            values[k] = Cell(a, low + k) + Cell(a + 1, left - low - k);
            if (values[k] > values[mode])
            {
                mode = k;
            }
        }
        var logPrefix = new double[size + 1];
        logPrefix[0] = double.NegativeInfinity;
        for (int k = 0; k < size; k++)
        {
            logPrefix[k + 1] = FisherPastValues.LogAdd(logPrefix[k], values[k]);
        }
        var logSuffix = new double[size + 1];
        logSuffix[size] = double.NegativeInfinity;
        for (int k = size - 1; k >= 0; k--)
        {
            logSuffix[k] = FisherPastValues.LogAdd(logSuffix[k + 1], values[k]);
        }
        double total = 0;
        for (int i = 0; i < pasts.Values.Length; i++)
        {
            double limit = threshold - pasts.Values[i];
            double logSum;
            if (values[mode] <= limit)
            {
                logSum = logPrefix[size];
            }
            else
            {
                // values[0..mode] increase (ties allowed), values[mode..] decrease.
                int before = FirstAbove(values, 0, mode, limit);
                int after = LastAbove(values, mode, size - 1, limit);
                logSum = FisherPastValues.LogAdd(logPrefix[before], logSuffix[after + 1]);
            }
            if (!double.IsNegativeInfinity(logSum))
            {
                total += pasts.Counts[i] * Math.Exp(constant + pasts.Values[i] + logSum);
            }
        }
        return total;
    }

    /// <summary>First index in [from, to] of a non-decreasing run whose value exceeds limit (values[to] does).</summary>
    private static int FirstAbove(double[] values, int from, int to, double limit)
    {
        while (from < to)
        {
            int mid = (from + to) >>> 1;
            if (values[mid] > limit)
            {
                to = mid;
            }
            else
            {
                from = mid + 1;
            }
        }
        return from;
    }

    /// <summary>Last index in [from, to] of a non-increasing run whose value exceeds limit (values[from] does).</summary>
    private static int LastAbove(double[] values, int from, int to, double limit)
    {
        while (from < to)
        {
            int mid = (from + to + 1) >>> 1;
            if (values[mid] > limit)
            {
                from = mid;
            }
            else
            {
                to = mid - 1;
            }
        }
        return from;
    }

    /// <summary>
    /// For each t up to <paramref name="maxLeft"/>, the largest V that columns stage.. can add when t
    /// of the first row is left: the sum of g_j(0) plus the t largest increments (greedy optimum).
    /// </summary>
    private double[] LargestCompletions(int stage, int maxLeft)
    {
        var increments = new List<double>();
        double start = 0;
        for (int j = stage; j < _columns.Length; j++)
        {
            start += Cell(j, 0);
            for (int x = 0; x < _columns[j]; x++)
            {
                increments.Add(Cell(j, x + 1) - Cell(j, x));
            }
            _work += _columns[j];
        }
        var sorted = increments.ToArray();
        Array.Sort(sorted);
        Array.Reverse(sorted);
        var result = new double[maxLeft + 1];
        result[0] = start;
        for (int t = 1; t <= maxLeft; t++)
        {
            result[t] = result[t - 1] + sorted[t - 1];
        }
        return result;
    }

    /// <summary>A lower bound on the V columns stage.. can add: -sum log C_j! (each g_j is at least that).</summary>
    private double SmallestCompletion(int stage)
    {
        double value = 0;
        for (int j = stage; j < _columns.Length; j++)
        {
            value -= _logFactorial[_columns[j]];
        }
        return value;
    }

    /// <summary>log of the sum of exp(V) over all completions: log S! - log t! - log (S - t)! - sum log C_j!.</summary>
    private double LogCompletionTotal(int stage, int left)
    {
        int remaining = _suffixTotals[stage];
        return _logFactorial[remaining] - _logFactorial[left] - _logFactorial[remaining - left] + SmallestCompletion(stage);
    }

    private static int[,] Transpose(int[,] table)
    {
        var transposed = new int[table.GetLength(1), table.GetLength(0)];
        for (int i = 0; i < table.GetLength(0); i++)
        {
            for (int j = 0; j < table.GetLength(1); j++)
            {
                transposed[j, i] = table[i, j];
            }
        }
        return transposed;
    }
}
