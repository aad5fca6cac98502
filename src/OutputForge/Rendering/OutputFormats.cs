using OutputForge.Rendering.Excel;
using OutputForge.Rendering.Text;
using OutputForge.Rendering.Word;

namespace OutputForge.Rendering;

/// <summary>The output formats a run can write, by the names the command line accepts.</summary>
internal static class OutputFormats
{
    public static readonly IReadOnlyList<string> Default = ["docx", "xlsx"];

    public static IReadOnlyList<string> Names => ["docx", "xlsx", "txt"];

    public static ITableRenderer? Find(string name) => name.Trim().ToLowerInvariant() switch
    {
        "docx" => new WordTableRenderer(),
        "xlsx" => new ExcelTableRenderer(),
        "txt" or "text" => new TextTableRenderer(),
        _ => null,
    };
}
