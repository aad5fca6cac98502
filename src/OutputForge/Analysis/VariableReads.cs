using OutputForge.Expressions;

namespace OutputForge.Analysis;

/// <summary>
/// The variables an analysis reads, by dataset name, as its kind declares them from the study and table specs alone
/// (<see cref="ITableAnalysis.Reads"/>): what a kind's shell stand-in must provide, and what a run needs of each
/// file. A test runs every demo table with every lookup recorded and fails when the analysis looks up a variable its
/// declaration lacks.
/// </summary>
public sealed class VariableReads
{
    /// <summary>The subject-level dataset's name in a study spec.</summary>
    public const string SubjectLevel = "adsl";

    private readonly Dictionary<string, SortedSet<string>> _byDataset = new(StringComparer.Ordinal);
    private readonly HashSet<(string Dataset, string Variable)> _optional = [];
    private readonly Dictionary<(string Dataset, string Variable), string> _alternative = [];

    /// <summary>The declared variables of each dataset (upper case, as ADaM names them).</summary>
    public IReadOnlyDictionary<string, SortedSet<string>> ByDataset => _byDataset;

    /// <summary>A variable the analysis reads (and fails without); none for a null name.</summary>
    public VariableReads Add(string dataset, string? variable)
    {
        if (variable is not null)
        {
            Set(dataset).Add(variable.ToUpperInvariant());
        }
        return this;
    }

    public VariableReads Add(string dataset, IEnumerable<string> variables)
    {
        foreach (var variable in variables)
        {
            Add(dataset, variable);
        }
        return this;
    }

    /// <summary>Every variable a condition names (none for a null condition).</summary>
    public VariableReads AddCondition(string dataset, string? condition) =>
        condition is null ? this : Add(dataset, ConditionVariables(ConditionParser.Parse(condition)));

    /// <summary>A variable the analysis uses when the dataset has it and does without otherwise.</summary>
    public VariableReads AddOptional(string dataset, string variable)
    {
        Add(dataset, variable);
        _optional.Add((dataset, variable.ToUpperInvariant()));
        return this;
    }

    /// <summary>A variable read from the record's own dataset when it has it, else from the subject's ADSL row (<see cref="RecordVariable"/>).</summary>
    public VariableReads AddRecordOrSubjectLevel(string dataset, string variable)
    {
        Add(dataset, variable).Add(SubjectLevel, variable);
        _alternative[(dataset, variable.ToUpperInvariant())] = SubjectLevel;
        _alternative[(SubjectLevel, variable.ToUpperInvariant())] = dataset;
        return this;
    }

    public bool Contains(string dataset, string variable) =>
        _byDataset.TryGetValue(dataset, out var set) && set.Contains(variable.ToUpperInvariant());

    /// <summary>
    /// Whether data offering <paramref name="has"/> (dataset, variable) give the analysis this variable: the dataset has
    /// it, or the variable may come from another dataset that has it, or the analysis does without it.
    /// </summary>
    public bool IsProvided(string dataset, string variable, Func<string, string, bool> has)
    {
        var key = (dataset, variable.ToUpperInvariant());
        return has(dataset, variable) || _optional.Contains(key)
            || (_alternative.TryGetValue(key, out var other) && has(other, variable));
    }

    private SortedSet<string> Set(string dataset)
    {
        if (!_byDataset.TryGetValue(dataset, out var set))
        {
            set = new SortedSet<string>(StringComparer.Ordinal);
            _byDataset[dataset] = set;
        }
        return set;
    }

    private static IEnumerable<string> ConditionVariables(ConditionNode node) => node switch
    {
        AndNode and => ConditionVariables(and.Left).Concat(ConditionVariables(and.Right)),
        OrNode or => ConditionVariables(or.Left).Concat(ConditionVariables(or.Right)),
        NotNode not => ConditionVariables(not.Operand),
        ComparisonNode comparison => [comparison.Variable],
        InListNode list => [list.Variable],
        MissingTestNode missing => [missing.Variable],
        _ => throw new InvalidOperationException($"no variables known of a condition node {node.GetType().Name}"),
    };
}
