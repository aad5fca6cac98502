using System.Reflection;
using OutputForge.Files;
using OutputForge.Spec;
using Scriban;
using Scriban.Parsing;
using Scriban.Runtime;
using Scriban.Syntax;
using OutputForge.Common;

namespace OutputForge.Templates;

/// <summary>
/// The templates of one run: the defaults embedded in OutputForge (the repository's templates/
/// folder), each replaced by the study's own file of the same name in templates/ beside
/// study.json. Every template is parsed when the set is loaded, so a syntax error stops the run
/// before anything is computed or written.
/// </summary>
/// <remarks>
/// The sandbox: templates see only the plain values of <see cref="TemplateValues"/> (script
/// objects, arrays, strings and numbers; no .NET object is imported and member access to .NET
/// types is filtered out), loops stop after <see cref="LoopLimit"/> iterations and nesting after
/// <see cref="RecursionLimit"/> levels, and include "name.sbn" reads only a template of the two
/// template folders, by bare file name.
/// </remarks>
public sealed class TemplateSet : ITemplateLoader
{
    public const int LoopLimit = 10_000;
    public const int RecursionLimit = 20;
    public const int OutputLimit = 1_000_000;

    private const string ResourcePrefix = "OutputForge.Templates.";

    /// <summary>Template text and the file name used in messages, by template name.</summary>
    private readonly Dictionary<string, (string Text, string File)> _sources = new(StringComparer.Ordinal);
    private readonly Dictionary<string, Template> _parsed = new(StringComparer.Ordinal);

    private TemplateSet()
    {
    }

    /// <summary>The embedded defaults, overridden by the .sbn files in <paramref name="studyFolder"/>/templates (when given).</summary>
    public static TemplateSet Load(string? studyFolder) => Load(studyFolder, studyFolder is null ? null : new SpecFolderPolicy(studyFolder));

    /// <summary>
    /// As <see cref="Load(string?)"/>, reading a template file only when it really lies (links followed) inside the
    /// folders <paramref name="folders"/> allows: a link in templates/ cannot put another file of the machine into the
    /// documents. A refused file is named, never shown.
    /// </summary>
    public static TemplateSet Load(string? studyFolder, SpecFolderPolicy? folders)
    {
        var set = new TemplateSet();
        var assembly = typeof(TemplateSet).Assembly;
        foreach (var resource in assembly.GetManifestResourceNames().Where(r => r.StartsWith(ResourcePrefix, StringComparison.Ordinal)))
        {
            var name = resource[ResourcePrefix.Length..];
            set._sources[name] = (ReadResource(assembly, resource), $"{TemplateNames.Folder}/{name} (built in)");
        }
        var folder = studyFolder is null ? null : Path.Combine(studyFolder, TemplateNames.Folder);
        if (folder is not null && Directory.Exists(folder))
        {
            foreach (var file in Directory.GetFiles(folder, "*.sbn").Order(StringComparer.Ordinal))
                set._sources[Path.GetFileName(file)] = (ReadStudyTemplate(file, folders), Path.GetRelativePath(studyFolder!, file).Replace('\\', '/'));
        }
        foreach (var name in TemplateNames.All)
        {
            if (!set._sources.ContainsKey(name))
                throw new TemplateException($"{TemplateNames.Folder}/{name}: the built-in template is absent");
        }
        foreach (var name in set._sources.Keys.Order(StringComparer.Ordinal))
            set._parsed[name] = set.Parse(name);
        return set;
    }

    /// <summary>Where a template comes from, for messages and docs: the study's file or "(built in)".</summary>
    public string SourceOf(string name) => _sources[name].File;

    /// <summary>Renders a template with the given values; the output is split into lines (see <see cref="TemplateOutput"/>).</summary>
    public string Render(string name, ScriptObject values)
    {
        var template = _parsed[name];
        var context = new TemplateContext(Builtins())
        {
            TemplateLoader = this,
            LoopLimit = LoopLimit,
            RecursiveLimit = RecursionLimit,
            OutputLimit = OutputLimit,
            ObjectRecursionLimit = RecursionLimit,
            StrictVariables = true,
            EnableRelaxedMemberAccess = false,
            // No member of any .NET type is visible: templates see script objects only.
            MemberFilter = _ => false,
            NewLine = "\n",
        };
        context.PushGlobal(values);
        try
        {
            var output = template.Render(context);
            foreach (var line in output.Split('\n'))
            {
                if (DocumentText.Problem(line) is { } problem)
                {
                    throw new TemplateException($"{SourceOf(name)}: template error: a line of the template's output cannot go into a table: {problem}");
                }
            }
            return output;
        }
        catch (ScriptRuntimeException e) when (e.InnerException is TemplateException refused)
        {
            throw refused;
        }
        catch (ScriptRuntimeException e)
        {
            throw Located(e.Span, name, e.OriginalMessage);
        }
        catch (TemplateException)
        {
            throw;
        }
        catch (Exception e) when (e is InvalidOperationException or ArgumentException or FormatException)
        {
            throw new TemplateException($"{SourceOf(name)}: template error: {e.Message}");
        }
    }

    private Template Parse(string name)
    {
        var (text, _) = _sources[name];
        var template = Template.Parse(text, name);
        var error = template.Messages.FirstOrDefault(m => m.Type == ParserMessageType.Error);
        if (error is not null)
            throw Located(error.Span, name, error.Message);
        return template;
    }

    private TemplateException Located(SourceSpan span, string name, string message)
    {
        // Scriban counts lines and columns from 0; editors and our other messages from 1.
        var file = _sources.TryGetValue(span.FileName ?? name, out var source) ? source.File : SourceOf(name);
        return new TemplateException(file, span.Start.Line + 1, span.Start.Column + 1, message.Trim());
    }

    /// <summary>Scriban's built-in functions (string, array, math, ...) without "date", whose "now" would make reruns differ.</summary>
    private static ScriptObject Builtins()
    {
        var builtins = TemplateContext.GetDefaultBuiltinObject();
        builtins.Remove("date");
        return builtins;
    }

    string ITemplateLoader.GetPath(TemplateContext context, SourceSpan callerSpan, string templateName)
    {
        if (templateName.Contains('/') || templateName.Contains('\\') || templateName.Contains("..", StringComparison.Ordinal)
            || !_sources.ContainsKey(templateName))
        {
            throw new TemplateException(
                _sources.TryGetValue(callerSpan.FileName ?? string.Empty, out var caller) ? caller.File : callerSpan.FileName ?? templateName,
                callerSpan.Start.Line + 1, callerSpan.Start.Column + 1,
                $"include '{templateName}': only a template of the template folders can be included, by its file name (e.g. 'legend.sbn')");
        }
        return templateName;
    }

    string ITemplateLoader.Load(TemplateContext context, SourceSpan callerSpan, string templatePath) => _sources[templatePath].Text;

    ValueTask<string?> ITemplateLoader.LoadAsync(TemplateContext context, SourceSpan callerSpan, string templatePath) =>
        new(_sources[templatePath].Text);

    private static string ReadStudyTemplate(string file, SpecFolderPolicy? folders)
    {
        if (folders is not null && !folders.Allows(file))
        {
            throw new TemplateException($"{file}: the template is a symbolic link that leads outside the spec's folder {folders.SpecFolder}; " +
                "templates are read only from inside the spec's folder tree (allow another folder with --allow-folder)");
        }
        try
        {
            var bytes = RegularFile.ReadAllBytes(file, OutputLimit, "a template may hold", problem => new TemplateException($"{file}: {problem}"));
            return new System.Text.UTF8Encoding(false, true).GetString(bytes).TrimStart('\uFEFF');
        }
        catch (System.Text.DecoderFallbackException)
        {
            throw new TemplateException($"{file}: the template is not valid UTF-8; save it as UTF-8");
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            throw new TemplateException($"{file}: cannot read the template ({e.Message})");
        }
    }

    private static string ReadResource(Assembly assembly, string resource)
    {
        using var stream = assembly.GetManifestResourceStream(resource)!;
        using var reader = new StreamReader(stream);
        return reader.ReadToEnd();
    }
}
