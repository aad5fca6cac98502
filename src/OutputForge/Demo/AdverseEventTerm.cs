namespace OutputForge.Demo;

/// <summary>
/// A preferred term with its system organ class and the invented incidences the simulation aims at.
/// </summary>
/// <param name="IncidencePercent">Percent of subjects with at least one event over about 14 weeks of
/// participation, by arm (placebo, 10 mg, 30 mg).</param>
/// <param name="SeriousProbability">Chance that one event of this term is serious.</param>
/// <param name="RepeatProbability">Chance that a subject with the event has it again later.</param>
/// <param name="MedianDays">Median duration of one episode.</param>
/// <param name="DrugRelated">True for the dose-related terms: investigators attribute them more often.</param>
/// <param name="VerbatimTerms">Investigator wordings that code to this term (AETERM).</param>
internal sealed record AdverseEventTerm(
    string PreferredTerm,
    string BodySystem,
    double[] IncidencePercent,
    double SeriousProbability,
    double RepeatProbability,
    double MedianDays,
    bool DrugRelated,
    string[] VerbatimTerms);
