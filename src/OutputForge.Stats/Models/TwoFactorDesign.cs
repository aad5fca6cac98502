namespace OutputForge.Stats.Models;

/// <summary>
/// The model matrix of two factors with treatment contrasts (the first level of each is the
/// reference): intercept, the indicators of factor A's other levels, those of factor B, and, when
/// asked, their products (the A:B interaction), in the column order of R's model.matrix(~ A * B)
/// (interaction columns with A varying fastest).
/// </summary>
public static class TwoFactorDesign
{
    /// <param name="a">Level index (0-based) of factor A for each observation.</param>
    /// <param name="aLevels">Names of factor A's levels.</param>
    /// <param name="b">Level index (0-based) of factor B for each observation.</param>
    /// <param name="bLevels">Names of factor B's levels.</param>
    /// <param name="interaction">Whether to add the A:B product columns.</param>
    public static (double[,] Matrix, IReadOnlyList<string> Columns) Build(IReadOnlyList<int> a, IReadOnlyList<string> aLevels,
        IReadOnlyList<int> b, IReadOnlyList<string> bLevels, bool interaction)
    {
        if (a.Count != b.Count)
        {
            throw new ArgumentException("both factors need one level per observation");
        }
        if (a.Any(i => i < 0 || i >= aLevels.Count) || b.Any(i => i < 0 || i >= bLevels.Count))
        {
            throw new ArgumentException("a level index is outside its factor's levels");
        }
        var columns = new List<string> { "(Intercept)" };
        columns.AddRange(aLevels.Skip(1));
        columns.AddRange(bLevels.Skip(1));
        if (interaction)
        {
            for (int j = 1; j < bLevels.Count; j++)
            {
                for (int i = 1; i < aLevels.Count; i++)
                {
                    columns.Add($"{aLevels[i]}:{bLevels[j]}");
                }
            }
        }
        int n = a.Count, ka = aLevels.Count - 1, kb = bLevels.Count - 1;
        var x = new double[n, columns.Count];
        for (int r = 0; r < n; r++)
        {
            x[r, 0] = 1;
            if (a[r] > 0)
            {
                x[r, a[r]] = 1;
            }
            if (b[r] > 0)
            {
                x[r, ka + b[r]] = 1;
            }
            if (interaction && a[r] > 0 && b[r] > 0)
            {
                x[r, 1 + ka + kb + (b[r] - 1) * ka + (a[r] - 1)] = 1;
            }
        }
        return (x, columns);
    }
}
