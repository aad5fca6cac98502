using System.CommandLine;
using System.Globalization;
using OutputForge.Choices;
using OutputForge.Cli.Calculator;
using OutputForge.Stats;
using OutputForge.Stats.Proportions;

namespace OutputForge.Cli.Commands;

/// <summary>
/// `outputforge calc noninferiority`: a difference (arm minus control) against a margin. From counts, the
/// Farrington-Manning score test and the Miettinen-Nurminen interval at 1 - 2 alpha; from an estimate and its standard
/// error (a continuous difference), the t (or normal) interval and test. The conclusion is printed as data.
/// </summary>
public static class CalcNonInferiorityCommand
{
    public static Command Create(TextWriter output, TextWriter error)
    {
        var events1 = new Option<int?>("--events1") { Description = "Events in the arm (group 1); with --n1, --events2, --n2 for proportions." };
        var n1 = new Option<int?>("--n1") { Description = "Subjects in the arm." };
        var events2 = new Option<int?>("--events2") { Description = "Events in the control (group 2)." };
        var n2 = new Option<int?>("--n2") { Description = "Subjects in the control." };
        var estimate = new Option<double?>("--estimate") { Description = "A continuous difference, arm minus control (instead of counts), with --standard-error." };
        var standardError = new Option<double?>("--standard-error") { Description = "The standard error of --estimate." };
        var df = new Option<double?>("--df") { Description = "Degrees of freedom of --estimate's t distribution (default: the normal distribution)." };
        var margin = new Option<double>("--margin") { Description = "The margin, a number at least 0 (its side follows from --hypothesis and --direction).", Required = true };
        var alpha = new Option<double>("--alpha") { Description = "One-sided alpha, between 0 and 0.5.", DefaultValueFactory = _ => 0.025 };
        var hypothesis = new Option<string>("--hypothesis")
        {
            Description = "Hypothesis: " + string.Join(" | ", MethodCatalog.MarginHypothesis.Names) + ".",
            DefaultValueFactory = _ => MethodCatalog.MarginHypothesis.DefaultName!,
        };
        var direction = new Option<string>("--direction")
        {
            Description = "Direction: " + string.Join(" | ", MethodCatalog.MarginDirection.Names) + ".",
            DefaultValueFactory = _ => MethodCatalog.MarginDirection.DefaultName!,
        };
        var json = CalcCommand.Json();
        var command = new Command("noninferiority", "A difference against a non-inferiority or superiority margin: Farrington-Manning test and Miettinen-Nurminen interval for proportions, or an estimate and its standard error.")
        {
            events1, n1, events2, n2, estimate, standardError, df, margin, alpha, hypothesis, direction, json,
        };
        command.SetAction(parse => CalcCommand.Run(error, () =>
        {
            var chosenHypothesis = CalcCommand.Choose(MethodCatalog.MarginHypothesis, parse.GetValue(hypothesis)!, "--hypothesis");
            var chosenDirection = CalcCommand.Choose(MethodCatalog.MarginDirection, parse.GetValue(direction)!, "--direction");
            var m = parse.GetValue(margin);
            var a = parse.GetValue(alpha);
            if (!(m >= 0) || !double.IsFinite(m))
            {
                throw new CalcInputException(string.Create(CultureInfo.InvariantCulture, $"--margin: {m} is not a number at least 0"));
            }
            if (!(a > 0 && a < 0.5))
            {
                throw new CalcInputException(string.Create(CultureInfo.InvariantCulture, $"--alpha: {a} is not between 0 and 0.5 (a one-sided alpha, e.g. 0.025)"));
            }
            var counts = new[] { parse.GetValue(events1), parse.GetValue(n1), parse.GetValue(events2), parse.GetValue(n2) };
            var continuous = parse.GetValue(estimate) is not null || parse.GetValue(standardError) is not null;
            MarginComparison result;
            if (continuous)
            {
                if (counts.Any(c => c is not null))
                {
                    throw new CalcInputException("--estimate: give either the counts (--events1, --n1, --events2, --n2) or --estimate with --standard-error, not both");
                }
                var (e, se) = (parse.GetValue(estimate), parse.GetValue(standardError));
                if (e is null || se is null)
                {
                    throw new CalcInputException($"{(e is null ? "--estimate" : "--standard-error")}: needed with {(e is null ? "--standard-error" : "--estimate")}");
                }
                if (!(se > 0) || !double.IsFinite(se.Value))
                {
                    throw new CalcInputException(string.Create(CultureInfo.InvariantCulture, $"--standard-error: {se} is not a positive number"));
                }
                if (parse.GetValue(df) is { } d && !(d > 0))
                {
                    throw new CalcInputException(string.Create(CultureInfo.InvariantCulture, $"--df: {d} is not a positive number"));
                }
                result = ContinuousMarginComparison.Compute(e.Value, se.Value, parse.GetValue(df), m, a, chosenHypothesis, chosenDirection);
            }
            else
            {
                string[] names = ["--events1", "--n1", "--events2", "--n2"];
                for (var k = 0; k < 4; k++)
                {
                    if (counts[k] is null)
                    {
                        throw new CalcInputException($"{names[k]}: needed (the counts --events1, --n1, --events2, --n2, or --estimate with --standard-error)");
                    }
                }
                if (parse.GetValue(df) is not null)
                {
                    throw new CalcInputException("--df: applies to --estimate only");
                }
                CalcCommand.CheckEvents(counts[0]!.Value, counts[1]!.Value, "--events1", "--n1");
                CalcCommand.CheckEvents(counts[2]!.Value, counts[3]!.Value, "--events2", "--n2");
                if (m >= 1)
                {
                    throw new CalcInputException(string.Create(CultureInfo.InvariantCulture, $"--margin: {m} is not below 1 (a difference of proportions)"));
                }
                result = FarringtonManningTest.Compute(counts[0]!.Value, counts[1]!.Value, counts[2]!.Value, counts[3]!.Value, m, a, chosenHypothesis, chosenDirection);
            }
            var written = new CalcOutput(output, parse.GetValue(json));
            Write(written, result);
            written.Flush(single: false);
        }));
        return command;
    }

    private static void Write(CalcOutput written, MarginComparison result)
    {
        written.Text("hypothesis", MethodCatalog.MarginHypothesis.NameOf(result.Hypothesis));
        written.Text("direction", MethodCatalog.MarginDirection.NameOf(result.Direction));
        written.Number("nullDifference", result.NullDifference);
        written.Number("alpha", result.Alpha);
        written.Interval("difference", result.Interval with { Notes = [.. result.Interval.Notes, .. result.Notes] });
        written.Test("test", result.Test);
        var shown = result.Hypothesis == MarginHypothesis.NonInferiority ? "non-inferiority" : "superiority";
        written.Text("conclusion", result.Conclusion switch
        {
            MarginConclusion.Shown => $"{shown} shown",
            MarginConclusion.NotShown => $"{shown} not shown",
            _ => "not estimable",
        });
    }
}
