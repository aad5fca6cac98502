using OutputForge.Layout;
using OutputForge.Results;
using OutputForge.Spec;
using OutputForge.Templates;
using Scriban.Runtime;

namespace OutputForge.Workflow.Shells;

/// <summary>
/// The template variables of a mock shell: those of a run (<see cref="TemplateValues"/>), with
/// nothing of the stand-in data left in them: each arm's n is the text "xx", the warnings are
/// empty, and the data files are one entry whose text is <see cref="NoData"/>, so that the
/// built-in source line reads "data: none (mock shell)".
/// </summary>
public static class ShellTemplateValues
{
    public const string NoData = "none (mock shell)";

    public static ScriptObject For(StudySpec study, TableSpec table, TableResult result, TableDocument document, RunFacts run)
    {
        var values = TemplateValues.For(study, table, result.WithoutWarnings(), document, run);
        var tableValues = (ScriptObject)values["table"]!;
        tableValues["data_files"] = new ScriptArray
        {
            new ScriptObject { ["name"] = string.Empty, ["file"] = string.Empty, ["sha256"] = string.Empty, ["text"] = NoData },
        };
        foreach (var arm in ((ScriptArray)((ScriptObject)values["population"]!)["arms"]!).OfType<ScriptObject>())
        {
            if (arm["n"] is not null)
            {
                arm["n"] = "xx";
            }
        }
        return values;
    }
}
