namespace OutputForge.Demo;

/// <summary>
/// Adverse events of one dosed subject. Each term occurs as a Poisson process whose rate gives the
/// catalogue incidence over a full 98-day participation (12 weeks of treatment plus follow-up), so
/// early dropouts have fewer events. A subject who discontinued for an adverse event always has one
/// moderate or severe event shortly before the end of study; a few subjects report an event during
/// screening, which is not treatment-emergent.
/// </summary>
internal static class AdverseEventSimulator
{
    private const double PlannedParticipationDays = 98.0;
    private const double PreTreatmentEventChance = 0.03;
    /// <summary>Events starting up to this many days after the last dose still count as treatment-emergent.</summary>
    private const int TreatmentEmergentLagDays = 14;

    private static readonly string[] Relationships = ["NOT RELATED", "UNLIKELY RELATED", "POSSIBLY RELATED", "PROBABLY RELATED"];
    private static readonly double[] UsualRelationship = [55, 25, 15, 5];
    private static readonly double[] DrugRelatedOnPlacebo = [35, 25, 30, 10];
    private static readonly double[] DrugRelatedOnActive = [15, 20, 37, 28];

    public static void Simulate(DemoSubject subject, Xoshiro256StarStar random)
    {
        if (!subject.Dosed) return;
        var start = subject.TreatmentStart!.Value;
        var windowDays = subject.EndOfStudy.DayNumber - start.DayNumber + 1;
        var armIndex = subject.Arm.Index;

        foreach (var term in AdverseEventCatalog.Terms)
        {
            var p = term.IncidencePercent[armIndex] / 100.0;
            var dailyRate = -PortableMath.Log(1.0 - p) / PlannedParticipationDays;
            var onsetOffset = random.Exponential(dailyRate);
            if (onsetOffset >= windowDays) continue;

            var onset = start.AddDays((int)onsetOffset);
            var end = AddEvent(subject, term, onset, random, forcedSevere: false);
            if (random.Chance(term.RepeatProbability))
            {
                var after = (end ?? onset).AddDays(random.NextInt(3, 20));
                if (after <= subject.EndOfStudy)
                    AddEvent(subject, term, after, random, forcedSevere: false);
            }
        }

        if (subject.DiscontinuationReason == DispositionSimulator.AdverseEvent)
        {
            var term = PickTerm(armIndex, random, boostDrugRelated: armIndex > 0);
            var earliest = Math.Max(start.DayNumber, subject.EndOfStudy.DayNumber - 10);
            var onset = DateOnly.FromDayNumber(random.NextInt(earliest, subject.EndOfStudy.DayNumber));
            AddEvent(subject, term, onset, random, forcedSevere: true);
        }

        if (random.Chance(PreTreatmentEventChance))
        {
            var term = PickTerm(0, random, boostDrugRelated: false);
            AddEvent(subject, term, start.AddDays(-random.NextInt(1, 14)), random, forcedSevere: false);
        }
    }

    internal static DateOnly? AddEvent(DemoSubject subject, AdverseEventTerm term, DateOnly onset, Xoshiro256StarStar random, bool forcedSevere)
    {
        var serious = random.Chance(term.SeriousProbability);
        var severityDraw = random.NextDouble();
        var severity = serious || forcedSevere
            ? (severityDraw < 0.6 ? "SEVERE" : "MODERATE")
            : (severityDraw < 0.62 ? "MILD" : severityDraw < 0.94 ? "MODERATE" : "SEVERE");

        var weights = !term.DrugRelated ? UsualRelationship
            : subject.Arm.Index == 0 ? DrugRelatedOnPlacebo
            : DrugRelatedOnActive;
        var relationship = Relationships[random.WeightedIndex(weights)];
        var verbatim = term.VerbatimTerms[random.NextInt(term.VerbatimTerms.Length)];

        var durationDays = Math.Max(1, (int)Math.Round(random.LogNormal(term.MedianDays, 0.8), MidpointRounding.AwayFromZero));
        DateOnly? end = onset.AddDays(durationDays - 1);
        // An event still going on at the end-of-study visit has no end date.
        if (end > subject.EndOfStudy) end = null;

        var start = subject.TreatmentStart!.Value;
        var emergent = onset >= start && onset <= subject.TreatmentEnd!.Value.AddDays(TreatmentEmergentLagDays);
        subject.AdverseEvents.Add(new AdverseEventRecord(term, verbatim, severity, serious, relationship, onset, end, emergent));
        return end;
    }

    internal static AdverseEventTerm PickTerm(int armIndex, Xoshiro256StarStar random, bool boostDrugRelated)
    {
        var terms = AdverseEventCatalog.Terms;
        Span<double> weights = stackalloc double[terms.Count];
        for (var i = 0; i < terms.Count; i++)
            weights[i] = terms[i].IncidencePercent[armIndex] * (boostDrugRelated && terms[i].DrugRelated ? 4.0 : 1.0);
        return terms[random.WeightedIndex(weights)];
    }
}
