using MathNet.Numerics;
using MathNet.Numerics.LinearAlgebra;
using OutputForge.Stats.Contingency;

namespace OutputForge.Stats.Stratified;

/// <summary>
/// Generalized Cochran-Mantel-Haenszel statistics for K strata of I x J tables (Landis, Heyman and
/// Koch 1978, Int Stat Rev 46:237-254; Agresti 2013, Categorical Data Analysis 3rd ed., section 8.4).
/// With n_h the cells of stratum h in row-major order, under conditional independence
/// m_h = n_h (p_rows ⊗ p_columns) and
/// V_h = n_h^2 / (n_h - 1) ((D_rows - p_rows p_rows') ⊗ (D_columns - p_columns p_columns')).
/// For a matrix B, Q = G' (sum B V_h B')^- G with G = sum B (n_h - m_h):
/// <list type="bullet">
/// <item>general association: B = [I_(I-1), 0] ⊗ [I_(J-1), 0], df (I - 1)(J - 1);</item>
/// <item>row mean scores differ: B = [I_(I-1), 0] ⊗ a' (a the column scores), df I - 1;</item>
/// <item>nonzero correlation: B = c' ⊗ a' (c the row scores), df 1.</item>
/// </list>
/// Scores default to table scores 1, 2, ... The inverse is a Moore-Penrose pseudo-inverse; when the
/// covariance matrix is singular (a row or column empty in every stratum) the degrees of freedom are
/// its rank and a note says so. Strata with fewer than two subjects have no variance and are skipped
/// and returned as stratum remarks.
/// </summary>
public static class GeneralizedCochranMantelHaenszel
{
    public const string CorrelationName = "Cochran-Mantel-Haenszel nonzero correlation test";
    public const string RowMeanScoresName = "Cochran-Mantel-Haenszel row mean scores test";
    public const string GeneralAssociationName = "Cochran-Mantel-Haenszel general association test";

    public static GeneralizedCmhResult Compute(IReadOnlyList<int[,]> strata, IReadOnlyList<double>? rowScores = null, IReadOnlyList<double>? columnScores = null)
    {
        ArgumentNullException.ThrowIfNull(strata);
        if (strata.Count == 0)
        {
            throw new ArgumentException("At least one stratum is needed.", nameof(strata));
        }
        var a = Scores(columnScores, strata[0].GetLength(1), nameof(columnScores));
        return Compute(strata, rowScores, _ => a);
    }

    /// <summary>
    /// The same statistics with column scores computed from each stratum's own table, e.g.
    /// <see cref="ModifiedRiditScores.Of"/>: the contrast of stratum h uses a_h. Rank-based scores are
    /// computed within each stratum, which makes the row mean scores statistic a stratified rank test
    /// of the van Elteren (1960) type (common practice).
    /// </summary>
    public static GeneralizedCmhResult Compute(IReadOnlyList<int[,]> strata, IReadOnlyList<double>? rowScores, Func<int[,], IReadOnlyList<double>> columnScoresOfStratum)
    {
        ArgumentNullException.ThrowIfNull(columnScoresOfStratum);
        ArgumentNullException.ThrowIfNull(strata);
        if (strata.Count == 0)
        {
            throw new ArgumentException("At least one stratum is needed.", nameof(strata));
        }
        int rows = strata[0].GetLength(0);
        int columns = strata[0].GetLength(1);
        for (int h = 0; h < strata.Count; h++)
        {
            TableMargins.Validate(strata[h]);
            if (strata[h].GetLength(0) != rows || strata[h].GetLength(1) != columns)
            {
                throw new ArgumentException($"Stratum {h + 1} is {strata[h].GetLength(0)} x {strata[h].GetLength(1)}; every stratum must be {rows} x {columns}.", nameof(strata));
            }
        }
        if (rows < 2 || columns < 2)
        {
            throw new ArgumentException($"Each stratum must be at least 2 x 2; these are {rows} x {columns}.", nameof(strata));
        }
        var c = Scores(rowScores, rows, nameof(rowScores));

        var build = Matrix<double>.Build;
        var general = build.DenseIdentity(rows - 1, rows).KroneckerProduct(build.DenseIdentity(columns - 1, columns));
        var accumulators = new[] { new Accumulator(1), new Accumulator(rows - 1), new Accumulator(general.RowCount) };

        var remarks = new List<StratumRemark>();
        int contributing = 0;
        for (int h = 0; h < strata.Count; h++)
        {
            var table = strata[h];
            double n = TableMargins.RowTotals(table).Sum();
            if (n < 2)
            {
                remarks.Add(new StratumRemark(h, n == 0 ? StratumRemarkReason.NoSubjects : StratumRemarkReason.SingleSubject));
                continue;
            }
            var pRows = Vector<double>.Build.DenseOfEnumerable(TableMargins.RowTotals(table).Select(t => t / n));
            var pColumns = Vector<double>.Build.DenseOfEnumerable(TableMargins.ColumnTotals(table).Select(t => t / n));
            var observed = Vector<double>.Build.Dense(rows * columns, k => table[k / columns, k % columns]);
            var expected = Kronecker(pRows, pColumns) * n;
            var rowCovariance = build.DenseOfDiagonalVector(pRows) - pRows.OuterProduct(pRows);
            var columnCovariance = build.DenseOfDiagonalVector(pColumns) - pColumns.OuterProduct(pColumns);
            var covariance = rowCovariance.KroneckerProduct(columnCovariance) * (n * n / (n - 1));
            var a = Scores(columnScoresOfStratum(table), columns, nameof(columnScoresOfStratum));
            var rowMeans = build.DenseIdentity(rows - 1, rows).KroneckerProduct(build.DenseOfRowArrays(a));
            var correlation = build.DenseOfRowArrays(c).KroneckerProduct(build.DenseOfRowArrays(a));
            accumulators[0].Add(correlation, observed - expected, covariance);
            accumulators[1].Add(rowMeans, observed - expected, covariance);
            accumulators[2].Add(general, observed - expected, covariance);
            contributing++;
        }
        if (contributing == 0)
        {
            var none = TestResult.NotEstimable(GeneralAssociationName, "no stratum has two or more subjects");
            return new GeneralizedCmhResult(none with { Method = CorrelationName, StratumRemarks = remarks },
                none with { Method = RowMeanScoresName, StratumRemarks = remarks }, none with { StratumRemarks = remarks });
        }
        return new GeneralizedCmhResult(
            accumulators[0].Result(CorrelationName, 1) with { StratumRemarks = remarks },
            accumulators[1].Result(RowMeanScoresName, rows - 1) with { StratumRemarks = remarks },
            accumulators[2].Result(GeneralAssociationName, (rows - 1) * (columns - 1)) with { StratumRemarks = remarks });
    }

    private static double[] Scores(IReadOnlyList<double>? scores, int count, string name)
    {
        if (scores is null)
        {
            return Enumerable.Range(1, count).Select(i => (double)i).ToArray();
        }
        if (scores.Count != count || scores.Any(s => double.IsNaN(s) || double.IsInfinity(s)))
        {
            throw new ArgumentException($"{count} finite scores are needed.", name);
        }
        return scores.ToArray();
    }

    private static Vector<double> Kronecker(Vector<double> left, Vector<double> right)
        => Vector<double>.Build.Dense(left.Count * right.Count, k => left[k / right.Count] * right[k % right.Count]);

    /// <summary>Sums G = sum B_h (n_h - m_h) and V_G = sum B_h V_h B_h' for one kind of contrast B_h.</summary>
    private sealed class Accumulator(int dimension)
    {
        private Vector<double> _g = Vector<double>.Build.Dense(dimension);
        private Matrix<double> _v = Matrix<double>.Build.Dense(dimension, dimension);

        public void Add(Matrix<double> contrast, Vector<double> deviation, Matrix<double> covariance)
        {
            _g += contrast * deviation;
            _v += contrast * covariance * contrast.Transpose();
        }

        public TestResult Result(string method, int nominalDf)
        {
            var svd = _v.Svd(true);
            double largest = svd.S.Count == 0 ? 0 : svd.S.Maximum();
            double tolerance = largest * 1e-10 * _v.RowCount;
            int rank = svd.S.Count(s => s > tolerance);
            if (rank == 0)
            {
                return TestResult.NotEstimable(method, "the statistic has no variance (every stratum is constant in the scored direction)");
            }
            // Pseudo-inverse from the singular value decomposition: U diag(1/s) V'.
            var inverse = Matrix<double>.Build.Dense(_v.RowCount, _v.RowCount);
            for (int i = 0; i < svd.S.Count; i++)
            {
                if (svd.S[i] > tolerance)
                {
                    inverse += svd.U.Column(i).OuterProduct(svd.VT.Row(i)) / svd.S[i];
                }
            }
            double statistic = Math.Max(0, _g * (inverse * _g));
            double p = SpecialFunctions.GammaUpperRegularized(rank / 2.0, statistic / 2);
            var notes = rank < nominalDf
                ? new List<string> { $"The covariance matrix has rank {rank} instead of {nominalDf}, so the test has {rank} degrees of freedom." }
                : new List<string>();
            return new TestResult(method, statistic, rank, p) { Notes = notes };
        }
    }
}
