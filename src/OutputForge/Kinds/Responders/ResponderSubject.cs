using OutputForge.Analysis;

namespace OutputForge.Kinds.Responders;

/// <summary>
/// One subject of a responder table as the missing-data rule sees it: whether the subject counts in the
/// denominator and whether the subject is a responder.
/// </summary>
public sealed record ResponderSubject(string Subject, TreatmentArm Arm, bool InDenominator, bool Responded);
