using System.CommandLine;
using OutputForge.Choices;
using OutputForge.Cli.Calculator;
using OutputForge.Stats.Models;

namespace OutputForge.Cli.Commands;

/// <summary>
/// `outputforge calc mmrm`: a mixed model for repeated measures (<see cref="Mmrm"/>, REML) fitted to a CSV file of one
/// record per subject and visit. The model is the usual one of a primary analysis (common practice): treatment, visit,
/// treatment by visit, the class covariates, the numeric covariates and each numeric covariate by visit. Printed: the
/// fit (structure, -2 log restricted likelihood, convergence), LS means per arm at each visit and averaged over the
/// visits (other class covariates weighted equally, numeric covariates at their means), each arm minus the control
/// with its interval and p-value, and the Type 3 tests.
/// </summary>
public static class CalcMmrmCommand
{
    private const string AllVisits = "all visits";

    public static Command Create(TextWriter output, TextWriter error)
    {
        var data = new Option<string>("--data") { Description = "CSV file, one record per subject and visit, with a header row (a missing response: no record, or an empty value).", Required = true };
        var subject = new Option<string>("--subject") { Description = "Subject variable.", Required = true };
        var visit = new Option<string>("--visit") { Description = "Visit variable (numeric values in numeric order; text in the order of --visits, else as first seen).", Required = true };
        var visits = new Option<string?>("--visits") { Description = "The visits in time order, e.g. \"Week 4,Week 8,Week 12\"." };
        var response = new Option<string>("--response") { Description = "Response variable (e.g. the change from baseline).", Required = true };
        var treatment = new Option<string>("--treatment") { Description = "Treatment variable.", Required = true };
        var control = new Option<string>("--control") { Description = "The control's value of the treatment variable.", Required = true };
        var factors = new Option<string?>("--factors") { Description = "Class covariates, e.g. \"STRAT1R\"." };
        var covariates = new Option<string?>("--covariates") { Description = "Numeric covariates, each also by visit, e.g. \"BASE\"." };
        var covariance = new Option<string>("--covariance")
        {
            Description = "Covariance structure: " + string.Join(" | ", MethodCatalog.MmrmCovariance.Names) + ".",
            DefaultValueFactory = _ => MethodCatalog.MmrmCovariance.DefaultName!,
        };
        var df = new Option<string>("--df")
        {
            Description = "Degrees of freedom: " + string.Join(" | ", MethodCatalog.MmrmDegreesOfFreedom.Names) + ".",
            DefaultValueFactory = _ => MethodCatalog.MmrmDegreesOfFreedom.DefaultName!,
        };
        var level = CalcCommand.Level();
        var json = CalcCommand.Json();
        var command = new Command("mmrm", "Mixed model for repeated measures from a CSV file: LS means per visit, differences from the control, Type 3 tests.")
        {
            data, subject, visit, visits, response, treatment, control, factors, covariates, covariance, df, level, json,
        };
        command.SetAction(parse => CalcCommand.Run(error, () =>
        {
            var structure = CalcCommand.Choose(MethodCatalog.MmrmCovariance, parse.GetValue(covariance)!, "--covariance");
            var dfMethod = CalcCommand.Choose(MethodCatalog.MmrmDegreesOfFreedom, parse.GetValue(df)!, "--df");
            var chosenLevel = CalcCommand.CheckLevel(parse.GetValue(level));
            var factorNames = CalcRecords.Names(parse.GetValue(factors));
            var covariateNames = CalcRecords.Names(parse.GetValue(covariates));
            var (subjectName, visitName, responseName, treatmentName) = (parse.GetValue(subject)!, parse.GetValue(visit)!, parse.GetValue(response)!, parse.GetValue(treatment)!);
            var variables = new List<(string, string)> { ("--subject", subjectName), ("--visit", visitName), ("--response", responseName), ("--treatment", treatmentName) };
            variables.AddRange(factorNames.Select(f => ("--factors", f)));
            variables.AddRange(covariateNames.Select(c => ("--covariates", c)));
            var records = CalcRecords.Read(parse.GetValue(data)!, variables);
            var notes = new List<string>();
            if (records.LeftOut > 0)
            {
                notes.Add($"{records.LeftOut} records of {records.File} with a missing value in a model variable were left out");
            }
            var visitOrder = CalcRecords.Names(parse.GetValue(visits));
            var visitFactor = visitOrder.Count > 0 ? records.Factor("--visits", visitName, order: visitOrder) : records.VisitFactor(visitName, notes);
            var treatmentFactor = records.Factor("--treatment", treatmentName, parse.GetValue(control)!);
            var mmrmData = new MmrmData(records.Numbers(responseName),
                Enumerable.Range(0, records.Count).Select(r => records.TextOf(subjectName, r)).ToList(), visitFactor,
                [treatmentFactor, .. factorNames.Select(f => records.Factor("--factors", f))],
                covariateNames.Select(c => new LinearModelCovariate(c, records.Numbers(c))).ToList());
            var terms = new List<MmrmTerm> { MmrmTerm.Factor(treatmentName), MmrmTerm.Factor(visitName), MmrmTerm.Interaction(treatmentName, visitName) };
            terms.AddRange(factorNames.Select(MmrmTerm.Factor));
            terms.AddRange(covariateNames.Select(MmrmTerm.Numeric));
            terms.AddRange(covariateNames.Select(c => MmrmTerm.Slope(c, visitName)));
            var fit = Mmrm.Fit(mmrmData, new MmrmModel(terms, structure));
            var written = new CalcOutput(output, parse.GetValue(json));
            Write(written, fit, treatmentFactor, visitFactor, dfMethod, chosenLevel, records.Count, notes);
            written.Flush(single: false);
        }));
        return command;
    }

    private static void Write(CalcOutput written, MmrmFit fit, LinearModelFactor treatment, LinearModelFactor visit, MmrmDegreesOfFreedom dfMethod,
        double level, int count, List<string> notes)
    {
        written.Number("records", count);
        written.Text("covariance", MethodCatalog.MmrmCovariance.NameOf(fit.Structure));
        written.Text("degreesOfFreedom", MethodCatalog.MmrmDegreesOfFreedom.NameOf(dfMethod));
        if (!fit.IsEstimable)
        {
            written.Text("fit", "not estimable");
            written.Text("note", string.Join("; ", [fit.NotEstimableReason!, .. notes, .. fit.Notes]));
            return;
        }
        written.Number("minus2LogRestrictedLikelihood", -2 * fit.LogLikelihood);
        written.Number("iterations", fit.Iterations);
        written.Text("converged", fit.Converged ? "yes" : "no");
        var means = new List<CalcOutput>();
        var differences = new List<CalcOutput>();
        foreach (var visitLevel in visit.Levels.Append(AllVisits))
        {
            Dictionary<string, string> At(string arm) => visitLevel == AllVisits
                ? new() { [treatment.Name] = arm }
                : new() { [treatment.Name] = arm, [visit.Name] = visitLevel };
            foreach (var arm in treatment.Levels)
            {
                means.Add(Contrast(arm, visitLevel, fit.LeastSquaresMean(At(arm), dfMethod, level)));
                if (arm != treatment.Levels[0])
                {
                    differences.Add(Contrast(arm, visitLevel, fit.LeastSquaresMeanDifference(At(arm), At(treatment.Levels[0]), dfMethod, level)));
                }
            }
        }
        written.Groups("leastSquaresMeans", means);
        written.Groups("differencesFromControl", differences);
        written.Groups("type3Tests", fit.Type3Tests(dfMethod).Select(t =>
        {
            var g = CalcOutput.Nested();
            g.Text("term", t.Term);
            g.Number("numeratorDf", t.NumeratorDegreesOfFreedom);
            if (t.IsEstimable)
            {
                g.Number("denominatorDf", t.DenominatorDegreesOfFreedom);
                g.Number("f", t.F);
                g.Number("pValue", t.PValue);
            }
            else
            {
                g.Text("note", t.NotEstimableReason!);
            }
            return g;
        }).ToList());
        var all = notes.Concat(fit.Notes).ToList();
        if (all.Count > 0)
        {
            written.Text("note", string.Join("; ", all));
        }
    }

    private static CalcOutput Contrast(string arm, string visit, MmrmContrastResult c)
    {
        var g = CalcOutput.Nested();
        g.Text("arm", arm);
        g.Text("visit", visit);
        if (!c.IsEstimable)
        {
            g.Text("note", c.NotEstimableReason!);
            return g;
        }
        g.Number("estimate", c.Estimate);
        g.Number("standardError", c.StandardError);
        g.Number("df", c.DegreesOfFreedom);
        g.Number("lower", c.Lower);
        g.Number("upper", c.Upper);
        g.Number("t", c.T);
        g.Number("pValue", c.PValue);
        return g;
    }
}
