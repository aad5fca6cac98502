using OutputForge.Analysis;

namespace OutputForge.Kinds.AdverseEvents;

/// <summary>One counted event: its subject and arm, system organ class, preferred term, and severity rank (0 = least severe).</summary>
public sealed record AdverseEventRecord(string Subject, TreatmentArm Arm, string Soc, string Term, int SeverityRank);
