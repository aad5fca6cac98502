namespace OutputForge.Stats.Exact;

/// <summary>
/// The backward half of <see cref="FisherNetworkEnumeration"/>: the columns after the meeting stage,
/// run from the last one back, then joined with the forward pass's past values at the meeting stage.
/// <para>
/// First the meeting column is split as in the forward pass (<see cref="FisherNetworkEnumeration.SplitMoves"/>):
/// past values whose every completion qualifies are counted, those that can never qualify dropped,
/// and the rest, per way of filling the column, form a carry to a child node, which is not gathered
/// into a list. The carries are followed to the end in summary only: for every node they can reach,
/// the log of their total mass (sum of exp(past value)) and their largest and smallest past value.
/// Then, from the last column back, each node collects the distinct values of its completions (the
/// last column is forced; an earlier node adds each way of filling its column to the kept values of
/// the child). A completion value F of a node is counted whole when F plus the largest past value
/// reaching the node is at most the threshold (every table through it qualifies: its probability is
/// exp(K + F) times the node's past mass), dropped when F plus the smallest past value exceeds it, and
/// kept for the node's parents otherwise. A counted or dropped completion is not passed back, so no
/// table is counted twice. Last, each carry is joined with the kept completions of its child
/// (<see cref="FisherMeetingJoin"/>).
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
        var (counted, carries) = _network.SplitMoves(_meet, meetingNodes, meetingPasts, _threshold, _constant);
        var weights = new FisherMeetingJoin.Scale?[meetingPasts.Count];
        Parallel.For(0, meetingPasts.Count, k => weights[k] = FisherMeetingJoin.Scale.Of(meetingPasts[k]));
        var summaries = Summaries(carries, meetingPasts, weights, stages);
        if (summaries is null)
        {
            return null;
        }
        double total = counted;
        var later = new Dictionary<FisherNodeKey, FisherPastValues>();
        for (int stage = stages - 1; stage > _meet; stage--)
        {
            var (nodes, summary) = summaries[stage];
            var kept = new FisherPastValues?[nodes.Count];
            var sums = new double[nodes.Count];
            bool withinLimit = true;
            Parallel.For(0, nodes.Count, k =>
            {
                var (sum, undecided, work) = Completions(stage, nodes[k], summary[k], later);
                sums[k] = sum;
                kept[k] = undecided;
                if (!_network.AddWork(work))
                {
                    withinLimit = false;
                }
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
        double? joined = Join(carries, meetingPasts, weights, later);
        return joined is null ? null : total + joined.Value;
    }

    /// <summary>
    /// The mass and range of the carried past values, from the stage after the meeting one to the last
    /// column, for every node they reach (in the order first reached, so the result does not depend on
    /// threads).
    /// </summary>
    private (List<FisherNodeKey> Nodes, List<PastSummary> Summary)[]? Summaries(
        List<FisherNetworkEnumeration.Carry>[] carries, List<FisherPastValues> meetingPasts, FisherMeetingJoin.Scale?[] weights, int stages)
    {
        var result = new (List<FisherNodeKey>, List<PastSummary>)[stages];
        var first = new SummaryBuilder();
        foreach (var list in carries)
        {
            foreach (var carry in list)
            {
                var pasts = meetingPasts[carry.Parent];
                double logMass = RangeLogMass(pasts, weights[carry.Parent], carry.From, carry.To);
                first.Add(carry.Child, new PastSummary(logMass + carry.Step, pasts.Values[carry.To - 1] + carry.Step, pasts.Values[carry.From] + carry.Step));
            }
            if (!_network.AddWork(list.Count))
            {
                return null;
            }
        }
        result[_meet + 1] = (first.Nodes, first.Summary);
        for (int stage = _meet + 1; stage < stages - 1; stage++)
        {
            var (nodes, current) = result[stage];
            var moves = new List<(double Step, FisherNodeKey Child)>[nodes.Count];
            Parallel.For(0, nodes.Count, k => moves[k] = _network.Moves(nodes[k], stage));
            var next = new SummaryBuilder();
            for (int k = 0; k < nodes.Count; k++)
            {
                var from = current[k];
                foreach (var (step, child) in moves[k])
                {
                    next.Add(child, new PastSummary(from.LogMass + step, from.Max + step, from.Min + step));
                }
                if (!_network.AddWork(moves[k].Count))
                {
                    return null;
                }
            }
            result[stage + 1] = (next.Nodes, next.Summary);
        }
        return result;
    }

    /// <summary>
    /// log of the sum of count x exp(value) over past values [from, to) of a node: the difference of two
    /// running sums of the weights when it keeps at least a thousandth of the larger one (so that
    /// cancellation costs at most about 3 digits of the 16), otherwise summed directly.
    /// </summary>
    private static double RangeLogMass(FisherPastValues pasts, FisherMeetingJoin.Scale? weights, int from, int to)
    {
        if (weights is not null)
        {
            double difference = weights.Prefix[to] - weights.Prefix[from];
            if (difference >= 1e-3 * weights.Prefix[to])
            {
                return Math.Log(difference) + weights.Reference;
            }
            double sum = 0;
            for (int i = from; i < to; i++)
            {
                sum += weights.Weights[i];
            }
            return Math.Log(sum) + weights.Reference;
        }
        double log = double.NegativeInfinity;
        for (int i = from; i < to; i++)
        {
            log = FisherPastValues.LogAdd(log, Math.Log(pasts.Counts[i]) + pasts.Values[i]);
        }
        return log;
    }

    /// <summary>Summaries of the nodes of one stage, merged as they arrive.</summary>
    private sealed class SummaryBuilder
    {
        private readonly Dictionary<FisherNodeKey, int> _index = [];

        public List<FisherNodeKey> Nodes { get; } = [];
        public List<PastSummary> Summary { get; } = [];

        public void Add(FisherNodeKey node, PastSummary arriving)
        {
            if (_index.TryGetValue(node, out int c))
            {
                var had = Summary[c];
                Summary[c] = new PastSummary(FisherPastValues.LogAdd(had.LogMass, arriving.LogMass), Math.Max(had.Max, arriving.Max), Math.Min(had.Min, arriving.Min));
            }
            else
            {
                _index[node] = Nodes.Count;
                Nodes.Add(node);
                Summary.Add(arriving);
            }
        }
    }

    /// <summary>
    /// The completions of a node, decided against the past values that reach it: those that qualify with
    /// the largest past value are summed (times the node's past mass), those that fail with the smallest
    /// are dropped, and the distinct values of the rest are kept for the node's parents. A child's kept
    /// values are sorted, so for each way of filling the column the three groups are two binary searches
    /// apart and only the undecided ones are gathered. Returns the sum, the kept values (null when none)
    /// and the work done.
    /// </summary>
    private (double Sum, FisherPastValues? Undecided, long Work) Completions(int stage, FisherNodeKey node, PastSummary pasts, Dictionary<FisherNodeKey, FisherPastValues> later)
    {
        double wholeLimit = _threshold - pasts.Max;
        double openLimit = _threshold - pasts.Min;
        if (stage == _network.StageCount - 1)
        {
            double forced = _network.LastColumnValue(node);
            return forced <= wholeLimit ? (Math.Exp(_constant + pasts.LogMass + forced), null, 1)
                : forced <= openLimit ? (0, FisherPastValues.Sorted([forced], [1]), 1)
                : (0, null, 1);
        }
        var collector = new FisherValueCollector();
        double logWhole = double.NegativeInfinity;
        long work = 0;
        foreach (var (step, child) in _network.Moves(node, stage))
        {
            if (later.TryGetValue(child, out var futures))
            {
                int whole = futures.CountAtMost(wholeLimit - step);
                int open = futures.CountAtMost(openLimit - step);
                if (whole > 0)
                {
                    logWhole = FisherPastValues.LogAdd(logWhole, step + futures.LogPrefix[whole]);
                }
                for (int i = whole; i < open; i++)
                {
                    collector.Add(futures.Values[i] + step, futures.Counts[i]);
                }
                work += open - whole + 1;
            }
        }
        double sum = double.IsNegativeInfinity(logWhole) ? 0 : Math.Exp(_constant + pasts.LogMass + logWhole);
        return (sum, collector.Count == 0 ? null : collector.ToPastValues(), work);
    }

    /// <summary>
    /// Joins every carry of the meeting column with the kept completions of its child
    /// (<see cref="FisherMeetingJoin"/>); null past the work limit.
    /// </summary>
    private double? Join(List<FisherNetworkEnumeration.Carry>[] carries, List<FisherPastValues> meetingPasts, FisherMeetingJoin.Scale?[] weights, Dictionary<FisherNodeKey, FisherPastValues> later)
    {
        var children = later.ToArray();
        var scales = new FisherMeetingJoin.Scale?[children.Length];
        Parallel.For(0, children.Length, c => scales[c] = FisherMeetingJoin.Scale.Of(children[c].Value));
        var index = new Dictionary<FisherNodeKey, int>();
        for (int c = 0; c < children.Length; c++)
        {
            index[children[c].Key] = c;
        }
        var sums = new double[carries.Length];
        bool withinLimit = true;
        Parallel.For(0, carries.Length, k =>
        {
            var pasts = meetingPasts[k];
            double sum = 0;
            long work = 0;
            foreach (var carry in carries[k])
            {
                if (index.TryGetValue(carry.Child, out int c))
                {
                    sum += FisherMeetingJoin.Sum(pasts, weights[k], carry.From, carry.To, children[c].Value, scales[c], _threshold - carry.Step, _constant + carry.Step);
                    work += carry.To - carry.From;
                }
            }
            sums[k] = sum;
            if (!_network.AddWork(work))
            {
                withinLimit = false;
            }
        });
        return withinLimit ? sums.Sum() : null;
    }
}
