using OutputForge.Layout;

namespace OutputForge.Rendering;

/// <summary>
/// Writes one <see cref="TableDocument"/> in one file format. Renderers only draw: every number
/// and word is already decided by the Layout stage.
/// </summary>
public interface ITableRenderer
{
    /// <summary>File extension with the dot, e.g. ".docx".</summary>
    string Extension { get; }

    /// <summary>Writes the document to <paramref name="output"/> (a seekable, writable stream).</summary>
    void Write(TableDocument document, Stream output);
}
