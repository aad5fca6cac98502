namespace OutputForge.Layout;

/// <summary>A column grouping that cannot be drawn, e.g. because its columns are not side by side.</summary>
public sealed class ColumnGroupException : Exception
{
    public ColumnGroupException(string where, string message) : base(message)
    {
        Where = where;
    }

    /// <summary>The <see cref="ColumnGroup.Where"/> of the group at fault.</summary>
    public string Where { get; }
}
