using System.Globalization;

namespace OutputForge.Stats.Multiplicity;

/// <summary>
/// Checks of what every procedure is given: p-values in [0, 1], a familywise level strictly between 0 and 1, and
/// weights each in [0, 1] summing to at most 1 (Bretz et al. 2009, section 2: the initial levels w_i alpha must
/// exhaust at most alpha). The messages name the hypothesis by its 1-based number, as a reader counts them.
/// </summary>
internal static class MultiplicityInput
{
    /// <summary>Room for rounding in sums of weights written as decimals (1/3 + 1/3 + 1/3 typed as 0.333333...).</summary>
    public const double SumTolerance = 1e-9;

    public static void PValues(IReadOnlyList<double> pValues)
    {
        if (pValues.Count == 0)
        {
            throw new ArgumentException("at least one p-value is needed", nameof(pValues));
        }
        for (var i = 0; i < pValues.Count; i++)
        {
            if (!(pValues[i] >= 0 && pValues[i] <= 1))
            {
                throw new ArgumentException(Text($"p-value {i + 1} is {pValues[i]}; a p-value must lie between 0 and 1"), nameof(pValues));
            }
        }
    }

    public static void Alpha(double alpha)
    {
        if (!(alpha > 0 && alpha < 1))
        {
            throw new ArgumentOutOfRangeException(nameof(alpha), alpha, Text($"the familywise level alpha is {alpha}; it must lie strictly between 0 and 1"));
        }
    }

    public static void Weights(IReadOnlyList<double> weights, int hypotheses)
    {
        if (weights.Count != hypotheses)
        {
            throw new ArgumentException($"{weights.Count} weights for {hypotheses} hypotheses; give one weight per hypothesis", nameof(weights));
        }
        for (var i = 0; i < weights.Count; i++)
        {
            if (!(weights[i] >= 0 && weights[i] <= 1))
            {
                throw new ArgumentException(Text($"weight {i + 1} is {weights[i]}; a weight must lie between 0 and 1"), nameof(weights));
            }
        }
        var sum = weights.Sum();
        if (sum > 1 + SumTolerance)
        {
            throw new ArgumentException(Text($"the weights sum to {sum}; they must sum to at most 1"), nameof(weights));
        }
    }

    public static string Text(FormattableString text) => text.ToString(CultureInfo.InvariantCulture);
}
