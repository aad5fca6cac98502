using System.Globalization;
using OutputForge.Layout;
using OutputForge.Results;
using OutputForge.Spec;
using Scriban.Runtime;

namespace OutputForge.Templates;

/// <summary>
/// The variables a template can read, as plain script values only (strings, numbers, booleans,
/// arrays and objects of those): every one is documented in docs/templates.md, and nothing else
/// of the program is reachable from a template.
/// </summary>
public static class TemplateValues
{
    public static ScriptObject For(StudySpec study, TableSpec spec, TableResult result, TableDocument document, RunFacts run)
    {
        var notes = TableNotes.Of(result);
        var values = new ScriptObject
        {
            ["study"] = Object(
                ("id", study.Study.Id),
                ("title", study.Study.Title),
                ("sponsor", study.Study.Sponsor ?? string.Empty),
                ("compound", study.Study.Compound ?? string.Empty)),
            ["table"] = Object(
                ("id", result.TableId),
                ("heading", document.Heading),
                ("kind", spec.Kind),
                ("titles", Array(result.Titles)),
                ("spec_file", result.Provenance.SpecFile.Replace('\\', '/')),
                ("method_notes", Array(notes.Footnotes)),
                ("warnings", Array(notes.Warnings)),
                ("spec_footnotes", Array(result.Footnotes)),
                ("data_files", DataFiles(study, result, run))),
            ["population"] = Object(
                ("key", spec.Population),
                ("label", result.Population),
                ("arms", Arms(result, notes))),
            ["run"] = Object(
                ("time", run.RunTime.UtcDateTime.ToString("yyyy-MM-dd HH:mm 'UTC'", CultureInfo.InvariantCulture)),
                ("date", run.RunTime.UtcDateTime.ToString("yyyy-MM-dd", CultureInfo.InvariantCulture)),
                ("timestamp", run.RunTime.UtcDateTime.ToString("yyyy-MM-dd'T'HH:mm:ss'Z'", CultureInfo.InvariantCulture)),
                ("tool_version", run.ToolVersion),
                ("caution", TableLayoutBuilder.Caution)),
            ["footnotes"] = Array(document.Footnotes),
        };
        return values;
    }

    private static ScriptArray Arms(TableResult result, TableNotes notes)
    {
        var arms = new ScriptArray();
        foreach (var column in result.Columns)
        {
            arms.Add(Object(
                ("key", column.Key),
                ("label", notes.ColumnLabel(column)),
                ("n", column.SubjectCount is { } n ? n : null)));
        }
        return arms;
    }

    private static ScriptArray DataFiles(StudySpec study, TableResult result, RunFacts run)
    {
        var files = new ScriptArray();
        foreach (var name in result.Provenance.Datasets.Distinct(StringComparer.Ordinal))
        {
            files.Add(Object(
                ("name", name),
                ("file", study.Data.Datasets.GetValueOrDefault(name) ?? name),
                ("sha256", run.DataDigests.GetValueOrDefault(name) ?? string.Empty),
                ("text", run.DataFiles.GetValueOrDefault(name) ?? name)));
        }
        return files;
    }

    private static ScriptArray Array(IEnumerable<string> texts)
    {
        var array = new ScriptArray();
        foreach (var text in texts)
            array.Add(text);
        return array;
    }

    private static ScriptObject Object(params (string Name, object? Value)[] members)
    {
        var value = new ScriptObject();
        foreach (var (name, member) in members)
            value[name] = member;
        return value;
    }
}
