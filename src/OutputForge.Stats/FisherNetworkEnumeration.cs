using MathNet.Numerics;

namespace OutputForge.Stats;

/// <summary>
/// Two-sided p-value of Fisher's exact test for an r x c table by the network algorithm of Mehta and
/// Patel (1983), JASA 78:427-434 (also Mehta and Patel 1986, ACM TOMS 12:154-161, the FEXACT code
/// used by R's fisher.test).
/// <para>
/// With fixed margins, P(table) = exp(K + V) where K = sum log R_i! + sum log C_j! - log N! and
/// V = -sum log n_ij!. The table is built column by column; a node of the network is the stage (how
/// many columns are filled) and the multiset of row totals still to be filled, so paths that reach
/// the same node merge. For each node the largest and smallest V that any completion can add, and
/// the log of the sum of exp(V) over all completions (log (N'! / (prod R'_i! prod C'_j!))), are
/// known exactly, the first two by dynamic programming over the remaining columns. A partial path
/// with past value P is then counted whole when P + largest completion is at most the observed V (all
/// its completions are no more probable than the observed table), dropped when P + smallest
/// completion exceeds it, and extended only otherwise. The past values of a node are kept sorted with
/// running log-sums, so that the counted and dropped ones are found by binary search and only the
/// undecided ones are carried; the last two or three columns are not enumerated path by path: the
/// completions of each node are listed once, sorted, and every past value is settled by binary search.
/// </para>
/// <para>
/// "No more probable" allows a tolerance of 1e-7 on the log scale, the relative tolerance R's
/// fisher.test applies to 2 x 2 tables (FEXACT uses 3.45e-7); past values that agree to 1e-10 are
/// merged. The work is bounded: beyond <see cref="WorkLimit"/> steps, or when one column could be split
/// over the rows in more than <see cref="SplitLimit"/> ways, the enumeration stops and reports that the
/// table is too large rather than running on (or approximating).
/// </para>
/// </summary>
internal sealed class FisherNetworkEnumeration
{
    internal const long WorkLimit = 1_000_000_000;
    internal const double SplitLimit = 5_000_000;

    /// <summary>
    /// Tables whose <see cref="NetworkSizeBound"/> exceeds this are refused before any work, since the
    /// exact bounds alone would need that many steps; it is ten times <see cref="WorkLimit"/> because
    /// the margin-based count is an overestimate (it ignores that sorted row totals merge).
    /// </summary>
    internal const double NetworkSizeLimit = 1e10;
    private const double LogTolerance = 1e-7;

    private readonly int[] _columnTotals;
    private readonly double[] _logFactorial;
    private readonly Dictionary<NodeKey, (double Max, double Min)>[] _bounds;
    private long _work;

    private FisherNetworkEnumeration(int[] columnTotals, int n)
    {
        _columnTotals = columnTotals;
        _logFactorial = new double[n + 1];
        for (int k = 0; k <= n; k++)
        {
            _logFactorial[k] = SpecialFunctions.FactorialLn(k);
        }
        _bounds = Enumerable.Range(0, columnTotals.Length).Select(_ => new Dictionary<NodeKey, (double, double)>()).ToArray();
    }

    /// <summary>The p-value, or null when the work limit was reached.</summary>
    public static double? PValue(int[,] table)
    {
        // The shorter dimension becomes the state (rows), the longer one the stages (columns). The
        // columns go in increasing order of their totals, so that the two largest are the last two,
        // which are settled by binary search instead of being enumerated path by path.
        int[,] oriented = table.GetLength(0) <= table.GetLength(1) ? table : Transpose(table);
        int r = oriented.GetLength(0);
        int c = oriented.GetLength(1);
        int[] rowTotals = TableMargins.RowTotals(oriented).Select(v => (int)v).ToArray();
        int[] columnOrder = Enumerable.Range(0, c).OrderBy(j => Enumerable.Range(0, r).Sum(i => oriented[i, j])).ToArray();
        int[] columnTotals = columnOrder.Select(j => Enumerable.Range(0, r).Sum(i => oriented[i, j])).ToArray();
        int n = rowTotals.Sum();
        var network = new FisherNetworkEnumeration(columnTotals, n) { RowCount = r };

        double observed = 0;
        for (int i = 0; i < r; i++)
        {
            for (int j = 0; j < c; j++)
            {
                observed -= network._logFactorial[oriented[i, j]];
            }
        }
        double constant = rowTotals.Sum(v => network._logFactorial[v]) + columnTotals.Sum(v => network._logFactorial[v]) - network._logFactorial[n];
        try
        {
            // Splits of a column are listed one node at a time; a column with more than SplitLimit
            // possible splits makes the table too large before any such list is built.
            if (columnTotals.Any(total => SplitCount(total, r) > SplitLimit) || NetworkSizeBound(rowTotals, columnTotals) > NetworkSizeLimit)
            {
                return null;
            }
            return network.Enumerate(rowTotals, observed + LogTolerance, constant);
        }
        catch (WorkLimitReachedException)
        {
            return null;
        }
    }

    private double? Enumerate(int[] rowTotals, double threshold, double constant)
    {
        int stages = _columnTotals.Length;
        int terminal = TerminalStage();
        var root = NodeKey.Of(rowTotals);
        var (rootMax, rootMin) = Bounds(0, root);
        if (rootMax <= threshold)
        {
            return 1;
        }
        if (rootMin > threshold)
        {
            return 0;
        }
        var current = new Dictionary<NodeKey, Dictionary<long, PastEntry>> { [root] = FisherPastValues.Start() };
        double pValue = 0;
        for (int stage = 0; stage < terminal; stage++)
        {
            var next = new Dictionary<NodeKey, Dictionary<long, PastEntry>>();
            foreach (var (node, paths) in current)
            {
                var pasts = FisherPastValues.Of(paths);
                foreach (var allocation in Allocations(node.Totals, _columnTotals[stage]))
                {
                    var (step, child) = Step(node, allocation);
                    var (maxFuture, minFuture) = Bounds(stage + 1, child);
                    // Past values up to `whole` complete only into tables no more probable than the
                    // observed one: their total is added at once. Those above `open` can never
                    // qualify. Only the ones in between are carried to the child node.
                    double whole = threshold - step - maxFuture;
                    double open = threshold - step - minFuture;
                    int counted = pasts.CountAtMost(whole);
                    if (counted > 0)
                    {
                        pValue += Math.Exp(constant + step + LogCompletionCount(stage + 1, child.Totals) + pasts.LogPrefix[counted]);
                    }
                    int carried = pasts.CountAtMost(open);
                    if (carried > counted)
                    {
                        if (!next.TryGetValue(child, out var childPaths))
                        {
                            childPaths = new Dictionary<long, PastEntry>();
                            next[child] = childPaths;
                        }
                        for (int i = counted; i < carried; i++)
                        {
                            FisherPastValues.Add(childPaths, pasts.Values[i] + step, pasts.Counts[i]);
                        }
                        _work += carried - counted;
                    }
                    _work++;
                    if (_work > WorkLimit)
                    {
                        return null;
                    }
                }
            }
            current = next;
        }

        // The remaining columns are few enough that every completion of a node can be listed: with the
        // completion values sorted and their running log-sums, each past path is settled by binary search.
        foreach (var (node, paths) in current)
        {
            var (values, logPrefix) = Completions(terminal, node);
            foreach (var (past, count) in paths.Values)
            {
                int included = FisherPastValues.UpperBound(values, threshold - past);
                if (included > 0)
                {
                    pValue += count * Math.Exp(constant + past + logPrefix[included]);
                }
            }
            _work += paths.Count + values.Length;
            if (_work > WorkLimit)
            {
                return null;
            }
        }
        return Math.Min(1, pValue);
    }

    /// <summary>
    /// The stage from which completions are listed outright: the last three columns when their free
    /// splits number at most a million (the last column is forced), otherwise the last two.
    /// </summary>
    private int TerminalStage()
    {
        int stages = _columnTotals.Length;
        if (stages < 3)
        {
            return stages - 2;
        }
        double splits = SplitCount(_columnTotals[stages - 3], RowCount) * SplitCount(_columnTotals[stages - 2], RowCount);
        return splits <= 1e6 ? stages - 3 : stages - 2;
    }

    private int RowCount { get; set; }

    /// <summary>
    /// An upper bound, from the margins alone, on the number of (node, column split) pairs the exact
    /// bounds must visit: per stage, the nodes (remaining row totals, each between what the columns
    /// already placed and still to place allow) times the splits of the stage's column.
    /// </summary>
    internal static double NetworkSizeBound(int[] rowTotals, int[] columnTotals)
    {
        int n = rowTotals.Sum();
        int r = rowTotals.Length;
        double size = 0;
        int placed = 0;
        foreach (int column in columnTotals)
        {
            int left = n - placed;
            var ranges = rowTotals.Select(total => (double)Math.Min(total, left) - Math.Max(0, total - placed) + 1).Order().Take(r - 1);
            double nodes = Math.Min(ranges.Aggregate(1.0, (product, range) => product * range), SplitCount(left, r));
            double splits = Math.Min(rowTotals.Select(total => (double)Math.Min(total, column) + 1).Order().Take(r - 1).Aggregate(1.0, (product, range) => product * range), SplitCount(column, r));
            size += nodes * splits;
            placed += column;
        }
        return size;
    }

    /// <summary>Number of ways to split a total over r rows ignoring capacities: C(total + r - 1, r - 1).</summary>
    private static double SplitCount(int total, int rows) => SpecialFunctions.Binomial(total + rows - 1, rows - 1);

    /// <summary>Sorted completion values of a node from <paramref name="stage"/> on, with running log-sums.</summary>
    private (double[] Values, double[] LogPrefix) Completions(int stage, NodeKey node)
    {
        var values = new List<double>();
        Collect(stage, node.Totals, 0);
        var sorted = values.ToArray();
        Array.Sort(sorted);
        var logPrefix = new double[sorted.Length + 1];
        logPrefix[0] = double.NegativeInfinity;
        for (int k = 0; k < sorted.Length; k++)
        {
            logPrefix[k + 1] = FisherPastValues.LogAdd(logPrefix[k], sorted[k]);
        }
        return (sorted, logPrefix);

        void Collect(int at, int[] totals, double sofar)
        {
            if (at == _columnTotals.Length - 1)
            {
                double last = sofar;
                foreach (int t in totals)
                {
                    last -= _logFactorial[t];
                }
                values.Add(last);
                return;
            }
            foreach (var allocation in Allocations(totals, _columnTotals[at]))
            {
                double step = 0;
                var remaining = new int[totals.Length];
                for (int i = 0; i < remaining.Length; i++)
                {
                    step -= _logFactorial[allocation[i]];
                    remaining[i] = totals[i] - allocation[i];
                }
                Collect(at + 1, remaining, sofar + step);
            }
        }
    }

    private (double Step, NodeKey Child) Step(NodeKey node, int[] allocation)
    {
        double step = 0;
        var remaining = new int[node.Totals.Length];
        for (int i = 0; i < remaining.Length; i++)
        {
            step -= _logFactorial[allocation[i]];
            remaining[i] = node.Totals[i] - allocation[i];
        }
        return (step, NodeKey.Of(remaining));
    }

    /// <summary>log of the sum over completions of exp(V): log N'! - sum log R'_i! - sum log C'_j!.</summary>
    private double LogCompletionCount(int stage, int[] totals)
    {
        int remaining = totals.Sum();
        double value = _logFactorial[remaining];
        foreach (int t in totals)
        {
            value -= _logFactorial[t];
        }
        for (int j = stage; j < _columnTotals.Length; j++)
        {
            value -= _logFactorial[_columnTotals[j]];
        }
        return value;
    }

    /// <summary>Largest and smallest V that the columns from <paramref name="stage"/> on can add.</summary>
    private (double Max, double Min) Bounds(int stage, NodeKey node)
    {
        if (stage == _columnTotals.Length - 1)
        {
            double forced = -node.Totals.Sum(t => _logFactorial[t]);
            return (forced, forced);
        }
        if (_bounds[stage].TryGetValue(node, out var known))
        {
            return known;
        }
        double max = double.NegativeInfinity;
        double min = double.PositiveInfinity;
        foreach (var allocation in Allocations(node.Totals, _columnTotals[stage]))
        {
            var (step, child) = Step(node, allocation);
            var (childMax, childMin) = Bounds(stage + 1, child);
            max = Math.Max(max, step + childMax);
            min = Math.Min(min, step + childMin);
            if (++_work > WorkLimit)
            {
                throw new WorkLimitReachedException();
            }
        }
        _bounds[stage][node] = (max, min);
        return (max, min);
    }

    /// <summary>Every way to split a column total over the rows without exceeding their remaining totals.</summary>
    private List<int[]> Allocations(int[] capacities, int total)
    {
        var result = new List<int[]>();
        var suffixCapacity = new int[capacities.Length + 1];
        for (int i = capacities.Length - 1; i >= 0; i--)
        {
            suffixCapacity[i] = suffixCapacity[i + 1] + capacities[i];
        }
        var current = new int[capacities.Length];
        Fill(0, total);
        return result;

        void Fill(int row, int left)
        {
            if (row == capacities.Length - 1)
            {
                current[row] = left;
                result.Add((int[])current.Clone());
                if (++_work > WorkLimit)
                {
                    throw new WorkLimitReachedException();
                }
                return;
            }
            int lowest = Math.Max(0, left - suffixCapacity[row + 1]);
            int highest = Math.Min(capacities[row], left);
            for (int value = lowest; value <= highest; value++)
            {
                current[row] = value;
                Fill(row + 1, left - value);
            }
        }
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

    /// <summary>The multiset of remaining row totals, kept sorted so that row permutations merge.</summary>
    private sealed class NodeKey : IEquatable<NodeKey>
    {
        private readonly int _hash;

        private NodeKey(int[] totals)
        {
            Totals = totals;
            var hash = new HashCode();
            foreach (int t in totals)
            {
                hash.Add(t);
            }
            _hash = hash.ToHashCode();
        }

        public int[] Totals { get; }

        public static NodeKey Of(int[] totals)
        {
            var sorted = (int[])totals.Clone();
            Array.Sort(sorted);
            return new NodeKey(sorted);
        }

        public bool Equals(NodeKey? other) => other is not null && Totals.AsSpan().SequenceEqual(other.Totals);

        public override bool Equals(object? obj) => Equals(obj as NodeKey);

        public override int GetHashCode() => _hash;
    }

    /// <summary>Unwinds the bound recursion when the work limit is reached; never leaves this class.</summary>
    private sealed class WorkLimitReachedException : Exception;
}
