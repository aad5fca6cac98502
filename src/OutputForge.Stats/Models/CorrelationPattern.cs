using MathNet.Numerics.LinearAlgebra;

namespace OutputForge.Stats.Models;

/// <summary>
/// The correlation matrices of the structures with one correlation parameter rho, and their
/// derivatives in rho: autoregressive rho^|j-k| and compound symmetric (rho off the diagonal).
/// </summary>
internal static class CorrelationPattern
{
    /// <summary>The <paramref name="order"/>-th derivative (0, 1 or 2) of rho^|j-k| in rho.</summary>
    public static Matrix<double> Autoregressive(int t, double rho, int order) => Matrix<double>.Build.Dense(t, t, (j, k) =>
    {
        var lag = Math.Abs(j - k);
        return order switch
        {
            0 => Math.Pow(rho, lag),
            1 => lag == 0 ? 0 : lag * Math.Pow(rho, lag - 1),
            _ => lag < 2 ? 0 : lag * (lag - 1) * Math.Pow(rho, lag - 2),
        };
    });

    /// <summary>The <paramref name="order"/>-th derivative (0, 1 or 2) of the compound symmetric correlation in rho.</summary>
    public static Matrix<double> CompoundSymmetric(int t, double rho, int order) => Matrix<double>.Build.Dense(t, t, (j, k) => order switch
    {
        0 => j == k ? 1 : rho,
        1 => j == k ? 0 : 1,
        _ => 0,
    });
}
