using System.CommandLine;
using OutputForge.Choices;
using OutputForge.Cli.Calculator;
using OutputForge.Stats;
using OutputForge.Stats.Models;

namespace OutputForge.Cli.Commands;

/// <summary>
/// `outputforge calc logistic`: the covariate-adjusted logistic regression of a 0/1 (or Y/N) response in a CSV file on
/// the treatment, class covariates and numeric covariates (<see cref="AdjustedLogisticRegression"/>): coefficients,
/// each arm's adjusted odds ratio against the control (Wald and profile-likelihood intervals, Wald and
/// likelihood-ratio p), the marginal risk difference, the tests of the treatment term and the notes.
/// </summary>
public static class CalcLogisticCommand
{
    public static Command Create(TextWriter output, TextWriter error)
    {
        var data = new Option<string>("--data") { Description = "CSV file, one record per subject, with a header row.", Required = true };
        var response = new Option<string>("--response") { Description = "Response variable: 1 or 0 (or Y or N).", Required = true };
        var treatment = new Option<string>("--treatment") { Description = "Treatment variable.", Required = true };
        var control = new Option<string>("--control") { Description = "The control's value of the treatment variable.", Required = true };
        var factors = new Option<string?>("--factors") { Description = "Class covariates, e.g. \"STRAT1R,STRAT2R\" (levels in sorted order, the first the reference)." };
        var covariates = new Option<string?>("--covariates") { Description = "Numeric covariates, e.g. \"BASE\"." };
        var estimation = new Option<string>("--estimation")
        {
            Description = "Estimation: " + string.Join(" | ", MethodCatalog.LogisticEstimation.Names) + ".",
            DefaultValueFactory = _ => MethodCatalog.LogisticEstimation.DefaultName!,
        };
        var level = CalcCommand.Level();
        var json = CalcCommand.Json();
        var command = new Command("logistic", "Covariate-adjusted logistic regression from a CSV file: adjusted odds ratios, tests and the marginal risk difference.")
        {
            data, response, treatment, control, factors, covariates, estimation, level, json,
        };
        command.SetAction(parse => CalcCommand.Run(error, () =>
        {
            var chosen = CalcCommand.Choose(MethodCatalog.LogisticEstimation, parse.GetValue(estimation)!, "--estimation");
            var chosenLevel = CalcCommand.CheckLevel(parse.GetValue(level));
            var factorNames = CalcRecords.Names(parse.GetValue(factors));
            var covariateNames = CalcRecords.Names(parse.GetValue(covariates));
            var variables = new List<(string, string)> { ("--response", parse.GetValue(response)!), ("--treatment", parse.GetValue(treatment)!) };
            variables.AddRange(factorNames.Select(f => ("--factors", f)));
            variables.AddRange(covariateNames.Select(c => ("--covariates", c)));
            var records = CalcRecords.Read(parse.GetValue(data)!, variables);
            var analysis = new LogisticAnalysisData(records.Binary(parse.GetValue(response)!),
                records.Factor("--treatment", parse.GetValue(treatment)!, parse.GetValue(control)!),
                factorNames.Select(f => records.Factor("--factors", f)).ToList(),
                covariateNames.Select(c => new LinearModelCovariate(c, records.Numbers(c))).ToList());
            var result = AdjustedLogisticRegression.Analyze(analysis, chosen, chosenLevel);
            var written = new CalcOutput(output, parse.GetValue(json));
            Write(written, result, records);
            written.Flush(single: false);
        }));
        return command;
    }

    private static void Write(CalcOutput written, AdjustedLogisticResult result, CalcRecords records)
    {
        written.Number("observations", result.Observations);
        var notes = new List<string>();
        if (records.LeftOut > 0)
        {
            notes.Add($"{records.LeftOut} records of {records.File} with a missing value in a model variable were left out");
        }
        notes.AddRange(result.Notes.Select(n => n.Text));
        if (!result.IsEstimable)
        {
            written.Text("estimation", "not estimable");
            notes.Insert(0, result.NotEstimableReason!);
            written.Text("note", string.Join("; ", notes));
            return;
        }
        written.Text("estimation", result.FirthUsed ? "Firth penalized likelihood" : "maximum likelihood");
        written.Number("deviance", result.Deviance);
        if (result.PenalizedLogLikelihood is { } penalized)
        {
            written.Number("penalizedLogLikelihood", penalized);
        }
        written.Groups("coefficients", result.Coefficients.Select(c =>
        {
            var g = CalcOutput.Nested();
            g.Text("name", c.Name);
            g.Number("estimate", c.Estimate);
            g.Number("standardError", c.StandardError);
            g.Number("z", c.Z);
            g.Number("pValue", c.WaldPValue);
            return g;
        }).ToList());
        written.Groups("comparisons", result.Comparisons.Select(c =>
        {
            var g = CalcOutput.Nested();
            g.Text("arm", c.Arm);
            g.Text("control", c.Control);
            g.Interval("oddsRatioWald", c.OddsRatioWald);
            g.Interval("oddsRatioProfile", c.OddsRatioProfile);
            g.Test("wald", c.WaldTest);
            g.Test("likelihoodRatio", c.LikelihoodRatioTest);
            g.Number("standardizedRiskArm", c.StandardizedRiskArm);
            g.Number("standardizedRiskControl", c.StandardizedRiskControl);
            g.Interval("marginalRiskDifference", c.MarginalRiskDifference);
            return g;
        }).ToList());
        written.Test("treatmentLikelihoodRatio", result.TreatmentLikelihoodRatioTest);
        written.Test("treatmentWald", result.TreatmentWaldTest);
        if (notes.Count > 0)
        {
            written.Text("note", string.Join("; ", notes));
        }
    }
}
