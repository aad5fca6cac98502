namespace OutputForge.Demo;

/// <summary>One reported adverse event of a subject.</summary>
internal sealed record AdverseEventRecord(
    AdverseEventTerm Term,
    string VerbatimTerm,
    string Severity,
    bool Serious,
    string Relationship,
    DateOnly Start,
    DateOnly? End,
    bool TreatmentEmergent);
