namespace OutputForge.Stats;

/// <summary>
/// The backward half of <see cref="FisherNetworkEnumeration"/>: the columns after the meeting stage,
/// run from the last one back, then joined with the forward pass's past values at the meeting stage.
/// <para>
/// First the undecided partial tables of the meeting stage are followed forward in summary only: for
/// every node they can reach, the log of their total mass (sum of exp(past value)) and their largest
/// and smallest past value. Then, from the last column back, each node collects the distinct values of
/// its completions (the last column is forced; an earlier node adds each way of filling its column to
/// the kept values of the child). A completion value F of a node is counted whole when F plus the
/// largest past value reaching the node is at most the threshold (every table through it qualifies:
/// its probability is exp(K + F) times the node's past mass), dropped when F plus the smallest past
/// value exceeds it, and kept for the node's parents otherwise. A counted or dropped completion is not
/// passed back, so no table is counted twice. At the meeting stage the node's sorted past values and
/// sorted completion values are joined in one sweep: as the past value grows, the count of completions
/// at most threshold - past only shrinks.
/// </para>
/// </summary>
internal sealed class FisherBackwardPass
{
    private readonly FisherNetworkEnumeration _network;
    private readonly int _meet;
    private readonly double _threshold;
    private readonly double _constant;

    public FisherBackwardPass(FisherNetworkEnumeration network, int meet, double threshold, double constant)
    {
        _network = network;
        _meet = meet;
        _threshold = threshold;
        _constant = constant;
    }

    private readonly record struct PastSummary(double LogMass, double Max, double Min);

    /// <summary>The probability of the qualifying tables through the meeting nodes, or null past the work limit.</summary>
    public double? Settle(List<FisherNodeKey> meetingNodes, List<FisherPastValues> meetingPasts)
    {
        int stages = _network.StageCount;
        var summaries = Summaries(meetingNodes, meetingPasts, stages);
        if (summaries is null)
        {
            return null;
        }
        double total = 0;
        var later = new Dictionary<FisherNodeKey, FisherPastValues>();
        for (int stage = stages - 1; stage >= _meet; stage--)
        {
            var (nodes, summary) = summaries[stage];
            var kept = new FisherPastValues?[nodes.Count];
            var sums = new double[nodes.Count];
            bool withinLimit = true;
            Parallel.For(0, nodes.Count, k =>
            {
                var completions = Completions(stage, nodes[k], later);
                if (completions is null)
                {
                    return;
                }
                if (!_network.AddWork(completions.Values.Length))
                {
                    withinLimit = false;
                    return;
                }
                if (stage == _meet)
                {
                    sums[k] = Join(meetingPasts[k], completions);
                    return;
                }
                var (sum, undecided) = Prune(completions, summary[k]);
                sums[k] = sum;
                kept[k] = undecided;
            });
            if (!withinLimit)
            {
                return null;
            }
            total += sums.Sum();
            later = new Dictionary<FisherNodeKey, FisherPastValues>();
            for (int k = 0; k < nodes.Count; k++)
            {
                if (kept[k] is { } values)
                {
                    later[nodes[k]] = values;
                }
            }
        }
        return total;
    }

    /// <summary>
    /// The mass and range of the undecided past values, from the meeting stage to the last column, for
    /// every node they reach (in the order first reached, so the result does not depend on threads).
    /// </summary>
    private (List<FisherNodeKey> Nodes, List<PastSummary> Summary)[]? Summaries(List<FisherNodeKey> meetingNodes, List<FisherPastValues> meetingPasts, int stages)
    {
        var result = new (List<FisherNodeKey>, List<PastSummary>)[stages];
        var summary = meetingPasts.Select(p => new PastSummary(p.LogPrefix[^1], p.Values[^1], p.Values[0])).ToList();
        result[_meet] = (meetingNodes, summary);
        for (int stage = _meet; stage < stages - 1; stage++)
        {
            var (nodes, current) = result[stage];
            var moves = new List<(double Step, FisherNodeKey Child)>[nodes.Count];
            Parallel.For(0, nodes.Count, k => moves[k] = _network.Moves(nodes[k], stage));
            var index = new Dictionary<FisherNodeKey, int>();
            var childNodes = new List<FisherNodeKey>();
            var childSummary = new List<PastSummary>();
            for (int k = 0; k < nodes.Count; k++)
            {
                var from = current[k];
                foreach (var (step, child) in moves[k])
                {
                    var arriving = new PastSummary(from.LogMass + step, from.Max + step, from.Min + step);
                    if (index.TryGetValue(child, out int c))
                    {
                        var had = childSummary[c];
                        childSummary[c] = new PastSummary(FisherPastValues.LogAdd(had.LogMass, arriving.LogMass), Math.Max(had.Max, arriving.Max), Math.Min(had.Min, arriving.Min));
                    }
                    else
                    {
                        index[child] = childNodes.Count;
                        childNodes.Add(child);
                        childSummary.Add(arriving);
                    }
                }
                if (!_network.AddWork(moves[k].Count))
                {
                    return null;
                }
            }
            result[stage + 1] = (childNodes, childSummary);
        }
        return result;
    }

    /// <summary>The distinct completion values of a node, from the kept values of its children (null when none).</summary>
    private FisherPastValues? Completions(int stage, FisherNodeKey node, Dictionary<FisherNodeKey, FisherPastValues> later)
    {
        if (stage == _network.StageCount - 1)
        {
            return FisherPastValues.Sorted([_network.LastColumnValue(node)], [1]);
        }
        var collector = new FisherValueCollector();
        foreach (var (step, child) in _network.Moves(node, stage))
        {
            if (later.TryGetValue(child, out var futures))
            {
                for (int i = 0; i < futures.Values.Length; i++)
                {
                    collector.Add(futures.Values[i] + step, futures.Counts[i]);
                }
            }
        }
        return collector.Count == 0 ? null : collector.ToPastValues();
    }

    /// <summary>Counts the completions that qualify with every past value, drops those that qualify with none, keeps the rest.</summary>
    private (double Sum, FisherPastValues? Undecided) Prune(FisherPastValues completions, PastSummary pasts)
    {
        int whole = completions.CountAtMost(_threshold - pasts.Max);
        int open = completions.CountAtMost(_threshold - pasts.Min);
        double sum = whole > 0 ? Math.Exp(_constant + pasts.LogMass + completions.LogPrefix[whole]) : 0;
        if (open == whole)
        {
            return (sum, null);
        }
        var values = completions.Values[whole..open];
        var counts = completions.Counts[whole..open];
        return (sum, FisherPastValues.Sorted(values, counts));
    }

    /// <summary>Sum over past values P and completion values F with P + F at most the threshold of their probabilities.</summary>
    private double Join(FisherPastValues pasts, FisherPastValues completions)
    {
        double sum = 0;
        int j = completions.Values.Length;
        for (int i = 0; i < pasts.Values.Length; i++)
        {
            double limit = _threshold - pasts.Values[i];
            while (j > 0 && completions.Values[j - 1] > limit)
            {
                j--;
            }
            if (j == 0)
            {
                break;
            }
            sum += pasts.Counts[i] * Math.Exp(_constant + pasts.Values[i] + completions.LogPrefix[j]);
        }
        return sum;
    }
}
