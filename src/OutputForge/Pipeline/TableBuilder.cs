using OutputForge.Layout;
using OutputForge.Pipeline.Manifest;
using OutputForge.Rendering;
using OutputForge.Results;
using OutputForge.Rendering.Figures;
using OutputForge.Spec;
using OutputForge.Templates;

namespace OutputForge.Pipeline;

/// <summary>
/// Builds one table of a run: its kind's analysis (with the data's warnings first), its layout with the study's page,
/// study line and templates, the document text check, every renderer's file and its figure.
/// </summary>
internal sealed class TableBuilder(RunRequest request, PreparedRun prepared)
{
    private readonly string _studyLine = StudyLine.Of(prepared.Study);
    private readonly PageSettings _page = PageSetup.From(prepared.Study.Page);

    public BuiltTable Build(TableSpec table) => Build(table, prepared.Facts);

    /// <summary>Builds the table as a run with <paramref name="run"/>'s facts would (a kept table rebuilt with its own run time).</summary>
    public BuiltTable Build(TableSpec table, RunFacts run)
    {
        var study = prepared.Study;
        var times = new StageTimes();
        var result = Kinds.TableKinds.For(table).Analysis.Analyze(study, table, prepared.Data);
        times.Lap("analysis");
        if (result.Figure is { } drawn && FigurePainter.Warning(drawn) is { } drawing)
        {
            // Last among the table's warnings, where the analysis placed it before figures were drawn by Rendering.
            result = result with { Notes = [.. result.Notes, ResultNote.Warning(NoteKind.Text, NoteSubject.None, ("text", drawing))] };
        }
        if (prepared.DataWarnings.Count > 0)
        {
            result = result with { Warnings = [.. prepared.DataWarnings, .. result.Warnings] };
        }
        var outputNames = request.Renderers.Select(r => OutputFileNames.ForTable(table.Id, r.Extension)).ToList();
        if (result.Figure is { } figure)
        {
            outputNames.Add(OutputFileNames.ForFigure(table.Id, figure.Name));
        }
        var manifest = new ManifestTable(table.Id, prepared.Inputs.ForTable(result.Provenance.SpecFile, result.Provenance.Datasets),
            outputNames, ManifestStaging.Timestamp(run.RunTime));
        var laidOut = TableLayOut.Build(study, table, result, _studyLine, run, _page, NumberDisplay.Values, prepared.Templates,
            document => TemplateValues.For(study, table, result, document, run));
        times.Lap("layout");
        if (TableDocumentText.FirstProblem(laidOut.Document) is { } problem)
        {
            // Each source is checked where it is read; this catches text assembled from several pieces.
            throw new SpecException(table.Source.Problem(string.Empty, $"the laid-out table cannot be written: {problem}"));
        }
        var files = new List<(string, byte[])>();
        foreach (var renderer in request.Renderers)
        {
            using var buffer = new MemoryStream();
            renderer.Write(laidOut.Document, buffer);
            var bytes = buffer.ToArray();
            if (PackageNormalizer.IsPackage(bytes))
            {
                bytes = PackageNormalizer.Normalize(bytes, run.RunTime);
            }
            files.Add((OutputFileNames.ForTable(table.Id, renderer.Extension), bytes));
            times.Lap(renderer.Extension.TrimStart('.'));
        }
        if (result.Figure is { } picture)
        {
            files.Add((OutputFileNames.ForFigure(table.Id, picture.Name), FigurePainter.Paint(picture).Png));
        }
        return new BuiltTable(laidOut, TableNotes.Of(result).Warnings, manifest, files, times);
    }
}
