using System.Globalization;
using System.Text;

namespace OutputForge.Choices;

/// <summary>
/// The section of docs/methods.md that lists every name of <see cref="MethodCatalog"/>: written from the catalogue, so
/// that a test can hold the page to it (the page stays readable without the program).
/// </summary>
public static class MethodCatalogPage
{
    public const string Start = "<!-- method catalogue: generated from src/OutputForge/Choices/MethodCatalog.cs; a test keeps it equal -->";
    public const string End = "<!-- end of method catalogue -->";

    public static string Text()
    {
        var text = new StringBuilder();
        text.Append(Start).Append('\n');
        foreach (var set in MethodCatalog.All)
        {
            text.Append('\n').Append(CultureInfo.InvariantCulture, $"**{set.Title}** (`{set.Key}`)").Append('\n').Append('\n');
            text.Append("| name | meaning |\n| --- | --- |\n");
            foreach (var name in set.Names)
            {
                text.Append(CultureInfo.InvariantCulture, $"| `{name}`{(name == set.DefaultName ? " (default)" : "")} | {set.Describe(name)} |\n");
            }
            foreach (var retired in set.Retired)
            {
                text.Append(CultureInfo.InvariantCulture, $"| `{retired.Old}` | no longer accepted: an error names `{retired.New}` |\n");
            }
        }
        text.Append('\n').Append("**Numbers**\n\n| option | accepted | default |\n| --- | --- | --- |\n");
        foreach (var range in MethodCatalog.Ranges)
        {
            var accepted = range.Describe();
            text.Append(CultureInfo.InvariantCulture, $"| `{range.Key}` | {accepted[..accepted.IndexOf(" (e.g.", StringComparison.Ordinal)]} | {range.Default.ToString("R", System.Globalization.CultureInfo.InvariantCulture)} |\n");
        }
        foreach (var key in MethodCatalog.RetiredKeys)
        {
            text.Append('\n').Append(CultureInfo.InvariantCulture, $"The key `{key.Old}` is no longer accepted: an error names `{key.New}`.\n");
        }
        text.Append('\n').Append(End);
        return text.ToString();
    }
}
