using MathNet.Numerics;
using OutputForge.Stats.Contingency;

namespace OutputForge.Stats.Exact;

/// <summary>
/// Two-sided p-value of Fisher's exact test for an r x c table by the network algorithm of Mehta and
/// Patel (1983), JASA 78:427-434 (also Mehta and Patel 1986, ACM TOMS 12:154-161, the FEXACT code
/// used by R's fisher.test), run from both ends and joined in the middle.
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
/// undecided ones are carried.
/// </para>
/// <para>
/// The forward pass stops at a meeting stage three or four columns before the end
/// (<see cref="MeetingStage"/>). The last columns are then run backwards (<see cref="FisherBackwardPass"/>):
/// from the end, each node collects the distinct values of its completions, and a completion value is
/// counted whole or dropped against the largest and smallest past value (and the total mass) of the
/// undecided partial tables that can reach it, which are followed forward in summary from the meeting
/// stage. Each way of filling the meeting column is then joined with its child's kept completions in
/// one sweep over the two sorted lists (<see cref="FisherMeetingJoin"/>), instead of gathering the
/// carried values into lists. Every table is decided exactly once, in one of the two passes or at the join.
/// </para>
/// <para>
/// "No more probable" allows a tolerance of 1e-7 on the log scale, the relative tolerance R's
/// fisher.test applies to 2 x 2 tables (FEXACT uses 3.45e-7); values that agree to 1e-10 are
/// merged. Nodes of one stage are processed in parallel and their sums added in a fixed order, so the
/// result does not depend on the number of threads. The work is bounded: beyond <see cref="WorkLimit"/>
/// steps, or when one column could be split over the rows in more than <see cref="SplitLimit"/> ways,
/// the enumeration stops and reports that the table is too large rather than running on (or
/// approximating).
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
    private readonly Dictionary<FisherNodeKey, (double Max, double Min)>[] _bounds;
    private long _work;

    private FisherNetworkEnumeration(int[] columnTotals, int n)
    {
        _columnTotals = columnTotals;
        _logFactorial = new double[n + 1];
        for (int k = 0; k <= n; k++)
        {
            _logFactorial[k] = SpecialFunctions.FactorialLn(k);
        }
        _bounds = Enumerable.Range(0, columnTotals.Length).Select(_ => new Dictionary<FisherNodeKey, (double, double)>(FisherNodeKeyComparer.Instance)).ToArray();
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
        catch (AggregateException e) when (e.Flatten().InnerExceptions.All(inner => inner is WorkLimitReachedException))
        {
            // The bounds are all found before the parallel stages, so this is not expected; should a bound still be
            // computed inside one, its work limit must end in the same "too large" result, not an exception.
            return null;
        }
    }

    private double? Enumerate(int[] rowTotals, double threshold, double constant)
    {
        var root = FisherNodeKey.Of((int[])rowTotals.Clone());
        // The bounds of the root visit every node the network can reach, so that afterwards they are
        // only read, also from the parallel loops below.
        var (rootMax, rootMin) = Bounds(0, root);
        if (rootMax <= threshold)
        {
            return 1;
        }
        if (rootMin > threshold)
        {
            return 0;
        }
        int meet = MeetingStage();
        var nodes = new List<FisherNodeKey> { root };
        var pasts = new List<FisherPastValues> { FisherPastValues.Start() };
        double pValue = 0;
        for (int stage = 0; stage < meet && nodes.Count > 0; stage++)
        {
            var (counted, childNodes, childPasts) = ForwardStage(stage, nodes, pasts, threshold, constant);
            if (childNodes is null)
            {
                return null;
            }
            pValue += counted;
            nodes = childNodes;
            pasts = childPasts!;
        }
        if (nodes.Count == 0)
        {
            return Math.Min(1, pValue);
        }
        double? joined = new FisherBackwardPass(this, meet, threshold, constant).Settle(nodes, pasts);
        return joined is null ? null : Math.Min(1, pValue + joined.Value);
    }

    /// <summary>
    /// Every node's past values split, per way of filling column <paramref name="stage"/>, into those
    /// counted whole, those dropped and those carried to the child node: the probability counted whole
    /// and, per node, its carries.
    /// </summary>
    internal (double Counted, List<Carry>[] Carries) SplitMoves(int stage, List<FisherNodeKey> nodes, List<FisherPastValues> pasts, double threshold, double constant)
    {
        var counted = new double[nodes.Count];
        var carries = new List<Carry>[nodes.Count];
        Parallel.For(0, nodes.Count, p =>
        {
            var own = pasts[p];
            var list = new List<Carry>();
            double sum = 0;
            foreach (var (step, child) in Moves(nodes[p], stage))
            {
                var (maxFuture, minFuture) = Bounds(stage + 1, child);
                // Past values up to `whole` complete only into tables no more probable than the
                // observed one: their total is added at once. Those above `open` can never qualify.
                // Only the ones in between are carried to the child node.
                int whole = own.CountAtMost(threshold - step - maxFuture);
                int open = own.CountAtMost(threshold - step - minFuture);
                if (whole > 0)
                {
                    sum += Math.Exp(constant + step + LogCompletionCount(stage + 1, child.Totals) + own.LogPrefix[whole]);
                }
                if (open > whole)
                {
                    list.Add(new Carry(child, p, step, whole, open));
                }
            }
            counted[p] = sum;
            carries[p] = list;
        });
        _work += nodes.Count;
        return (counted.Sum(), carries);
    }

    /// <summary>
    /// One column of the forward pass (<see cref="SplitMoves"/>, then the carried values gathered per
    /// child). Returns the probability counted whole and the child nodes with their past values (null
    /// when the work limit is passed).
    /// </summary>
    private (double Counted, List<FisherNodeKey>? Nodes, List<FisherPastValues>? Pasts) ForwardStage(
        int stage, List<FisherNodeKey> nodes, List<FisherPastValues> pasts, double threshold, double constant)
    {
        var (counted, carries) = SplitMoves(stage, nodes, pasts, threshold, constant);

        // Children are listed in the order they are first reached, and each collects its carries in
        // parent order, so the values kept and the sums do not depend on the threads.
        var index = new Dictionary<FisherNodeKey, int>();
        var incoming = new List<List<Carry>>();
        var children = new List<FisherNodeKey>();
        long carried = 0;
        foreach (var list in carries)
        {
            foreach (var carry in list)
            {
                if (!index.TryGetValue(carry.Child, out int c))
                {
                    c = children.Count;
                    index[carry.Child] = c;
                    children.Add(carry.Child);
                    incoming.Add([]);
                }
                incoming[c].Add(carry);
                carried += carry.To - carry.From;
            }
        }
        _work += carried;
        if (_work > WorkLimit)
        {
            return (0, null, null);
        }
        var childPasts = new FisherPastValues[children.Count];
        Parallel.For(0, children.Count, c =>
        {
            var arriving = incoming[c];
            var collector = new FisherValueCollector(arriving.Max(carry => carry.To - carry.From));
            foreach (var carry in arriving)
            {
                var from = pasts[carry.Parent];
                for (int i = carry.From; i < carry.To; i++)
                {
                    collector.Add(from.Values[i] + carry.Step, from.Counts[i]);
                }
            }
            childPasts[c] = collector.ToPastValues();
        });
        return (counted, children, [.. childPasts]);
    }

    /// <summary>Past values [From, To) of parent node Parent, shifted by Step, go to Child.</summary>
    internal readonly record struct Carry(FisherNodeKey Child, int Parent, double Step, int From, int To);

    /// <summary>
    /// The stage where the forward and backward passes meet. The backward pass holds the last three
    /// columns when the two before the last (which is forced) can be filled in at most a million ways
    /// together, otherwise the last two; the forward pass stops one column before them, and that
    /// column's splits are joined directly with the children's completions. The columns are in
    /// increasing order of their totals, so the backward pass holds the largest ones, whose completions
    /// take the fewest distinct values per node.
    /// </summary>
    private int MeetingStage()
    {
        int stages = _columnTotals.Length;
        if (stages < 3)
        {
            return 0;
        }
        double splits = SplitCount(_columnTotals[stages - 3], RowCount) * SplitCount(_columnTotals[stages - 2], RowCount);
        int backward = splits <= 1e6 ? stages - 3 : stages - 2;
        return Math.Max(0, backward - 1);
    }

    /// <summary>Adds backward-pass work; false once the work limit is passed (safe from parallel loops).</summary>
    internal bool AddWork(long amount) => Interlocked.Add(ref _work, amount) <= WorkLimit;

    private int RowCount { get; set; }

    /// <summary>The number of columns, the stages of the network.</summary>
    internal int StageCount => _columnTotals.Length;

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
    private (double Max, double Min) Bounds(int stage, FisherNodeKey node)
    {
        if (stage == _columnTotals.Length - 1)
        {
            double forced = LastColumnValue(node);
            return (forced, forced);
        }
        if (_bounds[stage].TryGetValue(node, out var known))
        {
            return known;
        }
        if (stage == _columnTotals.Length - 2 && node.Totals.Length <= FisherLastTwoColumnsBounds.MaxRows)
        {
            var direct = FisherLastTwoColumnsBounds.Of(node.Totals, _columnTotals[stage], _logFactorial);
            _bounds[stage][node] = direct;
            return direct;
        }
        var (max, min) = BoundsOverSplits(stage, node.Totals);
        _bounds[stage][node] = (max, min);
        return (max, min);
    }

    /// <summary>
    /// The bounds of a node by listing the splits of its column: for each, the child's remaining totals
    /// are sorted into a scratch buffer and looked up without allocating; only a child seen for the
    /// first time becomes a key (and is solved recursively).
    /// </summary>
    private (double Max, double Min) BoundsOverSplits(int stage, int[] capacities)
    {
        int rows = capacities.Length;
        bool childIsLast = stage + 1 == _columnTotals.Length - 1;
        var known = _bounds[stage + 1].GetAlternateLookup<ReadOnlySpan<int>>();
        var suffixCapacity = new int[rows + 1];
        for (int i = rows - 1; i >= 0; i--)
        {
            suffixCapacity[i] = suffixCapacity[i + 1] + capacities[i];
        }
        var current = new int[rows];
        var child = new int[rows];
        double max = double.NegativeInfinity;
        double min = double.PositiveInfinity;
        Fill(0, _columnTotals[stage], 0);
        return (max, min);

        void Fill(int row, int left, double step)
        {
            if (row < rows - 1)
            {
                int lowest = Math.Max(0, left - suffixCapacity[row + 1]);
                int highest = Math.Min(capacities[row], left);
                for (int value = lowest; value <= highest; value++)
                {
                    current[row] = value;
                    Fill(row + 1, left - value, step - _logFactorial[value]);
                }
                return;
            }
            current[row] = left;
            step -= _logFactorial[left];
            for (int i = 0; i < rows; i++)
            {
                child[i] = capacities[i] - current[i];
            }
            double childMax;
            double childMin;
            if (childIsLast)
            {
                childMax = childMin = LastColumnValue(child);
            }
            else
            {
                InsertionSort(child);
                if (!known.TryGetValue(child, out var bounds))
                {
                    bounds = Bounds(stage + 1, FisherNodeKey.Of((int[])child.Clone()));
                }
                (childMax, childMin) = bounds;
            }
            max = Math.Max(max, step + childMax);
            min = Math.Min(min, step + childMin);
            if (++_work > WorkLimit)
            {
                throw new WorkLimitReachedException();
            }
        }
    }

    private static void InsertionSort(int[] values)
    {
        for (int i = 1; i < values.Length; i++)
        {
            int value = values[i];
            int j = i - 1;
            while (j >= 0 && values[j] > value)
            {
                values[j + 1] = values[j];
                j--;
            }
            values[j + 1] = value;
        }
    }

    /// <summary>
    /// Every way to fill column <paramref name="stage"/> from a node, without exceeding its remaining row
    /// totals: the value the column adds (-sum log x_i!) and the child node. Safe to call from parallel loops.
    /// </summary>
    internal List<(double Step, FisherNodeKey Child)> Moves(FisherNodeKey node, int stage)
    {
        int[] capacities = node.Totals;
        int rows = capacities.Length;
        var result = new List<(double, FisherNodeKey)>();
        var suffixCapacity = new int[rows + 1];
        for (int i = rows - 1; i >= 0; i--)
        {
            suffixCapacity[i] = suffixCapacity[i + 1] + capacities[i];
        }
        var current = new int[rows];
        Fill(0, _columnTotals[stage], 0);
        return result;

        void Fill(int row, int left, double step)
        {
            if (row == rows - 1)
            {
                var remaining = new int[rows];
                for (int i = 0; i < rows - 1; i++)
                {
                    remaining[i] = capacities[i] - current[i];
                }
                remaining[row] = capacities[row] - left;
                result.Add((step - _logFactorial[left], FisherNodeKey.Of(remaining)));
                return;
            }
            int lowest = Math.Max(0, left - suffixCapacity[row + 1]);
            int highest = Math.Min(capacities[row], left);
            for (int value = lowest; value <= highest; value++)
            {
                current[row] = value;
                Fill(row + 1, left - value, step - _logFactorial[value]);
            }
        }
    }

    /// <summary>The value the last column adds from a node: it is forced to hold the remaining row totals.</summary>
    internal double LastColumnValue(FisherNodeKey node) => LastColumnValue(node.Totals);

    private double LastColumnValue(int[] totals)
    {
        double value = 0;
        foreach (int t in totals)
        {
            value -= _logFactorial[t];
        }
        return value;
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

    /// <summary>Unwinds the bound recursion when the work limit is reached; never leaves this class.</summary>
    private sealed class WorkLimitReachedException : Exception;
}
