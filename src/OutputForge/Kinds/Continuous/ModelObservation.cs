using OutputForge.Analysis;

namespace OutputForge.Kinds.Continuous;

/// <summary>One observation of the ANCOVA: subject, arm, the analysed value (change or value) and the record it came from.</summary>
internal sealed record ModelObservation(string Subject, TreatmentArm Arm, int Row, double Response);
