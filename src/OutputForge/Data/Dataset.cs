using OutputForge.Expressions;

namespace OutputForge.Data;

/// <summary>A dataset read from one file: named, typed columns of equal length.</summary>
public sealed class Dataset : IVariableSource
{
    private readonly Dictionary<string, DataColumn> _columns;

    public Dataset(string name, string file, int rowCount, IReadOnlyList<DataColumn> columns, IReadOnlyList<int> lineOfRow)
    {
        Name = name;
        File = file;
        RowCount = rowCount;
        Columns = columns;
        LineOfRow = lineOfRow;
        _columns = columns.ToDictionary(c => c.Name, StringComparer.OrdinalIgnoreCase);
        foreach (var column in columns)
        {
            column.Owner ??= this;
        }
    }

    /// <summary>The dataset's name in the spec, e.g. "adsl".</summary>
    public string Name { get; }

    /// <summary>The file it was read from, as given (for messages).</summary>
    public string File { get; }

    public int RowCount { get; }

    /// <summary>The dataset's label as the file gives it (XPT and Dataset-JSON files carry one; CSV has none).</summary>
    public string? Label { get; init; }

    /// <summary>The SHA-256 (lower-case hex) of the file's bytes as read, or null for a dataset built in memory.</summary>
    public string? ContentSha256 { get; internal set; }

    public IReadOnlyList<DataColumn> Columns { get; }

    /// <summary>
    /// The line of the file on which each row starts (1-based; line 1 is the header). For an XPT or Dataset-JSON
    /// file, which has no lines in that sense, the row's own number (1-based), named "row" in the readers' messages.
    /// </summary>
    public IReadOnlyList<int> LineOfRow { get; }

    string IVariableSource.SourceName => $"dataset {Name} ({Path.GetFileName(File)})";

    IReadOnlyCollection<string> IVariableSource.VariableNames => VariableNames;

    IVariable? IVariableSource.FindVariable(string name) => Find(name);

    /// <summary>
    /// Every variable of the file, in file order, whether read or skipped (<see cref="ColumnProjection"/>): the names
    /// messages suggest from, the same whichever columns a run reads.
    /// </summary>
    public IReadOnlyList<string> VariableNames
    {
        get => _variableNames ?? Columns.Select(c => c.Name).ToList();
        init
        {
            _variableNames = value;
            _skipped = value.Where(v => !_columns.ContainsKey(v)).ToHashSet(StringComparer.OrdinalIgnoreCase);
        }
    }

    private IReadOnlyList<string>? _variableNames;
    private HashSet<string>? _skipped;

    /// <summary>The variables of the file that were skipped while it was read (none when every column was read).</summary>
    public IReadOnlyCollection<string> SkippedVariables => (IReadOnlyCollection<string>?)_skipped ?? [];

    /// <summary>
    /// The column, or null when the file has no such variable. A variable the file has but the run skipped is an error:
    /// an analysis looking it up was not declared to read it (<see cref="Analysis.VariableReads"/>), and answering "no
    /// such variable" or an empty column would give wrong numbers without a word.
    /// </summary>
    public DataColumn? Find(string name)
    {
        _lookups?.Invoke(Name, name);
        if (_columns.GetValueOrDefault(name) is { } column)
        {
            return column;
        }
        if (_skipped is not null && _skipped.Contains(name))
        {
            throw new DataException(File, null, name,
                "the variable was not read: the run reads only the variables its tables declare, and this one was not declared (an error in OutputForge; please report it)");
        }
        return null;
    }

    private Action<string, string>? _lookups;

    /// <summary>
    /// A copy sharing the columns that tells <paramref name="lookup"/> the dataset and variable name of every lookup:
    /// how tests hold what a table kind declares it reads (<see cref="Analysis.VariableReads"/>) to what it reads.
    /// </summary>
    public Dataset WithLookupsTold(Action<string, string> lookup) =>
        new(Name, File, RowCount, Columns, LineOfRow)
        {
            ContentSha256 = ContentSha256, Label = Label, _lookups = lookup,
            _variableNames = _variableNames, _skipped = _skipped,
        };

    /// <summary>The column, or a <see cref="DataException"/> naming the dataset and the nearest variable.</summary>
    public DataColumn Get(string name) =>
        Find(name) ?? throw new DataException(File, null, null,
            $"no variable {name}{Naming.NearestName.Hint(name, VariableNames)}");
}
