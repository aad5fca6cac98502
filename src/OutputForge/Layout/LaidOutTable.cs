using OutputForge.Results;

namespace OutputForge.Layout;

/// <summary>A table ready to render, with every number's record as displayed (for results.json).</summary>
public sealed record LaidOutTable(TableDocument Document, IReadOnlyList<ResultRecord> Records);
