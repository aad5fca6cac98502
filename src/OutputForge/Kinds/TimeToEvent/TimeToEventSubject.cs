using OutputForge.Analysis;

namespace OutputForge.Kinds.TimeToEvent;

/// <summary>One subject's time, event indicator and stratum (the strata variables' values joined).</summary>
internal sealed record TimeToEventSubject(string Subject, TreatmentArm Arm, double Time, bool Event, string? Stratum);
