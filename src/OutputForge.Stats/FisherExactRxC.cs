using MathNet.Numerics;

namespace OutputForge.Stats;

/// <summary>
/// Fisher's exact test for an r x c table (Freeman and Halton 1951, Biometrika 38:141-149), the
/// exact conditional test given both margins. The two-sided p-value sums the probabilities of all
/// tables with the observed margins that are no more probable than the observed one (with R's
/// fisher.test relative tolerance of 1e-7 for ties). Tables are enumerated column by column as in
/// the network algorithm of Mehta and Patel (1983, J Am Stat Assoc 78:427-434): at each node, exact
/// bounds on the most and least probable completion decide whether all of its completions count
/// (their total probability has a closed form), none does, or the node must be expanded.
/// </summary>
public static class FisherExactRxC
{
    /// <summary>Tables larger than 2 x 2 (any table works); zero-total rows and columns are dropped with a note.</summary>
    public static TestResult Compute(int[,] table)
    {
        TableMargins.Validate(table);
        if (table.GetLength(0) < 2 || table.GetLength(1) < 2)
        {
            return TestResult.NotEstimable(FisherExactTest.MethodName,
                PearsonChiSquareTest.NotEstimableReason(table, table.GetLength(0), table.GetLength(1)));
        }
        var (reduced, notes) = TableMargins.DropEmptyLines(table);
        int r = reduced.GetLength(0), c = reduced.GetLength(1);
        if (r == 0 || c == 0)
        {
            return TestResult.NotEstimable(FisherExactTest.MethodName, "the table has no observations");
        }
        if (r < 2 || c < 2)
        {
            return new TestResult(FisherExactTest.MethodName, null, null, 1) { Notes = [.. notes, FisherExactTest.SingleTableNote] };
        }
        // The shorter side becomes the state of the network (remaining margins), the longer one its stages.
        var oriented = r <= c ? reduced : Transpose(reduced);
        var p = new Network(oriented).PValue();
        return new TestResult(FisherExactTest.MethodName, null, null, Math.Min(1, p)) { Notes = notes };
    }

    private static int[,] Transpose(int[,] table)
    {
        var result = new int[table.GetLength(1), table.GetLength(0)];
        for (int i = 0; i < table.GetLength(0); i++)
        {
            for (int j = 0; j < table.GetLength(1); j++)
            {
                result[j, i] = table[i, j];
            }
        }
        return result;
    }

    /// <summary>
    /// Nodes are (stage k, remaining row margins, sorted: the completions of a node depend only on
    /// the multiset of its margins). A path's weight is the sum of -log x! over the cells placed so
    /// far; a table's probability is a constant times exp(weight). Paths reaching the same node with
    /// the same weight are merged (their number kept), stage by stage, as in Mehta and Patel (1983).
    /// </summary>
    private sealed class Network
    {
        private readonly int[,] _table;
        private readonly int _rows;
        private readonly int[] _columnTotals;
        private readonly Dictionary<(int, string), (double Max, double Min)> _bounds = [];

        public Network(int[,] table)
        {
            _table = table;
            _rows = table.GetLength(0);
            _columnTotals = Enumerable.Range(0, table.GetLength(1)).Select(j => Enumerable.Range(0, _rows).Sum(i => table[i, j])).ToArray();
        }

        public double PValue()
        {
            var rowTotals = Enumerable.Range(0, _rows).Select(i => Enumerable.Range(0, _columnTotals.Length).Sum(j => _table[i, j])).ToArray();
            double observed = 0;
            for (int i = 0; i < _rows; i++)
            {
                for (int j = 0; j < _columnTotals.Length; j++)
                {
                    observed -= LogFactorial(_table[i, j]);
                }
            }
            double threshold = observed + Math.Log(1 + FisherExactTest.RelativeTolerance);
            double sum = 0;
            var start = Sorted(rowTotals);
            var nodes = new Dictionary<string, (int[] Margins, Dictionary<double, (double Weight, double Count)> Paths)>
            {
                [Key(start)] = (start, new Dictionary<double, (double Weight, double Count)> { [0] = (0, 1) }),
            };
            for (int stage = 0; stage < _columnTotals.Length; stage++)
            {
                var next = new Dictionary<string, (int[] Margins, Dictionary<double, (double Weight, double Count)> Paths)>();
                foreach (var (margins, paths) in nodes.Values)
                {
                    var (max, min) = Bounds(stage, margins);
                    double logTotal = LogTotal(stage, margins);
                    var open = new List<(double Weight, double Count)>();
                    foreach (var (weight, count) in paths.Values)
                    {
                        if (weight + max <= threshold)
                        {
                            sum += count * Math.Exp(weight + logTotal - observed);
                        }
                        else if (weight + min <= threshold)
                        {
                            open.Add((weight, count));
                        }
                    }
                    if (open.Count == 0)
                    {
                        continue;
                    }
                    foreach (var column in Columns(margins, _columnTotals[stage]))
                    {
                        var (remaining, step) = Subtract(margins, column);
                        var key = Key(remaining);
                        if (!next.TryGetValue(key, out var node))
                        {
                            next[key] = node = (remaining, []);
                        }
                        foreach (var (weight, count) in open)
                        {
                            // Weights equal to 1e-9 (far inside the 1e-7 tie tolerance) are one path class, which keeps
                            // the first weight seen exactly, so merging costs no precision.
                            var merged = Math.Round(weight + step, 9);
                            node.Paths[merged] = node.Paths.TryGetValue(merged, out var known)
                                ? (known.Weight, known.Count + count)
                                : (weight + step, count);
                        }
                    }
                }
                nodes = next;
            }
            foreach (var (_, paths) in nodes.Values)
            {
                foreach (var (weight, count) in paths.Values.Where(p => p.Weight <= threshold))
                {
                    sum += count * Math.Exp(weight - observed);
                }
            }
            // Probability of the observed table: prod R! prod C! / (N! prod x!).
            int n = rowTotals.Sum();
            double logObserved = rowTotals.Sum(LogFactorial) + _columnTotals.Sum(LogFactorial) - LogFactorial(n) + observed;
            return Math.Exp(logObserved) * sum;
        }

        private (int[] Remaining, double Step) Subtract(int[] margins, int[] column)
        {
            var remaining = new int[_rows];
            double step = 0;
            for (int i = 0; i < _rows; i++)
            {
                remaining[i] = margins[i] - column[i];
                step -= LogFactorial(column[i]);
            }
            return (Sorted(remaining), step);
        }

        private static int[] Sorted(int[] values)
        {
            var copy = (int[])values.Clone();
            Array.Sort(copy);
            return copy;
        }

        private static string Key(int[] margins) => string.Join(",", margins);

        /// <summary>log of the sum over all completions of prod 1/x! = M! / (prod m_i! prod C_j!), j from the stage on.</summary>
        private double LogTotal(int stage, int[] remaining)
        {
            int m = remaining.Sum();
            double value = LogFactorial(m) - remaining.Sum(LogFactorial);
            for (int j = stage; j < _columnTotals.Length; j++)
            {
                value -= LogFactorial(_columnTotals[j]);
            }
            return value;
        }

        /// <summary>Largest and smallest weight of a completion from this node (exact, by dynamic programming over nodes).</summary>
        private (double Max, double Min) Bounds(int stage, int[] remaining)
        {
            if (stage == _columnTotals.Length)
            {
                return (0, 0);
            }
            var key = (stage, Key(remaining));
            if (_bounds.TryGetValue(key, out var known))
            {
                return known;
            }
            double max = double.NegativeInfinity, min = double.PositiveInfinity;
            foreach (var column in Columns(remaining, _columnTotals[stage]))
            {
                var (next, step) = Subtract(remaining, column);
                var (nextMax, nextMin) = Bounds(stage + 1, next);
                max = Math.Max(max, step + nextMax);
                min = Math.Min(min, step + nextMin);
            }
            _bounds[key] = (max, min);
            return (max, min);
        }

        /// <summary>Every way to place <paramref name="total"/> in the rows, no row above its remaining margin.</summary>
        private IEnumerable<int[]> Columns(int[] caps, int total)
        {
            var column = new int[_rows];
            var capacityAfter = new int[_rows + 1];
            for (int i = _rows - 1; i >= 0; i--)
            {
                capacityAfter[i] = capacityAfter[i + 1] + caps[i];
            }
            return Place(0, total);

            IEnumerable<int[]> Place(int row, int left)
            {
                if (row == _rows - 1)
                {
                    if (left <= caps[row])
                    {
                        column[row] = left;
                        yield return (int[])column.Clone();
                    }
                    yield break;
                }
                int low = Math.Max(0, left - capacityAfter[row + 1]);
                int high = Math.Min(caps[row], left);
                for (int x = low; x <= high; x++)
                {
                    column[row] = x;
                    foreach (var result in Place(row + 1, left - x))
                    {
                        yield return result;
                    }
                }
            }
        }

        private static double LogFactorial(int x) => SpecialFunctions.FactorialLn(x);
    }
}
