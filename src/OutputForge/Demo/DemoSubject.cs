namespace OutputForge.Demo;

/// <summary>
/// Everything simulated for one subject, filled in stages (enrolment, baseline, randomization,
/// disposition, itch diary, adverse events) and then written to the three datasets.
/// Measurements are kept in integer tenths so that rounding happens once and derived values
/// (change, percent change, BMI, responder status) are computed from the very numbers printed.
/// </summary>
internal sealed class DemoSubject
{
    public required StudySite Site { get; init; }
    public required int NumberAtSite { get; init; }
    public required DateOnly RandomizationDate { get; init; }

    public string SubjectId => $"{Site.SiteId}-{NumberAtSite:D4}";
    public string UniqueSubjectId => $"{DemoStudyFacts.StudyId}-{SubjectId}";

    public int Age { get; set; }
    public string Sex { get; set; } = "";
    public string Race { get; set; } = "";
    public int RaceCode { get; set; }
    public string? Ethnicity { get; set; }
    public string StratumRegion { get; set; } = "";
    public string Severity { get; set; } = "";
    public int? HeightTenths { get; set; }
    public int? WeightTenths { get; set; }
    public int? BmiTenths { get; set; }
    public int ItchBaselineTenths { get; set; }
    public int DiseaseYearsTenths { get; set; }
    public bool MajorDeviation { get; set; }

    public TreatmentArm Arm { get; set; } = TreatmentArm.All[0];

    public bool Dosed { get; set; }
    public DateOnly? TreatmentStart { get; set; }
    public DateOnly? TreatmentEnd { get; set; }
    public bool Completed { get; set; }
    public string? DiscontinuationReason { get; set; }
    public DateOnly EndOfStudy { get; set; }

    public List<ItchAssessment> ItchAssessments { get; } = new(6);
    public List<AdverseEventRecord> AdverseEvents { get; } = new(2);
    public List<ImpressionOfChange> ImpressionsOfChange { get; set; } = [];
    public List<WeeklyAssessment> WeeklyAssessments { get; } = [];

    /// <summary>EFFFL: dosed and at least one post-baseline itch value used for analysis.</summary>
    public bool InEfficacyPopulation =>
        Dosed && ItchAssessments.Exists(a => !a.IsBaseline && a.IsAnalysisRecord);

    /// <summary>PPROTFL: efficacy population without a major protocol deviation.</summary>
    public bool InPerProtocolPopulation => InEfficacyPopulation && !MajorDeviation;

    /// <summary>Study day as ADaM defines it: no day 0, day 1 is the first dose date.</summary>
    public int? StudyDay(DateOnly date)
    {
        if (TreatmentStart is not { } start) return null;
        var offset = date.DayNumber - start.DayNumber;
        return offset >= 0 ? offset + 1 : offset;
    }
}
