// The statistics library is split into one namespace per area (OutputForge.Stats.Proportions,
// .Contingency, ...). They are imported once here for the whole project rather than file by file, so
// that moving a method between areas touches no consumer file. Shared result types (TestResult,
// IntervalResult) stay in OutputForge.Stats itself.
global using OutputForge.Stats.Contingency;
global using OutputForge.Stats.Descriptive;
global using OutputForge.Stats.Exact;
global using OutputForge.Stats.MissingData;
global using OutputForge.Stats.Models;
global using OutputForge.Stats.Multiplicity;
global using OutputForge.Stats.Proportions;
global using OutputForge.Stats.Stratified;
global using OutputForge.Stats.Survival;
