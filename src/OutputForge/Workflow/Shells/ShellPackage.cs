using OutputForge.Layout;
using OutputForge.Pipeline;
using OutputForge.Rendering;
using OutputForge.Spec;
using OutputForge.Templates;

namespace OutputForge.Workflow.Shells;

/// <summary>
/// Writes the mock shells of a study's tables (shell-{id}.docx, .xlsx, ...) from the specs alone,
/// staged like a run so the output folder receives all of them or none.
/// </summary>
internal static class ShellPackage
{
    /// <param name="runTime">The time printed in the shells and stamped in their packages; null means now.</param>
    public static IReadOnlyList<string> Write(string specPath, string outputFolder, IReadOnlyList<ITableRenderer> renderers,
        IReadOnlyList<string>? tables, IRunLog log, DateTimeOffset? runTime = null)
    {
        using var outputLock = OutputLock.Acquire(outputFolder);
        var package = SpecLoader.Load(specPath);
        var study = package.Study;
        var templates = TemplateSet.Load(study.Folder, package.Folders);
        var run = new RunFacts(runTime ?? DateTimeOffset.UtcNow, ToolVersion.Text, new Dictionary<string, string>());
        var page = PageSetup.From(study.Page);
        var selected = TableSelection.Select(package.Tables, tables);
        foreach (var skipped in selected.Where(t => !ShellData.Supports(t.Kind)))
        {
            log.Warning($"table {skipped.Id}: no shell yet for the table kind '{skipped.Kind}' (shells cover: {string.Join(", ", Kinds.TableKinds.Names)})");
        }
        var shells = new List<LaidOutTable>();
        foreach (var table in selected.Where(t => ShellData.Supports(t.Kind)))
        {
            var (shell, assumptions) = ShellBuilder.Build(study, table, StudyLine.Of(study), run, page, templates);
            foreach (var assumption in assumptions)
            {
                log.Warning($"table {table.Id}: {assumption}");
            }
            shells.Add(shell);
        }
        using var staging = new OutputStaging(outputFolder);
        foreach (var shell in shells)
        {
            foreach (var renderer in renderers)
            {
                using var buffer = new MemoryStream();
                renderer.Write(shell.Document, buffer);
                var bytes = buffer.ToArray();
                // As in a run: the same specs and time give the same bytes (the packages' entry times are the run time).
                if (PackageNormalizer.IsPackage(bytes))
                {
                    bytes = PackageNormalizer.Normalize(bytes, run.RunTime);
                }
                using var stream = staging.Create(FileName(shell.Document.TableId, renderer.Extension));
                stream.Write(bytes);
            }
        }
        var files = staging.Commit();
        log.Info($"{shells.Count} shell{(shells.Count == 1 ? "" : "s")}, {files.Count} files in {outputFolder}");
        return files;
    }

    /// <summary>"shell-14.2.1.1.docx": the table's file name with "shell-" for "table-", so shells and tables never overwrite each other.</summary>
    public static string FileName(string tableId, string extension) =>
        "shell-" + OutputFileNames.ForTable(tableId, extension)["table-".Length..];
}
