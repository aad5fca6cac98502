namespace OutputForge.Stats.Exact;

/// <summary>
/// Random r x c tables with fixed row and column totals, each drawn with its probability under independence (the
/// multiple hypergeometric distribution that Fisher's exact test conditions on), as in Patefield WM (1981) Algorithm
/// AS 159, Appl Stat 30:91-97. Row by row, the row's counts are a sample without replacement of the row's size from
/// what the columns still hold, so each cell but the row's last is hypergeometric given the cells before it; a
/// hypergeometric value is drawn by inversion from its mode outwards, adding the more probable neighbour first,
/// which takes a few steps about the mode however large the counts (AS 159 does the same).
/// </summary>
internal sealed class RandomTableWithMargins
{
    private readonly int[] _rowTotals;
    private readonly int[] _columnTotals;
    private readonly double[] _logFactorial;
    private readonly int[] _remaining;

    public RandomTableWithMargins(int[] rowTotals, int[] columnTotals)
    {
        _rowTotals = rowTotals;
        _columnTotals = columnTotals;
        var n = rowTotals.Sum();
        _logFactorial = new double[n + 1];
        for (var k = 2; k <= n; k++)
        {
            _logFactorial[k] = _logFactorial[k - 1] + Math.Log(k);
        }
        _remaining = new int[columnTotals.Length];
    }

    /// <summary>log k! for k up to the table's total.</summary>
    public double LogFactorial(int k) => _logFactorial[k];

    /// <summary>Fills <paramref name="table"/> (r x c) with a new random table.</summary>
    public void Draw(int[,] table, SplitMixUniform uniform)
    {
        int rows = _rowTotals.Length, columns = _columnTotals.Length;
        Array.Copy(_columnTotals, _remaining, columns);
        var left = _columnTotals.Sum();
        for (var i = 0; i < rows - 1; i++)
        {
            var draws = _rowTotals[i];
            var population = left;
            for (var j = 0; j < columns - 1; j++)
            {
                var value = draws == 0 ? 0 : Hypergeometric(population, _remaining[j], draws, uniform.Next());
                table[i, j] = value;
                population -= _remaining[j];
                _remaining[j] -= value;
                draws -= value;
            }
            table[i, columns - 1] = draws;
            _remaining[columns - 1] -= draws;
            left -= _rowTotals[i];
        }
        for (var j = 0; j < columns; j++)
        {
            table[rows - 1, j] = _remaining[j];
        }
    }

    /// <summary>
    /// The number of marked items in <paramref name="draws"/> taken without replacement from <paramref name="population"/>
    /// items of which <paramref name="marked"/> are marked, by inversion of <paramref name="u"/> from the mode outwards.
    /// </summary>
    private int Hypergeometric(int population, int marked, int draws, double u)
    {
        int unmarked = population - marked;
        int low = Math.Max(0, draws - unmarked), high = Math.Min(draws, marked);
        if (low == high)
        {
            return low;
        }
        var mode = (int)((draws + 1.0) * (marked + 1.0) / (population + 2.0));
        mode = Math.Clamp(mode, low, high);
        var f = _logFactorial;
        double atMode = Math.Exp(f[marked] - f[mode] - f[marked - mode] + f[unmarked] - f[draws - mode] - f[unmarked - draws + mode]
                                 - f[population] + f[draws] + f[population - draws]);
        double cumulative = atMode;
        if (u < cumulative)
        {
            return mode;
        }
        int up = mode, down = mode;
        double atUp = atMode, atDown = atMode;
        double nextUp = NextUp(), nextDown = NextDown();
        while (up < high || down > low)
        {
            if (down <= low || (up < high && nextUp >= nextDown))
            {
                up++;
                atUp = nextUp;
                cumulative += atUp;
                if (u < cumulative)
                {
                    return up;
                }
                nextUp = NextUp();
            }
            else
            {
                down--;
                atDown = nextDown;
                cumulative += atDown;
                if (u < cumulative)
                {
                    return down;
                }
                nextDown = NextDown();
            }
        }
        // Only rounding leaves u above the whole sum: the last value reached is the one it falls on.
        return atUp <= atDown ? up : down;

        // P(x + 1) / P(x) = (marked - x)(draws - x) / ((x + 1)(unmarked - draws + x + 1)), and the inverse step down.
        double NextUp() => up >= high ? 0 : atUp * (marked - up) * (double)(draws - up) / ((up + 1.0) * (unmarked - draws + up + 1.0));
        double NextDown() => down <= low ? 0 : atDown * down * (double)(unmarked - draws + down) / ((marked - down + 1.0) * (draws - down + 1.0));
    }
}
