namespace OutputForge.Stats.Exact;

/// <summary>
/// The join of the two halves of the Fisher network at the meeting stage, for one carry (one way of
/// filling the meeting column from a node): the sum of count x exp(K + step + P + F) over the carried
/// past values P of the node and the kept completion values F of the child with P + F at most
/// limit = threshold - step.
/// <para>
/// Both lists are sorted, so as P grows the number of qualifying F only shrinks: one binary search
/// places a pointer for the first past value and it then walks down the completions once. Per list the
/// weights count x exp(value - largest value) and their running sums are computed once
/// (<see cref="Scale"/>), so the join itself is multiply-adds over running sums that start at the
/// smallest completion (no differences of sums), with one exp per carry; all terms are positive, so
/// nothing cancels. A list whose values span more than <see cref="LinearRange"/> (where the weights
/// would underflow) is joined with the running log-sums instead, one exp per past value.
/// </para>
/// </summary>
internal static class FisherMeetingJoin
{
    /// <summary>exp(-600) is about 1e-261: weights down to that keep their full precision in a double.</summary>
    internal const double LinearRange = 600;

    /// <summary>A sorted list's weights relative to its largest value, with running sums; null when its range is too wide.</summary>
    internal sealed class Scale
    {
        public required double Reference { get; init; }
        public required double[] Weights { get; init; }
        public required double[] Prefix { get; init; }

        public static Scale? Of(FisherPastValues list)
        {
            var values = list.Values;
            double reference = values[^1];
            if (reference - values[0] > LinearRange)
            {
                return null;
            }
            var weights = new double[values.Length];
            var prefix = new double[values.Length + 1];
            for (int i = 0; i < values.Length; i++)
            {
                weights[i] = list.Counts[i] * Math.Exp(values[i] - reference);
                prefix[i + 1] = prefix[i] + weights[i];
            }
            return new Scale { Reference = reference, Weights = weights, Prefix = prefix };
        }
    }

    public static double Sum(FisherPastValues pasts, Scale? pastScale, int from, int to, FisherPastValues completions, Scale? completionScale, double limit, double logConstant)
    {
        var a = pasts.Values;
        var b = completions.Values;
        int j = completions.CountAtMost(limit - a[from]);
        if (pastScale is not null && completionScale is not null)
        {
            var weights = pastScale.Weights;
            var completionPrefix = completionScale.Prefix;
            double sum = 0;
            for (int i = from; i < to && j > 0; i++)
            {
                double bound = limit - a[i];
                while (j > 0 && b[j - 1] > bound)
                {
                    j--;
                }
                sum += weights[i] * completionPrefix[j];
            }
            return sum == 0 ? 0 : Math.Exp(logConstant + pastScale.Reference + completionScale.Reference) * sum;
        }
        double total = 0;
        for (int i = from; i < to && j > 0; i++)
        {
            double bound = limit - a[i];
            while (j > 0 && b[j - 1] > bound)
            {
                j--;
            }
            if (j > 0)
            {
                total += pasts.Counts[i] * Math.Exp(logConstant + a[i] + completions.LogPrefix[j]);
            }
        }
        return total;
    }
}
