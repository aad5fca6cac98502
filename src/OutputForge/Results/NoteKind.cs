namespace OutputForge.Results;

/// <summary>
/// What a note says, as a code; Layout's <c>NoteWording</c> holds the one wording of each. The values a kind needs are
/// named beside it (<see cref="ResultNote.Values"/>).
/// </summary>
public enum NoteKind
{
    /// <summary>What N, n and the percentages of a summary table are. Values: population; optional armVariable (the arms' variable is named), withValue (n counts subjects with a value).</summary>
    Denominators,
    /// <summary>The tests across the treatment arms of a summary table, grouped by method. Values: methods and subjects (parallel lists: the method of each tested block or variable).</summary>
    AcrossArmsTest,
    /// <summary>Each arm tested against the control on subjects with vs without an event. Values: method, control.</summary>
    PairwiseEventTest,
    /// <summary>Where neither arm of a comparison has the event, one table fits the margins and p is 1.</summary>
    SingleTableFits,
    /// <summary>What N and n (%) of an event table are. Values: population.</summary>
    EventDenominators,
    /// <summary>What [E] is.</summary>
    EventCounts,
    /// <summary>How severity rows count subjects. Values: levels (in increasing severity), withEvents.</summary>
    SeverityRows,
    /// <summary>The condition selecting the events counted. Values: condition.</summary>
    EventsCounted,
    /// <summary>The threshold a preferred term must reach to be shown. Values: percent, place ("any-arm", "total" or "arm"), arm (the arm's value when place is "arm").</summary>
    TermThreshold,
    /// <summary>The order of the rows. Values: place ("total" or "arm") and arm when by frequency; none when alphabetical.</summary>
    RowOrder,
    /// <summary>What N and n of a by-visit summary are. Values: population.</summary>
    VisitDenominators,
    /// <summary>The analysis of covariance of a continuous endpoint. Values: response, covariates, factors, control, level, excludedVisits and excludedCounts (parallel lists).</summary>
    AncovaModel,
    /// <summary>The dose-response test of a continuous endpoint. Values: dose (the numeric dose variable).</summary>
    DoseResponseTest,
    /// <summary>A model could not be fitted; the subject names the visit. Values: model, reason.</summary>
    ModelNotFitted,
    /// <summary>No subject of an arm has the response and every covariate, so the arm has no LS mean. Values: response.</summary>
    ArmNotInModel,
    /// <summary>The time unit and the censoring flag of a time-to-event table. Values: unit, censor.</summary>
    TimeUnits,
    /// <summary>The Kaplan-Meier median and its interval. Values: level.</summary>
    KaplanMeierMedian,
    /// <summary>The Kaplan-Meier estimates at fixed times. Values: level, cumulative (the probability of the event rather than of its absence).</summary>
    KaplanMeierAtTimes,
    /// <summary>The log-rank test of each arm against the control. Values: strata (the stratification variables; empty when unstratified), control.</summary>
    LogRankTest,
    /// <summary>The Cox model hazard ratio. Values: strata, control, ties, level, cumulative.</summary>
    CoxHazardRatio,
    /// <summary>Subjects without a value of a stratification variable, left out (of the whole table, with leftOutOf "stratified-analysis" of that analysis, with "test" of the test of the visit and comparison the subject names). Values: subjects, variables, leftOutOf.</summary>
    NoStratumValue,
    /// <summary>A stratum (subject: its values) that adds nothing to a stratified method. Values: reason ("one-group-only", "no-events").</summary>
    StratumAddsNothing,
    /// <summary>
    /// A stratum (subject: its values, and what the method was about) that a stratified method left out. Values: reason
    /// ("no-subjects", "single-subject", "empty-group", "one-group-only", "no-events", "all-events"); group (the group
    /// without subjects, for "empty-group"); method (the one method that left it out, where the others kept it); term
    /// (what the strata are called, e.g. "Level"; "Stratum" when absent).
    /// </summary>
    StratumLeftOut,
    /// <summary>The Cox model gives no hazard ratio for a comparison. Values: reason.</summary>
    NoHazardRatio,
    /// <summary>The interval of each arm's proportion of responders. Values: method, level.</summary>
    ProportionInterval,
    /// <summary>The difference in proportions and its interval. Values: method, level, control.</summary>
    DifferenceInterval,
    /// <summary>The unstratified test of each arm against the control. Values: method; or automatic with methods and arms of the comparisons tested (parallel lists), allTested and control.</summary>
    UnstratifiedTest,
    /// <summary>What N and the percentages of a responder table are, by its missing-data rule. Values: population, missing, dataset, derivation.</summary>
    ResponderDenominators,
    /// <summary>The stratified common difference. Values: scoreInterval (stratified Miettinen-Nurminen rather than Mantel-Haenszel with Sato's variance), control, level.</summary>
    StratifiedDifference,
    /// <summary>The Cochran-Mantel-Haenszel test. Values: corrected, control.</summary>
    CmhTest,
    /// <summary>The Breslow-Day test of equal odds ratios.</summary>
    HomogeneityTest,
    /// <summary>The relative risk. Values: stratified, control, level.</summary>
    RelativeRisk,
    /// <summary>The odds ratio. Values: stratified, method (the interval's), control, level.</summary>
    OddsRatio,
    /// <summary>What the strata are. Values: variables.</summary>
    StrataDefinition,
    /// <summary>Combinations of the stratification values without a subject of the population. Values: strata.</summary>
    EmptyStrata,
    /// <summary>Strata with one subject in the population. Values: strata.</summary>
    SingleSubjectStrata,
    /// <summary>A stratum (subject: its values, and the comparison) left out because it lacks subjects of one or both arms. Values: subjects; withoutArm when it has subjects of one arm.</summary>
    DroppedStratum,
    /// <summary>What n/N (%) of a subgroup table are. Values: nonResponders (the missing-data rule), population, endpoint.</summary>
    SubgroupCounts,
    /// <summary>The effect of each arm vs the control within a subgroup, and when it is NE. Values: measure ("difference", "odds-ratio", "relative-risk"), method, control, level, minimum.</summary>
    SubgroupEffect,
    /// <summary>The treatment-by-subgroup interaction test. Values: method ("likelihood-ratio", "breslow-day", "breslow-day-tarone"), control.</summary>
    SubgroupInteraction,
    /// <summary>How the levels of each subgroup variable are ordered. Values: labels, variables, orders ("spec", "alphabetical" or the ordering variable; parallel lists).</summary>
    SubgroupLevels,
    /// <summary>Subjects in no subgroup of a variable (subject: its label and name). Values: subjects; unlistedValues when they have values the spec does not list.</summary>
    InNoSubgroup,
    /// <summary>A subgroup's effect was not estimated. Values: measure, reason.</summary>
    EffectNotEstimated,
    /// <summary>A test gave no p-value. Values: reason.</summary>
    NoPValue,
    /// <summary>Expected counts below 5 in a chi-square test (Cochran 1954). Values: below, cells, smallest; ofCells (a 2 x 2 comparison's wording, "expected cell counts").</summary>
    SmallExpectedCounts,
    /// <summary>A test gave no result. Values: method, reason.</summary>
    TestNotEstimable,
    /// <summary>What N, n and the percentages of a categorical response by visit are. Values: population, missingRow (the table has a Missing row).</summary>
    VisitResponseDenominators,
    /// <summary>
    /// The records a by-visit table counts. Values: parameter and where (optional: the endpoint's selection), imputation
    /// (optional: the DTYPE of imputed records kept), visits and imputedCounts (parallel lists: the imputed responses counted).
    /// </summary>
    VisitRecordSelection,
    /// <summary>
    /// The generalized Cochran-Mantel-Haenszel test of a by-visit table. Values: method, df (at full rank), scores
    /// ("equal-spacing", "modified-ridit", "table" or "nominal"), categories (their number), columnScores (the table
    /// scores), rowScores (row scores 1 to arms are used), arms (their number), allArms (one test over all arms), control,
    /// strata (the stratification variables; empty when unstratified), fewestStrata and mostStrata (over the visits and
    /// comparisons; absent when no test ran).
    /// </summary>
    VisitCmhTest,
    /// <summary>Strata (subject: the visit and comparison) left out of a test for having fewer than 2 subjects. Values: strata, subjects (parallel lists).</summary>
    StrataTooSmall,
    /// <summary>A test's covariance matrix is singular (subject: the visit and comparison), so it has fewer degrees of freedom. Values: rank, nominalDf.</summary>
    SingularCovariance,
    /// <summary>A p-value shown as NE (subject: the visit and comparison). Values: reason.</summary>
    PValueNotEstimable,
    /// <summary>No record of a dataset has the DTYPE of the imputation asked for. Values: file, imputation, types (the DTYPE values present).</summary>
    NoImputedRecords,
    /// <summary>A remark of a statistical method on its own input (e.g. empty rows left out), as the method words it. Values: text.</summary>
    MethodRemark,
    /// <summary>An NE in the table: the subject names the row and column. Values: reason.</summary>
    NotEstimable,
    /// <summary>Text worded before Layout by a part not yet moved to structured notes (e.g. the summary's level checks). Values: text.</summary>
    Text,
}
