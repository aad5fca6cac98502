namespace OutputForge.Demo;

/// <summary>
/// The demo study's specs (specs/demo) and the spec schemas (specs/schema), embedded in the
/// assembly so that `outputforge demo` can write a complete, runnable package anywhere.
/// </summary>
public static class DemoSpecFiles
{
    private const string DemoPrefix = "OutputForge.DemoSpecs.";
    private const string SchemaPrefix = "OutputForge.Schema.";

    /// <summary>How many tables the demo study spec lists (its "tables"), read from the embedded study.json so help texts never drift from it.</summary>
    public static int TableCount
    {
        get
        {
            using var stream = typeof(DemoSpecFiles).Assembly.GetManifestResourceStream(DemoPrefix + "study.json")!;
            using var study = System.Text.Json.JsonDocument.Parse(stream, new System.Text.Json.JsonDocumentOptions { CommentHandling = System.Text.Json.JsonCommentHandling.Skip });
            return study.RootElement.GetProperty("tables").GetArrayLength();
        }
    }

    /// <summary>Writes specs/schema/*.json and specs/demo/** under <paramref name="root"/>; returns the study file's path.</summary>
    public static string Write(string root)
    {
        var assembly = typeof(DemoSpecFiles).Assembly;
        foreach (var resource in assembly.GetManifestResourceNames().Order(StringComparer.Ordinal))
        {
            string relative;
            if (resource.StartsWith(DemoPrefix, StringComparison.Ordinal))
            {
                relative = Path.Combine("specs", "demo", resource[DemoPrefix.Length..].Replace('\\', '/'));
            }
            else if (resource.StartsWith(SchemaPrefix, StringComparison.Ordinal))
            {
                relative = Path.Combine("specs", "schema", resource[SchemaPrefix.Length..]);
            }
            else
            {
                continue;
            }
            var target = Path.Combine(root, relative);
            Directory.CreateDirectory(Path.GetDirectoryName(target)!);
            using var input = assembly.GetManifestResourceStream(resource)!;
            using var output = File.Create(target);
            input.CopyTo(output);
        }
        return Path.Combine(root, "specs", "demo", "study.json");
    }
}
