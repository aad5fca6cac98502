namespace OutputForge.Demo;

/// <summary>
/// The demo study's specs (specs/demo) and the spec schemas (specs/schema), embedded in the
/// assembly so that `outputforge demo` can write a complete, runnable package anywhere.
/// </summary>
public static class DemoSpecFiles
{
    private const string DemoPrefix = "OutputForge.DemoSpecs.";

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
        foreach (var name in Spec.SpecSchemas.Names)
        {
            var target = Path.Combine(root, "specs", "schema", name);
            Directory.CreateDirectory(Path.GetDirectoryName(target)!);
            File.WriteAllText(target, Spec.SpecSchemas.Text(name), new System.Text.UTF8Encoding(false));
        }
        foreach (var resource in assembly.GetManifestResourceNames().Where(r => r.StartsWith(DemoPrefix, StringComparison.Ordinal))
                     .Order(StringComparer.Ordinal))
        {
            var target = Path.Combine(root, "specs", "demo", resource[DemoPrefix.Length..].Replace('\\', '/'));
            Directory.CreateDirectory(Path.GetDirectoryName(target)!);
            using var input = assembly.GetManifestResourceStream(resource)!;
            using var output = File.Create(target);
            input.CopyTo(output);
        }
        return Path.Combine(root, "specs", "demo", "study.json");
    }
}
