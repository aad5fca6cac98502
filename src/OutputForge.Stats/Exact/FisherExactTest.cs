using MathNet.Numerics.Distributions;
using OutputForge.Stats.Contingency;

namespace OutputForge.Stats.Exact;

/// <summary>
/// Fisher's exact test of independence (Fisher 1935, J R Stat Soc 98:39-82; Agresti 2013, Categorical
/// Data Analysis 3rd ed., section 3.5), conditional on both margins. The two-sided p-value is the sum
/// of the hypergeometric probabilities of all tables with the observed margins whose probability does
/// not exceed that of the observed table, with the relative tolerance 1e-7 that R's fisher.test uses so
/// that ties computed with rounding error are counted as ties.
/// </summary>
public static class FisherExactTest
{
    public const string MethodName = "Fisher's exact test";

    /// <summary>The method's name when the p-value is the Monte Carlo estimate.</summary>
    public const string MonteCarloMethodName = "Fisher's exact test (Monte Carlo estimate)";

    /// <summary>What a reader must be told beside a Monte Carlo p-value: that it is an estimate, how precise, and how to reproduce it.</summary>
    public static string MonteCarloNote(FisherMonteCarloEstimate estimate) => string.Create(System.Globalization.CultureInfo.InvariantCulture,
        $"The table is too large for exact enumeration within the work limit: the p-value of Fisher's exact test is a Monte Carlo estimate (Agresti, Wackerly and Boyett 1979), {estimate.PValue:0.0000} with 99% CI {estimate.Lower:0.0000} to {estimate.Upper:0.0000}, from {estimate.Samples:N0} tables sampled with the observed margins (Patefield 1981), seed {estimate.Seed}.");

    /// <summary>Relative tolerance for "no more probable than the observed table" (R, fisher.test).</summary>
    internal const double RelativeTolerance = 1e-7;

    internal const string SingleTableNote =
        "A row or column total is zero, so the observed table is the only one with these margins and the p-value is 1.";

    /// <summary>
    /// The 2 x 2 table [[a, b], [c, d]]. When a margin is zero only one table is possible and the
    /// p-value is exactly 1 (as R's fisher.test reports); a note says so.
    /// </summary>
    public static TestResult TwoByTwo(int a, int b, int c, int d)
    {
        if (a < 0 || b < 0 || c < 0 || d < 0)
        {
            throw new ArgumentOutOfRangeException(a < 0 ? nameof(a) : b < 0 ? nameof(b) : c < 0 ? nameof(c) : nameof(d), "Cell counts must be zero or more.");
        }
        int n = a + b + c + d;
        if (n == 0)
        {
            return TestResult.NotEstimable(MethodName, "the table has no observations");
        }
        int row1 = a + b;
        int column1 = a + c;
        int low = Math.Max(0, row1 + column1 - n);
        int high = Math.Min(row1, column1);
        if (low == high)
        {
            return new TestResult(MethodName, null, null, 1) { Notes = [SingleTableNote] };
        }
        var logProbabilities = new double[high - low + 1];
        for (int k = low; k <= high; k++)
        {
            logProbabilities[k - low] = Hypergeometric.PMFLn(n, column1, row1, k);
        }
        double maximum = logProbabilities.Max();
        double total = 0;
        var relative = new double[logProbabilities.Length];
        for (int i = 0; i < relative.Length; i++)
        {
            relative[i] = Math.Exp(logProbabilities[i] - maximum);
            total += relative[i];
        }
        double threshold = relative[a - low] * (1 + RelativeTolerance);
        double tail = relative.Where(value => value <= threshold).Sum();
        return new TestResult(MethodName, null, null, Math.Min(1, tail / total));
    }

    /// <summary>
    /// An r x c table. Rows and columns with a zero total are dropped (and reported); a table that
    /// reduces to 2 x 2 is computed exactly as <see cref="TwoByTwo"/>, one that reduces to a single
    /// row or column admits only the observed table and has p = 1 (with a note). Larger tables use the
    /// network algorithm of Mehta and Patel (1983): for two rows or two columns the one-number network
    /// of <see cref="FisherTwoRowEnumeration"/>, otherwise <see cref="FisherNetworkEnumeration"/>; a
    /// table too large to enumerate within the work limit is reported as not estimable, never approximated.
    /// </summary>
    public static TestResult Compute(int[,] table) => Compute(table, null);

    /// <summary>
    /// As <see cref="Compute(int[,])"/>; a table beyond exact enumeration gets, when <paramref name="monteCarlo"/> is
    /// given, the Monte Carlo estimate of <see cref="FisherMonteCarlo"/> instead of NE, with a note giving the estimate,
    /// its 99% interval, the number of sampled tables and the seed.
    /// </summary>
    public static TestResult Compute(int[,] table, FisherMonteCarloSettings? monteCarlo)
    {
        TableMargins.Validate(table);
        if (table.GetLength(0) < 2 || table.GetLength(1) < 2)
        {
            return TestResult.NotEstimable(MethodName, PearsonChiSquareTest.NotEstimableReason(table, table.GetLength(0), table.GetLength(1)));
        }
        var (reduced, notes) = TableMargins.DropEmptyLines(table);
        int r = reduced.GetLength(0);
        int c = reduced.GetLength(1);
        if (r == 0 || c == 0)
        {
            return TestResult.NotEstimable(MethodName, "the table has no observations");
        }
        if (r < 2 || c < 2)
        {
            return new TestResult(MethodName, null, null, 1) { Notes = [.. notes, SingleTableNote] };
        }
        if (r == 2 && c == 2)
        {
            return TwoByTwo(reduced[0, 0], reduced[0, 1], reduced[1, 0], reduced[1, 1]) with { Notes = notes };
        }
        double? p = r == 2 || c == 2 ? FisherTwoRowEnumeration.PValue(reduced) : FisherNetworkEnumeration.PValue(reduced);
        if (p is not null)
        {
            return new TestResult(MethodName, null, null, p.Value) { Notes = notes };
        }
        if (monteCarlo is null)
        {
            return TestResult.NotEstimable(MethodName, "the table is too large for exact enumeration within the work limit");
        }
        var estimate = FisherMonteCarlo.Estimate(reduced, monteCarlo);
        return new TestResult(MonteCarloMethodName, null, null, estimate.PValue) { Notes = [.. notes, MonteCarloNote(estimate)] };
    }
}
