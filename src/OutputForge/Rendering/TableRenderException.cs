namespace OutputForge.Rendering;

/// <summary>
/// A table that cannot be drawn as given (for example header spans that do not add up to the
/// column count). The message is one line meant for the person running the tool.
/// </summary>
public sealed class TableRenderException : Exception
{
    public TableRenderException(string message) : base(message)
    {
    }
}
