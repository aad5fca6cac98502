using System.Globalization;
using OutputForge.Results;

namespace OutputForge.Layout;

/// <summary>
/// The one wording of every <see cref="NoteKind"/>: a note's kind, subject and values become its sentence here and
/// nowhere else, so that a change of wording reaches every table kind. Footnote letters are added by
/// <see cref="TableNotes"/>, the "Warning: " prefix by the table layout.
/// </summary>
public static class NoteWording
{
    /// <param name="rowLabel">The displayed label of a row by its key (for notes whose subject names a row).</param>
    public static string Word(ResultNote note, Func<string, string> rowLabel) => note.Kind switch
    {
        NoteKind.Denominators => Denominators(note),
        NoteKind.AcrossArmsTest => "Two-sided p-value across the treatment arms (Total not included): " +
            string.Join("; ", note.List<string>("methods").Zip(note.List<string>("subjects"))
                .GroupBy(t => t.First, StringComparer.Ordinal)
                .Select(g => $"{g.Key} for {string.Join(", ", g.Select(t => t.Second))}")) + ".",
        NoteKind.PairwiseEventTest => $"Two-sided p-value from {note.Text("method")} of each arm against {note.Text("control")} (subjects with vs without the event), unstratified.",
        NoteKind.SingleTableFits => "Where neither arm of a comparison has the event, only one table fits the margins and the p-value is 1.",
        NoteKind.EventDenominators => $"N = number of subjects in each column ({note.Text("population")}); n (%) = subjects with at least one event, percentages of N. A subject is counted once per row, whatever the number of events.",
        NoteKind.EventCounts => "[E] = number of events.",
        NoteKind.SeverityRows => $"Severity rows: each subject is counted once per row, at the maximum severity of its events in that row ({string.Join(" < ", note.List<string>("levels"))}){(note.Flag("withEvents") ? "; [E] is given on the rows above them only" : string.Empty)}.",
        NoteKind.EventsCounted => $"Events counted: {note.Text("condition")}.",
        NoteKind.TermThreshold => string.Create(CultureInfo.InvariantCulture,
            $"Preferred terms reported by at least {note.Number("percent"):0.###}% of subjects in {Place(note.Text("place"), note.Text("arm"))}; a system organ class row counts all of its events, including terms not shown."),
        NoteKind.RowOrder => note.OptionalText("place") is { } place
            ? $"Sorted by decreasing number of subjects in {Place(place, note.Text("arm"))}, then alphabetically."
            : "Sorted alphabetically.",
        NoteKind.VisitDenominators => $"N = number of subjects in the {note.Text("population")}; n = subjects with a value. Values are summarized over the subjects with a record at the visit.",
        NoteKind.AncovaModel => Ancova(note),
        NoteKind.DoseResponseTest => $"Dose-response test: the same model with treatment entered as the number {note.Text("dose")} instead of a factor; two-sided t test of its slope (slope per unit of {note.Text("dose")} kept in results.json).",
        NoteKind.ModelNotFitted => $"{note.Subject.Visit}: the {note.Text("model")} could not be fitted: {note.Text("reason")}.",
        NoteKind.ArmNotInModel => $"{note.Subject.Visit}: no subject of {note.Subject.Arm} has {note.Text("response")} and all model covariates; it has no LS mean.",
        NoteKind.TimeUnits => $"Time in {note.Text("unit")}; {note.Text("censor")} = 1 marks a censored time. Percentages are of the subjects analysed.",
        NoteKind.KaplanMeierMedian => $"Kaplan-Meier product-limit estimate; {Level(note)} CI of the median by the method of Brookmeyer and Crowley with the log-log transformation. NE: not reached (the curve or its confidence limit does not fall to 50%).",
        NoteKind.KaplanMeierAtTimes => note.Flag("cumulative")
            ? $"100 x (1 - S(t)) from the Kaplan-Meier curve with the log-log {Level(note)} CI of S(t), complemented; NE beyond the arm's last observed time."
            : $"100 x S(t) from the Kaplan-Meier curve with the log-log {Level(note)} CI (Greenwood variance); NE beyond the arm's last observed time.",
        NoteKind.LogRankTest => $"Two-sided p-value of the log-rank test, {Stratification(note)}, of each arm against {note.Text("control")} (those two arms only).",
        NoteKind.CoxHazardRatio => $"Hazard ratio (arm vs {note.Text("control")}) from a Cox proportional hazards model with treatment as the only covariate, {Stratification(note)}, fitted to the two arms compared; {note.Text("ties")} method for tied times; Wald {Level(note)} CI. " +
            (note.Flag("cumulative") ? $"A hazard ratio above 1 means the event comes sooner than on {note.Text("control")}." : $"A hazard ratio below 1 means a lower event rate than on {note.Text("control")}."),
        NoteKind.NoStratumValue => VisitComparison(note.Subject) + NoStratumValue((int)note.Number("subjects"), note.List<string>("variables"), note.OptionalText("leftOutOf")),
        NoteKind.ProportionInterval => $"{note.Text("method")} {Level(note)} confidence interval for the proportion of responders.",
        NoteKind.DifferenceInterval => $"Difference in proportions of responders (each arm minus {note.Text("control")}), in percentage points, with the {note.Text("method")} {Level(note)} confidence interval.",
        NoteKind.UnstratifiedTest => UnstratifiedTest(note),
        NoteKind.ResponderDenominators => note.Text("missing") switch
        {
            "non-responder" => $"N = number of subjects in the {note.Text("population")}; percentages are of N. Subjects with no assessment are counted as non-responders.",
            "observed" => $"N = subjects in the {note.Text("population")}; percentages are of the subjects with a record (observed cases: records as {note.Text("dataset")} has them, " +
                $"including its derived records, {note.Text("derivation")} not blank, where the endpoint selects them); subjects without a record are left out.",
            _ => $"N = number of subjects in the {note.Text("population")}; percentages are of the subjects evaluated. Subjects with no assessment are excluded.",
        },
        NoteKind.StratifiedDifference => note.Flag("scoreInterval")
            ? $"Common difference (arm minus {note.Text("control")}), weights n1 n2 / (n1 + n2); stratified Miettinen-Nurminen score {Level(note)} CI (Miettinen and Nurminen 1985); estimate: the score's root, equal to the weighted difference."
            : $"Mantel-Haenszel common difference (arm minus {note.Text("control")}), weights n1 n2 / (n1 + n2); {Level(note)} CI from Sato's variance (Sato 1989).",
        NoteKind.CmhTest => $"Two-sided p-value of the Cochran-Mantel-Haenszel test{(note.Flag("corrected") ? " with continuity correction" : "")}, each arm against {note.Text("control")}.",
        NoteKind.HomogeneityTest => "Breslow-Day test (Tarone's correction) of equal odds ratios; strata where all or none responded are left out.",
        NoteKind.RelativeRisk => note.Flag("stratified")
            ? $"Mantel-Haenszel relative risk of response (each arm / {note.Text("control")}), {Level(note)} CI from the Greenland-Robins variance."
            : $"Relative risk of response (each arm / {note.Text("control")}), log (Katz) {Level(note)} CI.",
        NoteKind.OddsRatio => note.Flag("stratified")
            ? $"Mantel-Haenszel odds ratio of response (each arm to {note.Text("control")}), {note.Text("method")} {Level(note)} CI."
            : $"Odds ratio of response (each arm to {note.Text("control")}), {note.Text("method")} {Level(note)} CI.",
        NoteKind.StrataDefinition => $"Strata: each combination of {string.Join(" / ", note.List<string>("variables"))} values (ADSL); each comparison uses its two arms only.",
        NoteKind.EmptyStrata => note.List<string>("strata") is var empty
            ? $"Empty {(empty.Count == 1 ? "stratum" : "strata")} (no subject of the population): {string.Join("; ", empty)}."
            : string.Empty,
        NoteKind.SingleSubjectStrata => note.List<string>("strata") is var single
            ? $"{(single.Count == 1 ? "Stratum" : "Strata")} with one subject in the population: {string.Join("; ", single)}."
            : string.Empty,
        NoteKind.DroppedStratum => (int)note.Number("subjects") is var n && n == 0
            ? $"{note.Subject.Arm} vs {note.Subject.Control}: stratum {string.Join(" / ", note.Subject.Stratum ?? [])} has no subjects in these two arms and was left out."
            : $"{note.Subject.Arm} vs {note.Subject.Control}: stratum {string.Join(" / ", note.Subject.Stratum ?? [])} ({(n == 1 ? "1 subject" : $"{n} subjects")}) has no subjects of {note.Text("withoutArm")} and was left out.",
        NoteKind.StratumAddsNothing => $"{note.Subject.Arm} vs {note.Subject.Control}, {note.Subject.What}: stratum {Stratum(note.Subject)} {StratumReason(note.Text("reason"))} and adds nothing to the test.",
        NoteKind.StratumLeftOut => Subject(note.Subject) + StratumLeftOut(note),
        NoteKind.NoHazardRatio => $"{note.Subject.Arm} vs {note.Subject.Control}: the Cox model gives no hazard ratio: {note.Text("reason")}.",
        NoteKind.SubgroupCounts => note.Flag("nonResponders")
            ? $"n/N (%) = responders / subjects of the {note.Text("population")} in the arm and subgroup; subjects with no assessment are counted as non-responders. Endpoint: {note.Text("endpoint")}."
            : $"n/N (%) = responders / subjects evaluated in the arm and subgroup; subjects with no assessment are excluded. Endpoint: {note.Text("endpoint")}.",
        NoteKind.SubgroupEffect => SubgroupEffect(note),
        NoteKind.SubgroupInteraction => note.Text("method") switch
        {
            "breslow-day" => $"Breslow-Day test of homogeneity of the odds ratios (arm vs {note.Text("control")}) across the levels of the subgroup variable.",
            "breslow-day-tarone" => $"Breslow-Day test with Tarone's correction of homogeneity of the odds ratios (arm vs {note.Text("control")}) across the levels of the subgroup variable.",
            _ => $"Treatment-by-subgroup interaction: likelihood-ratio test of logistic regression models response ~ arm + subgroup + arm:subgroup vs response ~ arm + subgroup, fitted to the subjects of the arm and {note.Text("control")}; no p-value under separation or non-convergence (reason under Warning).",
        },
        NoteKind.SubgroupLevels => "Subgroup levels: " + string.Join("; ", note.List<string>("labels").Zip(note.List<string>("variables"), note.List<string>("orders"))
            .Select(v => $"{v.First} ({v.Second}), {v.Third switch { "spec" => "levels in the order of the spec", "alphabetical" => "levels in alphabetical order", var by => $"levels ordered by {by}" }}")) + ".",
        NoteKind.InNoSubgroup => InNoSubgroup(note),
        NoteKind.EffectNotEstimated => $"{Subject(note.Subject)}{Measure(note.Text("measure"))} not estimated: {note.Text("reason")}.",
        NoteKind.NoPValue => $"{Subject(note.Subject)}no p-value: {note.Text("reason")}.",
        NoteKind.SmallExpectedCounts => string.Create(CultureInfo.InvariantCulture,
            $"{Subject(note.Subject)}{note.Number("below")} of {note.Number("cells")} expected {(note.Flag("ofCells") ? "cell counts" : "counts")} are below 5 (smallest {note.Number("smallest"):0.00}); the chi-square approximation may be poor."),
        NoteKind.TestNotEstimable => $"{Subject(note.Subject)}{note.Text("method")} not estimable: {note.Text("reason")}.",
        NoteKind.VisitResponseDenominators => $"N = number of subjects in the {note.Text("population")}; n = subjects with a response at the visit. Percentages are of n." +
            (note.Flag("missingRow") ? " Missing: subjects of the population without a response at the visit (not in the percentages)." : string.Empty),
        NoteKind.VisitRecordSelection => VisitRecordSelection(note),
        NoteKind.VisitCmhTest => VisitCmhTest(note),
        NoteKind.StrataTooSmall => $"{VisitComparison(note.Subject)}left out of the test for having fewer than 2 subjects with a response: " +
            string.Join("; ", note.List<string>("strata").Zip(note.List<int>("subjects"), (stratum, n) => $"{stratum} ({n} subject)")) + ".",
        NoteKind.SingularCovariance => string.Create(CultureInfo.InvariantCulture,
            $"{VisitComparison(note.Subject)}The covariance matrix has rank {note.Number("rank")} instead of {note.Number("nominalDf")}, so the test has {note.Number("rank")} degrees of freedom; the covariance matrix of the statistic is singular."),
        NoteKind.PValueNotEstimable => $"{VisitComparison(note.Subject)}NE (not estimable) p-value: {note.Text("reason")}.",
        NoteKind.NoImputedRecords => note.List<string>("types") is var types
            ? $"No record of {note.Text("file")} has DTYPE '{note.Text("imputation")}' ({(types.Count == 0 ? "no record has a DTYPE" : "DTYPE values: " + string.Join(", ", types))}); the table shows observed responses only."
            : string.Empty,
        NoteKind.MethodRemark => Subject(note.Subject) + note.Text("text"),
        NoteKind.NotEstimable => $"NE (not estimable) in \"{rowLabel(note.Subject.Row!)}\", column {note.Subject.Column}: {note.Text("reason")}.",
        NoteKind.Text => Subject(note.Subject) + note.Text("text"),
        _ => throw new ArgumentOutOfRangeException(nameof(note), note.Kind, "a note kind without wording"),
    };

    private static string Measure(string measure) => measure switch
    {
        "odds-ratio" => "odds ratio",
        "relative-risk" => "relative risk",
        _ => "difference",
    };

    private static string SubgroupEffect(ResultNote note)
    {
        var control = note.Text("control");
        var measure = note.Text("measure") switch
        {
            "odds-ratio" => $"Odds ratio of response (arm vs {control}) with the Woolf (logit) {Level(note)} confidence interval; not estimable when a cell of the 2 x 2 table is zero.",
            "relative-risk" => $"Relative risk of response (arm vs {control}) with the Katz (log) {Level(note)} confidence interval; not estimable when an arm has no responders.",
            _ => $"Difference in proportions of responders (arm minus {control}), in percentage points, with the {note.Text("method")} {Level(note)} confidence interval.",
        };
        return string.Create(CultureInfo.InvariantCulture,
            $"{measure} NE where an arm compared has fewer than {note.Number("minimum")} subjects in the subgroup, or where the method gives no estimate (reason under Warning).");
    }

    private static string InNoSubgroup(ResultNote note)
    {
        var n = (int)note.Number("subjects");
        var (name, label) = (note.Subject.Parameter, note.Subject.What);
        var unlisted = note.List<string>("unlistedValues");
        return unlisted.Count == 0
            ? $"{n} subject{(n == 1 ? " has" : "s have")} no value of {name} and {(n == 1 ? "is" : "are")} in no {label} subgroup."
            : $"{n} subject{(n == 1 ? " has" : "s have")} a value of {name} that the spec does not list ({string.Join(", ", unlisted.Select(v => $"'{v}'"))}) and {(n == 1 ? "is" : "are")} in no {label} subgroup.";
    }

    private static string Level(ResultNote note) => LevelText.Of(note.Number("level"));

    /// <summary>"stratified by STRAT1R and STRAT2R", or "unstratified".</summary>
    private static string Stratification(ResultNote note) => note.List<string>("strata") is { Count: > 0 } strata
        ? $"stratified by {string.Join(" and ", strata)}"
        : "unstratified";

    /// <summary>A stratum named by its values, as the reader of the table knows it: 'F / &lt;65'.</summary>
    private static string Stratum(NoteSubject subject) => $"'{string.Join(" / ", subject.Stratum ?? [])}'";

    private static string StratumReason(string code) => code switch
    {
        "one-group-only" => "has subjects of one group only",
        "no-events" => "has no events",
        _ => throw new ArgumentOutOfRangeException(nameof(code), code, "unknown stratum reason"),
    };

    /// <summary>"Stratum 718 has no events, so no variability, and was left out of the Breslow-Day test."</summary>
    private static string StratumLeftOut(ResultNote note)
    {
        var name = $"{note.OptionalText("term") ?? "Stratum"} {string.Join(" / ", note.Subject.Stratum ?? [])}";
        var leftOut = note.OptionalText("method") is { } method ? $"was left out of the {method}" : "was skipped";
        return note.Text("reason") switch
        {
            "no-subjects" => $"{name} has no subjects and {leftOut}.",
            "single-subject" => $"{name} has a single subject and {leftOut}.",
            "empty-group" => $"{name} has no subjects in {note.Text("group")} and {leftOut}.",
            "one-group-only" => $"{name} has subjects of one group only and {leftOut}.",
            "no-events" => $"{name} has no events, so no variability, and {leftOut}.",
            "all-events" => $"{name} has every subject with the event, so no variability, and {leftOut}.",
            var code => throw new ArgumentOutOfRangeException(nameof(note), code, "unknown stratum reason"),
        };
    }

    private static string NoStratumValue(int subjects, IReadOnlyList<string> variables, string? leftOutOf)
    {
        var (names, what) = leftOutOf switch
        {
            "stratified-analysis" => (string.Join(" / ", variables), "the stratified analysis"),
            "test" => (string.Join(", ", variables), "the test"),
            _ => (string.Join(", ", variables), "the whole table"),
        };
        return $"{subjects} subject{(subjects == 1 ? " has" : "s have")} no value of {names} and {(subjects == 1 ? "is" : "are")} left out of {what}.";
    }

    private static string UnstratifiedTest(ResultNote note)
    {
        if (!note.Flag("automatic"))
            return $"Two-sided p-value from {note.Text("method")}, unstratified.";
        var methods = note.List<string>("methods");
        var used = methods.Distinct(StringComparer.Ordinal).ToList();
        var detail = used.Count == 1 && note.Flag("allTested")
            ? $"; {used[0]} was used for every comparison"
            : string.Concat(methods.Zip(note.List<string>("arms"), (method, arm) => $"; {method} for {arm} vs {note.Text("control")}"));
        return $"Two-sided p-value, unstratified: Pearson's chi-square test, or Fisher's exact test where an expected cell count is below 5{detail}.";
    }

    /// <summary>"Week 4: " or "Week 4, QF-217 10 mg vs Placebo: ": the visit and the comparison a by-visit note is about; empty without a visit.</summary>
    private static string VisitComparison(NoteSubject subject) => subject.Visit is not { } visit
        ? string.Empty
        : subject.Arm is { } arm ? $"{visit}, {arm} vs {subject.Control}: " : $"{visit}: ";

    private static string VisitRecordSelection(ResultNote note)
    {
        var selection = new List<string>();
        if (note.OptionalText("parameter") is { } parameter)
            selection.Add($"PARAMCD = '{parameter}'");
        if (note.OptionalText("where") is { } where)
            selection.Add(where);
        var records = selection.Count > 0 ? $"Records with {string.Join(" and ", selection)}; " : string.Empty;
        if (note.OptionalText("imputation") is not { } imputation)
            return records + "observed responses only (DTYPE empty), no imputation of missing values.";
        var imputed = note.List<string>("visits").Zip(note.List<int>("imputedCounts"), (visit, count) => string.Create(CultureInfo.InvariantCulture, $"{visit}: {count}"));
        return records + $"observed responses (DTYPE empty) and, for visits without one, responses imputed by {imputation} (DTYPE = '{imputation}'); " +
            $"imputed responses counted: {string.Join("; ", imputed)}.";
    }

    private static string VisitCmhTest(ResultNote note)
    {
        var categories = (int)note.Number("categories");
        var arms = (int)note.Number("arms");
        var df = (int)note.Number("df");
        var scores = note.Text("scores") switch
        {
            "equal-spacing" => $"equally spaced column scores 1 to {categories} in the order listed",
            "modified-ridit" => "modified ridit column scores (standardized midranks) computed within each stratum",
            "nominal" => "the categories taken as nominal (no scores)",
            _ => "table scores (column scores " + string.Join(", ", note.List<double>("columnScores").Select(v => v.ToString("0.###", CultureInfo.InvariantCulture))) + " for the categories in the order listed)",
        };
        var rowScores = note.Flag("rowScores") ? $"; row scores 1 to {arms} for the arms in column order" : string.Empty;
        var compared = note.Flag("allArms")
            ? $"one test over all {arms} arms"
            : $"each active arm with {note.Text("control")}, those two arms only";
        var strata = note.List<string>("strata");
        string strataText;
        if (strata.Count == 0)
        {
            strataText = "unstratified";
        }
        else
        {
            var range = !note.Values.ContainsKey("fewestStrata") ? string.Empty
                : note.Number("fewestStrata") == note.Number("mostStrata") ? string.Create(CultureInfo.InvariantCulture, $"; {note.Number("fewestStrata")} strata")
                : string.Create(CultureInfo.InvariantCulture, $"; {note.Number("fewestStrata")} to {note.Number("mostStrata")} strata by visit and comparison");
            strataText = $"stratified by {string.Join(" x ", strata)}{(strata.Count > 1 ? " (cross-classified)" : string.Empty)}{range}";
        }
        return $"{note.Text("method")} (chi-square with {df} degree{(df == 1 ? "" : "s")} of freedom), {scores}{rowScores}; {strataText}; at each visit separately, {compared}. " +
            "Strata with fewer than 2 subjects with a response are left out of a test.";
    }

    /// <summary>Where a count is taken: "any arm", "all arms combined" or the arm named.</summary>
    private static string Place(string place, string arm) => place switch
    {
        "any-arm" => "any arm",
        "total" => "all arms combined",
        _ => arm,
    };

    /// <summary>"Age (years): ", "Nausea, QF-217 10 mg vs Placebo: ": what the note is about, then the comparison.</summary>
    private static string Subject(NoteSubject subject)
    {
        var parts = new List<string>();
        if (subject.What is { } what)
            parts.Add(what);
        if (subject.Arm is { } arm)
            parts.Add(subject.Control is { } control ? $"{arm} vs {control}" : arm);
        return parts.Count == 0 ? string.Empty : string.Join(", ", parts) + ": ";
    }

    private static string Ancova(ResultNote note)
    {
        var response = note.Text("response");
        var covariates = note.List<string>("covariates");
        var factors = note.List<string>("factors");
        var terms = new List<string> { "treatment (factor)" };
        terms.AddRange(covariates.Select(c => $"{c} (covariate)"));
        terms.AddRange(factors.Select(f => $"{f} (factor)"));
        var excluded = note.List<string>("excludedVisits").Zip(note.List<int>("excludedCounts"), (visit, count) => $"{visit}: {count}").ToList();
        var balance = factors.Count > 0
            ? $"LS means at the observed mean of {(covariates.Count > 0 ? string.Join(", ", covariates) : "no covariate")} with the levels of {string.Join(", ", factors)} weighted equally"
            : covariates.Count > 0 ? $"LS means at the observed mean of {string.Join(", ", covariates)}" : "LS means";
        return $"ANCOVA (general linear model, least squares) of {response} with {string.Join(", ", terms)}, fitted at each visit separately " +
            $"on the subjects with {response} and every model variable; {balance}. Differences are each arm minus {note.Text("control")} " +
            $"(or as labelled), with {LevelText.Of(note.Number("level"))} CIs and two-sided p-values from the t distribution on the residual degrees of freedom." +
            (excluded.Count > 0 ? $" Subjects with a value but a missing covariate, left out of the model: {string.Join("; ", excluded)}." : string.Empty);
    }

    private static string Denominators(ResultNote note)
    {
        var text = $"N = number of subjects in each column ({note.Text("population")}); percentages are of N.";
        if (note.OptionalText("armVariable") is { } variable)
            text += $" Columns are the arms of {variable}.";
        if (note.Flag("withValue"))
            text += " n = number of subjects with a value.";
        return text;
    }
}
