namespace OutputForge.Stats.Multiplicity;

/// <summary>
/// The fixed-sequence (hierarchical) procedure (Maurer, Hothorn and Lehmacher 1995; Westfall and Krishen 2001): the
/// hypotheses are tested in the order listed, each at the full level alpha, until the first one not rejected. The
/// adjusted p-value of the k-th is the largest raw p-value among the first k.
/// </summary>
public static class FixedSequenceAdjustment
{
    public static MultiplicityResult Adjust(IReadOnlyList<double> pValues, double alpha)
    {
        MultiplicityInput.PValues(pValues);
        MultiplicityInput.Alpha(alpha);
        var adjusted = new double[pValues.Count];
        var largest = 0.0;
        for (var k = 0; k < pValues.Count; k++)
        {
            largest = Math.Max(largest, pValues[k]);
            adjusted[k] = largest;
        }
        return MultiplicityDecisions.FromSteps(MultiplicityProcedure.FixedSequence, alpha, pValues, adjusted, Enumerable.Range(0, pValues.Count).ToList());
    }
}
