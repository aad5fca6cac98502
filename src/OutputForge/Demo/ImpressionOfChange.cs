namespace OutputForge.Demo;

/// <summary>
/// One subject global impression of change in itch at a visit: 1 = very much better ... 7 = very much
/// worse. <paramref name="Imputed"/> marks a record carried forward (LOCF) from <paramref name="Date"/>,
/// the date of the last observed impression, for a visit the subject did not reach.
/// </summary>
internal sealed record ImpressionOfChange(string VisitName, int VisitNumber, DateOnly Date, int Category, bool Imputed);
