using OutputForge.Common;
using OutputForge.Layout;
using OutputForge.Pipeline.Manifest;

namespace OutputForge.Pipeline;

/// <summary>
/// Writes a run's files into its staging folder in a fixed order (each table's files, the combined documents,
/// results.json, manifest.json) and swaps it in for the output folder (<see cref="OutputStaging"/>).
/// </summary>
internal static class RunDelivery
{
    /// <summary>The full paths of the files the output folder now holds.</summary>
    /// <param name="keptLaidOut">The kept tables of a run with --tables, rebuilt for the combined files only.</param>
    public static IReadOnlyList<string> Deliver(RunRequest request, PreparedRun prepared, IReadOnlyList<BuiltTable> built,
        IReadOnlyList<LaidOutTable> keptLaidOut, CombinedWorkbookBuilder? workbook, IRunLog log)
    {
        var writing = new StageTimes();
        var laidOut = built.Select(b => (b.Table, b.Warnings)).ToList();
        using var staging = new OutputStaging(request.OutputFolder);
        foreach (var table in built)
        {
            foreach (var (name, bytes) in table.Files)
            {
                Stage(staging, name, bytes);
            }
        }
        writing.Lap("table files");
        // The combined documents and results.json are rendered at the same time (each on its own core), then staged in
        // the fixed order: combined documents, results.json.
        IReadOnlyList<(string Name, byte[] Bytes)> combined = [];
        byte[] results = [];
        InOrderParallel.Invoke(
            () =>
            {
                if (request.Combined && laidOut.Count > 0)
                {
                    combined = CombinedOutputs.Render(request.Renderers, [.. laidOut.Select(t => t.Table), .. keptLaidOut], prepared.Facts.RunTime, workbook);
                }
            },
            () => results = ResultsJson(request, prepared, laidOut));
        foreach (var (name, bytes) in combined.Append((PackageRunner.ResultsFileName, results)))
        {
            Stage(staging, name, bytes);
        }
        writing.Lap("combined and results.json");
        if (workbook is not null)
        {
            log.Detail($"combined workbook (built beside the tables): {workbook.Times}");
        }
        var previous = request.Tables is not null && File.Exists(Path.Combine(request.OutputFolder, ManifestJson.FileName))
            ? ManifestJson.Read(request.OutputFolder)
            : null;
        ManifestStaging.Write(staging, request, prepared.DataFolder, prepared.Study.Study.Id, prepared.Facts.RunTime, prepared.Inputs,
            built.Select(b => b.Manifest).ToList(), previous);
        writing.Lap("manifest");
        var files = staging.Commit();
        writing.Lap("commit");
        log.Detail($"after the tables: {writing}");
        return files;
    }

    private static byte[] ResultsJson(RunRequest request, PreparedRun prepared, IReadOnlyList<(LaidOutTable Table, IReadOnlyList<string> Warnings)> laidOut)
    {
        using var buffer = new MemoryStream();
        var kept = request.Tables is null ? null : KeptResults.Read(request.OutputFolder);
        ResultsJsonWriter.Write(buffer, prepared.Study.Study.Id, prepared.Facts, laidOut, kept, prepared.Package.Tables.Select(t => t.Id).ToList());
        return buffer.ToArray();
    }

    private static void Stage(OutputStaging staging, string name, byte[] bytes)
    {
        using var stream = staging.Create(name);
        stream.Write(bytes);
    }
}
