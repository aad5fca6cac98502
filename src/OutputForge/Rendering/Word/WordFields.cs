using DocumentFormat.OpenXml;
using DocumentFormat.OpenXml.Wordprocessing;
using WordprocessingText = DocumentFormat.OpenXml.Wordprocessing.Text;

namespace OutputForge.Rendering.Word;

/// <summary>
/// Complex fields (ECMA-376 Part 1, 17.16.5 and 17.16.18): begin, instruction, separate, the
/// cached result shown before the application updates the field, end. Instructions may nest
/// other fields, e.g. IF { PAGE } > { PAGEREF ... }.
/// </summary>
public static class WordFields
{
    /// <summary>A simple field such as PAGE or NUMPAGES with its cached result.</summary>
    public static IEnumerable<Run> Simple(string instruction, string cached) =>
        Nested([Instruction(instruction)], cached);

    /// <summary>A field whose instruction is made of the given runs (instruction text and nested fields).</summary>
    public static IEnumerable<Run> Nested(IEnumerable<Run> instruction, string cached)
    {
        yield return new Run(new FieldChar { FieldCharType = FieldCharValues.Begin });
        foreach (var run in instruction)
            yield return run;
        yield return new Run(new FieldChar { FieldCharType = FieldCharValues.Separate });
        yield return new Run(new WordprocessingText(cached) { Space = SpaceProcessingModeValues.Preserve });
        yield return new Run(new FieldChar { FieldCharType = FieldCharValues.End });
    }

    public static Run Instruction(string text) =>
        new(new FieldCode(" " + text + " ") { Space = SpaceProcessingModeValues.Preserve });

    /// <summary>A field-instruction string argument: quoted, with inner quotes escaped (17.16.4.1).</summary>
    public static string Quoted(string text) => "\"" + text.Replace("\\", "\\\\", StringComparison.Ordinal).Replace("\"", "\\\"", StringComparison.Ordinal) + "\"";
}
