using System.Text.Json;
using System.Text.Json.Nodes;
using Json.Schema;
using OutputForge.Naming;

namespace OutputForge.Spec;

/// <summary>
/// Reads one spec file: JSON syntax, then the shipped JSON Schema (every violation reported, with
/// line, column and JSON path), then the typed model.
/// </summary>
internal static class SpecFileReader
{
    /// <summary>How the typed models are read from a spec: also used by the kinds to read their settings.</summary>
    public static readonly JsonSerializerOptions ModelOptions = new()
    {
        PropertyNamingPolicy = JsonNamingPolicy.CamelCase,
        TypeInfoResolver = new System.Text.Json.Serialization.Metadata.DefaultJsonTypeInfoResolver(),
        ReadCommentHandling = JsonCommentHandling.Skip,
        AllowTrailingCommas = true,
        Converters = { new ChoiceJsonConverterFactory(), new ArmChoiceJsonConverter() },
    };

    /// <summary>The largest spec file read: specs are a few kilobytes; 16 MB is far beyond any real one.</summary>
    public const long MaxSpecBytes = 16 << 20;

    public static T Read<T>(string file, string schemaName, Action<T, SpecSource> attach)
    {
        byte[] bytes;
        try
        {
            bytes = Files.RegularFile.ReadAllBytes(file, MaxSpecBytes, "a spec file may hold", problem => new SpecException(new SpecProblem(file, null, null, "$", problem)));
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            throw new SpecException(new SpecProblem(file, null, null, "$", $"cannot read the spec file ({e.Message})") { Code = SpecProblemCode.UnreadableFile });
        }
        if (bytes.AsSpan().StartsWith((ReadOnlySpan<byte>)[0xEF, 0xBB, 0xBF]))
        {
            // A UTF-8 byte-order mark, as some editors write: accepted, as in the data files.
            bytes = bytes[3..];
        }
        JsonDocument document;
        try
        {
            document = JsonDocument.Parse(bytes, new JsonDocumentOptions
            {
                CommentHandling = JsonCommentHandling.Skip,
                AllowTrailingCommas = true,
            });
        }
        catch (JsonException e)
        {
            var message = e.Message;
            // The reader's message repeats the position (0-based "LineNumber: 8 | BytePositionInLine: 2") and the path;
            // the problem gives both once, 1-based, in its own format.
            var cut = message.IndexOf(" LineNumber:", StringComparison.Ordinal) is > 0 and var at ? at : message.IndexOf(" Path:", StringComparison.Ordinal);
            if (cut > 0)
            {
                message = message[..cut];
            }
            throw new SpecException(new SpecProblem(file, (int?)e.LineNumber + 1, (int?)e.BytePositionInLine + 1,
                JsonPositionMap.FailurePath(bytes), $"invalid JSON: {Describe(bytes, message.TrimEnd('.'))}") { Code = SpecProblemCode.InvalidJson });
        }
        using (document)
        {
            var positions = JsonPositionMap.Build(bytes);
            if (positions.DuplicateKeys.Count > 0)
            {
                // The readers keep the last of two equal keys without a word: a spec saying two things is refused.
                throw new SpecException(positions.DuplicateKeys.Select(d => new SpecProblem(file, d.Line, d.Column,
                    JsonPositionMap.ToJsonPath(d.Pointer),
                    $"the key '{LastSegment(d.Pointer)}' is given twice in this object (first on line {d.FirstLine}); keep one") { Code = SpecProblemCode.InvalidJson }).ToList());
            }
            var source = new SpecSource(file, positions);
            var problems = SpecText.Problems(document.RootElement, source) is { Count: > 0 } text ? text : Validate(document.RootElement, schemaName, source);
            if (problems.Count > 0)
            {
                throw new SpecException(problems);
            }
            try
            {
                var model = document.RootElement.Deserialize<T>(ModelOptions)
                    ?? throw new SpecException(source.Problem(string.Empty, "the spec is empty"));
                attach(model, source);
                return model;
            }
            catch (JsonException e)
            {
                // The schema refuses what the model cannot read; this guards a model that asks more than its schema.
                throw new SpecException(source.Problem(PointerOf(e.Path), e.Message));
            }
        }
    }

    private static string LastSegment(string pointer) =>
        pointer[(pointer.LastIndexOf('/') + 1)..].Replace("~1", "/").Replace("~0", "~");

    /// <summary>The parser's description of a syntax error, in the spec writer's terms where it is cryptic.</summary>
    private static string Describe(byte[] bytes, string message)
    {
        if (message.Contains("maximum configured depth", StringComparison.OrdinalIgnoreCase))
        {
            return "the objects and arrays are nested more than 64 levels deep";
        }
        if (bytes.Length >= 2 && ((bytes[0] == 0xFF && bytes[1] == 0xFE) || (bytes[0] == 0xFE && bytes[1] == 0xFF)))
        {
            return "the file is UTF-16 encoded (it starts with a UTF-16 byte-order mark); save it as UTF-8";
        }
        return message;
    }

    /// <summary>"/statistics/test" for the reader's "$.statistics.test" (and "/tables/0" for "$.tables[0]").</summary>
    private static string PointerOf(string? path) =>
        path is null ? string.Empty : path.TrimStart('$').Replace("[", ".").Replace("]", string.Empty).Replace('.', '/');

    private static List<SpecProblem> Validate(JsonElement root, string schemaName, SpecSource source)
    {
        var (schema, schemaNode) = SpecSchemas.Get(schemaName);
        var results = schema.Evaluate(root, new EvaluationOptions { OutputFormat = OutputFormat.List });
        var problems = new List<SpecProblem>();
        if (results.IsValid)
        {
            return problems;
        }
        var seen = new HashSet<string>(StringComparer.Ordinal);
        foreach (var detail in results.Details ?? [])
        {
            if (detail.Errors is null)
            {
                continue;
            }
            foreach (var (keyword, message) in detail.Errors)
            {
                var pointer = detail.InstanceLocation.ToString();
                var evaluationPath = detail.EvaluationPath.ToString();
                var problem = Explain(keyword, message, pointer, evaluationPath, schemaNode, source, root);
                if (problem is not null && seen.Add(problem.ToString()))
                {
                    problems.Add(problem);
                }
            }
        }
        return WithoutTypoEchoes(problems)
            .OrderBy(p => p.Line ?? int.MaxValue)
            .ThenBy(p => p.Column ?? int.MaxValue)
            .ToList();
    }

    /// <summary>
    /// A mistyped key produces two problems: the unknown key and the required key it was meant to
    /// be. Only the first says what to do, so the second is dropped.
    /// </summary>
    private static IEnumerable<SpecProblem> WithoutTypoEchoes(List<SpecProblem> problems)
    {
        var meant = problems
            .Where(p => p.Code == SpecProblemCode.UnknownKey && p.Suggestion is not null)
            .Select(p => p.Suggestion!)
            .ToHashSet(StringComparer.Ordinal);
        return problems.Where(p => !(p.Code == SpecProblemCode.MissingKey && p.Key is not null && meant.Contains(p.Key)));
    }

    /// <summary>Turns one schema error into a message in the spec writer's terms.</summary>
    private static SpecProblem? Explain(string keyword, string message, string pointer, string evaluationPath,
        JsonNode schemaRoot, SpecSource source, JsonElement root)
    {
        // A failed "if" only chooses whether "then" applies: it is not a problem of the spec.
        if (evaluationPath.Contains("/if", StringComparison.Ordinal))
        {
            return null;
        }
        var schemaNode = Navigate(schemaRoot, evaluationPath);
        var keywordNode = schemaNode is JsonObject obj && keyword.Length > 0 ? obj[keyword] : null;
        if (evaluationPath.EndsWith("/additionalProperties", StringComparison.Ordinal) && schemaNode is JsonValue)
        {
            var parent = Navigate(schemaRoot, evaluationPath[..^"/additionalProperties".Length]);
            var allowed = (parent?["properties"] as JsonObject)?.Select(p => p.Key).Where(k => k != "$schema").ToList() ?? [];
            var key = pointer[(pointer.LastIndexOf('/') + 1)..].Replace("~1", "/").Replace("~0", "~");
            if (MethodCatalog.RetiredKeys.FirstOrDefault(r => r.Old == key && allowed.Contains(r.New)) is { } retired)
            {
                return source.KeyProblem(pointer, $"unknown key '{key}' (now called '{retired.New}')")
                    with { Code = SpecProblemCode.UnknownKey, Key = key, Expected = allowed, Suggestion = retired.New };
            }
            return source.KeyProblem(pointer, $"unknown key '{key}'{NearestName.Hint(key, allowed)}")
                with { Code = SpecProblemCode.UnknownKey, Key = key, Expected = allowed, Suggestion = NearestName.Find(key, allowed) };
        }
        switch (keyword)
        {
            case "":
                return null;
            case "enum":
                return NotAChoice(keywordNode as JsonArray ?? [], pointer, source, root);
            case "required":
                var requiredList = (keywordNode as JsonArray)?.Select(v => v!.GetValue<string>()).ToList() ?? [];
                var missing = MissingKeys(message, requiredList);
                return source.Problem(SpecProblemCode.MissingKey, pointer, $"missing required key{(missing.Count == 1 ? "" : "s")}: {string.Join(", ", missing.Select(m => $"'{m}'"))}")
                    with { Key = missing.Count == 1 ? missing[0] : null, Expected = missing };
            case "type":
                return source.Problem(SpecProblemCode.WrongType, pointer, $"expected {Describe(keywordNode)}: {message}");
            case "pattern" when evaluationPath.EndsWith("/propertyNames", StringComparison.Ordinal):
                return KeyPatternProblem(pointer, keywordNode?.GetValue<string>(), source);
            case "pattern" when pointer.StartsWith("/data/datasets/", StringComparison.Ordinal) && pointer.EndsWith("/file", StringComparison.Ordinal):
                return source.Problem(pointer, "expected an XPT file name in the data folder (no folders), ending in .xpt: only an XPT transport file holds several datasets (members)");
            case "pattern" when pointer.StartsWith("/data/datasets/", StringComparison.Ordinal) && pointer.EndsWith("/member", StringComparison.Ordinal):
                return source.Problem(pointer, "expected a member name as an XPT file gives it: a letter or '_', then up to 7 letters, digits or '_'");
            case "pattern" when pointer.StartsWith("/data/datasets/", StringComparison.Ordinal):
                return source.Problem(pointer, "expected a data file name in the data folder (no folders), ending in .csv, .xpt, .json or .ndjson");
            default:
                return source.Problem(pointer, message);
        }
    }

    /// <summary>The schemas' one pattern for names chosen by the spec's author (populations, datasets).</summary>
    private const string NamePattern = "^[a-z][a-z0-9_]*$";

    /// <summary>A key that is a name of the author's choosing but not of the allowed form: what the form is, and the key that would do.</summary>
    private static SpecProblem KeyPatternProblem(string pointer, string? pattern, SpecSource source)
    {
        var key = pointer[(pointer.LastIndexOf('/') + 1)..].Replace("~1", "/").Replace("~0", "~");
        if (pattern != NamePattern)
        {
            return source.KeyProblem(pointer, $"key '{key}' does not have the required form (the pattern {pattern})");
        }
        var lower = key.ToLowerInvariant();
        var suggestion = System.Text.RegularExpressions.Regex.IsMatch(lower, NamePattern) ? $" (did you mean '{lower}'?)" : string.Empty;
        return source.KeyProblem(pointer, $"key '{key}' must start with a lower-case letter and hold only lower-case letters, digits and '_'{suggestion}");
    }

    /// <summary>
    /// A value outside an enum: the accepted values as data, and where the value is a retired name of a catalogue option
    /// (e.g. "table" for the column scores), the message names the name that replaced it.
    /// </summary>
    private static SpecProblem NotAChoice(JsonArray allowed, string pointer, SpecSource source, JsonElement root)
    {
        var names = allowed.Select(v => v is JsonValue value && value.TryGetValue<string>(out var name) ? name : v?.ToJsonString() ?? "null").ToList();
        var listed = string.Join(", ", allowed.Select(v => v?.ToJsonString()));
        var written = ValueAt(root, pointer) is { ValueKind: JsonValueKind.String } element ? element.GetString() : null;
        var retired = written is null ? null : MethodCatalog.All
            .Where(set => set.Names.SequenceEqual(names))
            .SelectMany(set => set.Retired)
            .FirstOrDefault(r => r.Old == written);
        if (retired is not null)
        {
            return source.Problem(SpecProblemCode.RetiredName, pointer, $"'{written}' is now called '{retired.New}'; expected one of {listed}")
                with { Key = written, Expected = names, Suggestion = retired.New };
        }
        return source.Problem(SpecProblemCode.NotAChoice, pointer, $"expected one of {listed}")
            with { Key = written, Expected = names, Suggestion = written is null ? null : NearestName.Find(written, names) };
    }

    /// <summary>The value a JSON Pointer names in the document, or null where it names none.</summary>
    private static JsonElement? ValueAt(JsonElement root, string pointer)
    {
        var current = root;
        foreach (var raw in pointer.Split('/', StringSplitOptions.RemoveEmptyEntries))
        {
            var segment = raw.Replace("~1", "/").Replace("~0", "~");
            if (current.ValueKind == JsonValueKind.Object && current.TryGetProperty(segment, out var child))
            {
                current = child;
            }
            else if (current.ValueKind == JsonValueKind.Array && int.TryParse(segment, out var index) && index < current.GetArrayLength())
            {
                current = current[index];
            }
            else
            {
                return null;
            }
        }
        return current;
    }

    private static List<string> MissingKeys(string message, List<string> required)
    {
        var named = required.Where(r => message.Contains('"' + r + '"', StringComparison.Ordinal)).ToList();
        return named.Count > 0 ? named : required;
    }

    private static string Describe(JsonNode? typeNode) => typeNode switch
    {
        JsonValue value => "a value of type " + value.GetValue<string>(),
        JsonArray array => "one of the types " + string.Join(", ", array.Select(a => a!.GetValue<string>())),
        _ => "another type",
    };

    /// <summary>Follows a schema evaluation path (a JSON Pointer into the schema, with local $ref steps).</summary>
    private static JsonNode? Navigate(JsonNode root, string evaluationPath)
    {
        JsonNode? current = root;
        foreach (var raw in evaluationPath.Split('/', StringSplitOptions.RemoveEmptyEntries))
        {
            var segment = raw.Replace("~1", "/").Replace("~0", "~");
            if (current is null)
            {
                return null;
            }
            if (segment == "$ref" && current["$ref"] is JsonValue reference)
            {
                current = Navigate(root, reference.GetValue<string>().TrimStart('#'));
                continue;
            }
            current = current switch
            {
                JsonObject obj => obj[segment],
                JsonArray array when int.TryParse(segment, out var index) && index < array.Count => array[index],
                _ => null,
            };
        }
        return current;
    }
}
