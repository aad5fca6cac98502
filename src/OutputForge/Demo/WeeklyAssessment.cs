namespace OutputForge.Demo;

/// <summary>One record of a weekly efficacy parameter (value in tenths); week 0 is the baseline.</summary>
internal sealed record WeeklyAssessment(WeeklyEfficacyParameter Parameter, int Week, DateOnly Date, int ValueTenths, int BaselineTenths);
