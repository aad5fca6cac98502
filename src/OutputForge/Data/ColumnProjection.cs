namespace OutputForge.Data;

/// <summary>
/// The datasets and variables a run reads: every other dataset is left unread and every other variable is skipped
/// while its file is parsed (a CSV field is neither typed nor stored, an XPT variable's bytes are not decoded, a
/// Dataset-JSON value is passed over), so a run holds only the columns its tables use. A variable looked up that was
/// skipped is a loud error (<see cref="Dataset.Find"/>), never an empty column. Names compare as ADaM names do,
/// without regard to case.
/// </summary>
public sealed class ColumnProjection
{
    private readonly Dictionary<string, HashSet<string>> _byDataset;

    public ColumnProjection(IReadOnlyDictionary<string, IEnumerable<string>> variablesByDataset)
    {
        _byDataset = variablesByDataset.ToDictionary(d => d.Key,
            d => new HashSet<string>(d.Value, StringComparer.OrdinalIgnoreCase), StringComparer.Ordinal);
    }

    /// <summary>Whether the run reads <paramref name="dataset"/> at all.</summary>
    public bool ReadsDataset(string dataset) => _byDataset.ContainsKey(dataset);

    /// <summary>Whether the run keeps <paramref name="variable"/> of <paramref name="dataset"/>.</summary>
    public bool Reads(string dataset, string variable) =>
        _byDataset.TryGetValue(dataset, out var variables) && variables.Contains(variable);

    /// <summary>The variables kept of <paramref name="dataset"/>, or null when the dataset is not read.</summary>
    public IReadOnlySet<string>? VariablesOf(string dataset) => _byDataset.GetValueOrDefault(dataset);

    /// <summary>
    /// The test a reader applies to each variable of dataset <paramref name="dataset"/>: null (keep every variable) when
    /// <paramref name="projection"/> is null.
    /// </summary>
    public static Func<string, bool>? KeepOf(ColumnProjection? projection, string dataset) =>
        projection is null ? null : variable => projection.Reads(dataset, variable);
}
