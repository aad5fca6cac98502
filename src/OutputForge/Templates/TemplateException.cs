namespace OutputForge.Templates;

/// <summary>A template that cannot be parsed or rendered; the message names the file, line and column.</summary>
public sealed class TemplateException : Exception
{
    public TemplateException(string file, int line, int column, string message)
        : base($"{file}:{line}:{column}: template error: {message}")
    {
        File = file;
        Line = line;
        Column = column;
    }

    public TemplateException(string message) : base(message)
    {
        File = string.Empty;
    }

    public string File { get; }

    public int Line { get; }

    public int Column { get; }
}
