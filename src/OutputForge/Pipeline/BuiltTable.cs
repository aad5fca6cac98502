using OutputForge.Layout;
using OutputForge.Pipeline.Manifest;

namespace OutputForge.Pipeline;

/// <summary>One table analysed, laid out and rendered (to bytes, not yet written), with its manifest entry and stage times.</summary>
internal sealed record BuiltTable(LaidOutTable Table, IReadOnlyList<string> Warnings, ManifestTable Manifest,
    IReadOnlyList<(string Name, byte[] Bytes)> Files, StageTimes Times);
