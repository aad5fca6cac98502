namespace OutputForge.Demo;

/// <summary>One weekly mean itch score (0-10, in tenths) at a visit.</summary>
/// <param name="IsAnalysisRecord">False for a repeated diary assessment within the same visit window,
/// which ADaM keeps in the dataset but does not flag for analysis (ANL01FL empty).</param>
internal sealed record ItchAssessment(
    string VisitName,
    int VisitNumber,
    DateOnly Date,
    int ValueTenths,
    bool IsBaseline,
    bool IsAnalysisRecord);
