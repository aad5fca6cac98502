using System.Text.Json;
using OutputForge.Common;

namespace OutputForge.Spec;

/// <summary>
/// Checks every text of a spec against the document text rule (<see cref="DocumentText"/>) before anything else reads
/// it: a title with a control character, a noncharacter, a lone surrogate escape (\ud800) or more text than a table
/// cell holds is reported at its JSON path instead of failing later inside a document writer.
/// </summary>
internal static class SpecText
{
    public static List<SpecProblem> Problems(JsonElement root, SpecSource source)
    {
        var problems = new List<SpecProblem>();
        Walk(root, string.Empty, source, problems);
        return problems;
    }

    private static void Walk(JsonElement element, string pointer, SpecSource source, List<SpecProblem> problems)
    {
        switch (element.ValueKind)
        {
            case JsonValueKind.Object:
                foreach (var property in element.EnumerateObject())
                {
                    string name;
                    try
                    {
                        name = property.Name;
                    }
                    catch (InvalidOperationException)
                    {
                        problems.Add(source.Problem(pointer, "a key holds a lone UTF-16 surrogate escape (such as \\ud800 without its pair)"));
                        continue;
                    }
                    Walk(property.Value, $"{pointer}/{name.Replace("~", "~0").Replace("/", "~1")}", source, problems);
                }
                break;
            case JsonValueKind.Array:
                var index = 0;
                foreach (var item in element.EnumerateArray())
                {
                    Walk(item, $"{pointer}/{index++}", source, problems);
                }
                break;
            case JsonValueKind.String:
                string? text;
                try
                {
                    text = element.GetString();
                }
                catch (InvalidOperationException)
                {
                    problems.Add(source.Problem(pointer,
                        "the text holds a lone UTF-16 surrogate escape (such as \\ud800 without its pair), half of a character, which Word and Excel cannot store"));
                    break;
                }
                if (DocumentText.Problem(text) is { } problem)
                {
                    problems.Add(source.Problem(pointer, problem));
                }
                break;
        }
    }
}
