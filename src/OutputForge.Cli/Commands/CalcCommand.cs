using System.CommandLine;
using OutputForge.Analysis;
using OutputForge.Choices;
using OutputForge.Cli.Calculator;
using OutputForge.Stats;

namespace OutputForge.Cli.Commands;

/// <summary>
/// `outputforge calc`: single numbers for a QC statistician, without a spec: a proportion's
/// interval, a difference of proportions, a test on an r x c table, and the stratified
/// (Cochran-Mantel-Haenszel) family, and multiplicity adjustments of several p-values. JSON on stdout with --json, readable lines otherwise.
/// Method names, the test choice and the level's range are those of the specs (<see cref="MethodCatalog"/>),
/// and the methods are the ones the tables run.
/// </summary>
public static class CalcCommand
{
    public static Command Create(TextWriter output, TextWriter error)
    {
        var command = new Command("calc", "Compute single statistics for QC checks: proportion, difference, table, stratified, multiplicity.");
        command.Subcommands.Add(Proportion(output, error));
        command.Subcommands.Add(Difference(output, error));
        command.Subcommands.Add(Table(output, error));
        command.Subcommands.Add(Stratified(output, error));
        command.Subcommands.Add(Multiplicity(output, error));
        return command;
    }

    private static Option<bool> Json() => new("--json") { Description = "Write the result as JSON on stdout." };

    private static Option<double> Level() => new("--level")
    {
        Description = $"Confidence level, {MethodCatalog.ConfidenceLevel.Describe()}.",
        DefaultValueFactory = _ => MethodCatalog.ConfidenceLevel.Default,
    };

    private static Option<int> Count(string name, string description) => new(name) { Description = description, Required = true };

    private static Option<string> Method(IEnumerable<string> names) => new("--method")
    {
        Description = "Method: " + string.Join(" | ", names),
        Required = true,
    };

    private static Command Proportion(TextWriter output, TextWriter error)
    {
        var events = Count("--events", "Number of events (responders).");
        var n = Count("--n", "Number of subjects.");
        var method = Method(MethodCatalog.ProportionInterval.Names);
        var level = Level();
        var json = Json();
        var command = new Command("proportion", "Confidence interval for a single proportion.") { events, n, method, level, json };
        command.SetAction(parse => Run(error, () =>
        {
            var chosen = Choose(MethodCatalog.ProportionInterval, parse.GetValue(method)!);
            var (x, total) = (parse.GetValue(events), parse.GetValue(n));
            CheckEvents(x, total, "--events", "--n");
            var result = new CalcOutput(output, parse.GetValue(json));
            result.Interval("proportion", ProportionInterval.Compute(x, total, chosen, CheckLevel(parse.GetValue(level))));
            result.Flush(single: true);
        }));
        return command;
    }

    private static Command Difference(TextWriter output, TextWriter error)
    {
        var events1 = Count("--events1", "Events in group 1.");
        var n1 = Count("--n1", "Subjects in group 1.");
        var events2 = Count("--events2", "Events in group 2.");
        var n2 = Count("--n2", "Subjects in group 2.");
        var method = Method(MethodCatalog.DifferenceInterval.Names);
        var level = Level();
        var json = Json();
        var command = new Command("difference", "Confidence interval for the difference of two proportions (group 1 minus group 2).")
        {
            events1, n1, events2, n2, method, level, json,
        };
        command.SetAction(parse => Run(error, () =>
        {
            var chosen = Choose(MethodCatalog.DifferenceInterval, parse.GetValue(method)!);
            CheckEvents(parse.GetValue(events1), parse.GetValue(n1), "--events1", "--n1");
            CheckEvents(parse.GetValue(events2), parse.GetValue(n2), "--events2", "--n2");
            var result = new CalcOutput(output, parse.GetValue(json));
            result.Interval("difference", ProportionDifferenceInterval.Compute(parse.GetValue(events1), parse.GetValue(n1),
                parse.GetValue(events2), parse.GetValue(n2), chosen, CheckLevel(parse.GetValue(level))));
            result.Flush(single: true);
        }));
        return command;
    }

    private static Command Table(TextWriter output, TextWriter error)
    {
        var counts = new Option<string>("--counts") { Description = "The table: counts separated by ',', rows by ';' (e.g. \"12,5;7,9\").", Required = true };
        var test = new Option<string>("--test")
        {
            Description = "Test: " + string.Join(" | ", MethodCatalog.TableTest.Names) + " (auto: chi-square, or Fisher's exact test when an expected count is below 5, as in tables).",
            Required = true,
        };
        var json = Json();
        var command = new Command("table", "A test of association on an r x c table.") { counts, test, json };
        command.SetAction(parse => Run(error, () =>
        {
            var chosen = Choose(MethodCatalog.TableTest, parse.GetValue(test)!, "--test");
            var table = CountsParser.Table(parse.GetValue(counts)!);
            if (chosen == TableTest.Yates && (table.GetLength(0) != 2 || table.GetLength(1) != 2))
            {
                throw new CalcInputException("--test yates: the continuity correction applies to 2 x 2 tables only");
            }
            var result = new CalcOutput(output, parse.GetValue(json));
            result.Test("test", TableTests.Compute(table, chosen));
            result.Flush(single: true);
        }));
        return command;
    }

    private static Command Stratified(TextWriter output, TextWriter error)
    {
        var counts = new Option<string>("--counts")
        {
            Description = "One table per stratum, separated by '|': 2 x 2 tables (\"a,b;c,d|e,f;g,h\", rows group 1 and group 2, columns events and non-events) for the CMH test, the Mantel-Haenszel odds ratio, relative risk and risk difference, the stratified Miettinen-Nurminen interval and Breslow-Day; larger tables for the generalized CMH statistics.",
            Required = true,
        };
        var scores = new Option<string?>("--scores")
        {
            Description = "Scores for the generalized statistics: \"row scores/column scores\", e.g. \"1,2,3/0,1\" (default: 1, 2, ... in the order given).",
        };
        var level = Level();
        var json = Json();
        var command = new Command("stratified", "Stratified analysis of 2 x 2 x K (or I x J x K) tables.") { counts, scores, level, json };
        command.SetAction(parse => Run(error, () =>
        {
            var strata = CountsParser.Strata(parse.GetValue(counts)!);
            var result = new CalcOutput(output, parse.GetValue(json));
            if (strata[0].GetLength(0) == 2 && strata[0].GetLength(1) == 2 && parse.GetValue(scores) is null)
            {
                var twoByTwo = strata.Select(t => new StratumCounts(t[0, 0], t[0, 0] + t[0, 1], t[1, 0], t[1, 0] + t[1, 1])).ToList();
                result.Test("cmh", CochranMantelHaenszelTest.Compute(twoByTwo));
                var chosenLevel = CheckLevel(parse.GetValue(level));
                result.Interval("commonOddsRatio", MantelHaenszelOddsRatio.Compute(twoByTwo, chosenLevel));
                result.Interval("commonRelativeRisk", MantelHaenszelRelativeRisk.Compute(twoByTwo, chosenLevel));
                result.Interval("commonRiskDifference", MantelHaenszelRiskDifference.Compute(twoByTwo, chosenLevel));
                result.Interval("commonRiskDifferenceMiettinenNurminen", StratifiedMiettinenNurminen.Compute(twoByTwo, chosenLevel));
                result.Test("breslowDay", BreslowDayTest.Compute(twoByTwo, taroneCorrection: false));
                result.Test("breslowDayTarone", BreslowDayTest.Compute(twoByTwo, taroneCorrection: true));
            }
            var (rowScores, columnScores) = Scores(parse.GetValue(scores), strata[0]);
            var generalized = GeneralizedCochranMantelHaenszel.Compute(strata, rowScores, columnScores);
            result.Test("generalAssociation", generalized.GeneralAssociation);
            result.Test("rowMeanScores", generalized.RowMeanScores);
            result.Test("correlation", generalized.NonzeroCorrelation);
            result.Flush(single: false);
        }));
        return command;
    }

    private static Command Multiplicity(TextWriter output, TextWriter error)
    {
        var p = new Option<string?>("--p") { Description = "The raw p-values, separated by ',' (hypotheses H1, H2, ... in this order)." };
        var file = new Option<string?>("--file")
        {
            Description = "A CSV file instead of --p: header 'hypothesis,p' with optional 'weight' and, for the graphical approach, one column per hypothesis (headed by its name) holding the transition matrix row.",
        };
        var method = Method(MethodCatalog.Multiplicity.Names);
        var alpha = new Option<double>("--alpha") { Description = "Familywise significance level, strictly between 0 and 1.", DefaultValueFactory = _ => 0.05 };
        var weights = new Option<string?>("--weights")
        {
            Description = "Weights for weighted-bonferroni, fallback and graphical, separated by ',' (each in [0, 1], summing to at most 1).",
        };
        var transitions = new Option<string?>("--transitions")
        {
            Description = "Transition matrix for graphical: entries separated by ',', rows by ';' (e.g. \"0,1;1,0\"); rows sum to at most 1, diagonal 0.",
        };
        var json = Json();
        var command = new Command("multiplicity", "Adjusted p-values and decisions of a multiplicity procedure over several hypotheses.")
        {
            p, file, method, alpha, weights, transitions, json,
        };
        command.SetAction(parse => Run(error, () =>
        {
            var chosen = Choose(MethodCatalog.Multiplicity, parse.GetValue(method)!);
            var (pText, path) = (parse.GetValue(p), parse.GetValue(file));
            if ((pText is null) == (path is null))
            {
                throw new CalcInputException("give the p-values either with --p or with --file, not both or neither");
            }
            if (path is not null && (parse.GetValue(weights) is not null || parse.GetValue(transitions) is not null))
            {
                throw new CalcInputException("--file holds the weights and the transition matrix too: --weights and --transitions go with --p only");
            }
            var hypotheses = path is null
                ? MultiplicityInputReader.FromOptions(pText!, parse.GetValue(weights), parse.GetValue(transitions))
                : MultiplicityInputReader.FromFile(path);
            var level = parse.GetValue(alpha);
            if (!(level > 0 && level < 1))
            {
                throw new CalcInputException(string.Create(System.Globalization.CultureInfo.InvariantCulture, $"--alpha: {level} is not strictly between 0 and 1"));
            }
            MultiplicityResult adjusted;
            try
            {
                adjusted = MultipleTesting.Adjust(chosen, hypotheses.PValues, level, hypotheses.Weights, hypotheses.Transitions);
            }
            catch (ArgumentException e) when (path is not null)
            {
                // The numbers came from the file: the message names it (exit code 2, as for any input file).
                throw new CalcFileException($"{Path.GetFileName(path)}: {e.Message.Split(" (Parameter")[0]}");
            }
            var result = new CalcOutput(output, parse.GetValue(json));
            result.Multiplicity("multiplicity", MethodCatalog.Multiplicity.NameOf(chosen), adjusted, hypotheses.Names);
            result.Flush(single: true);
        }));
        return command;
    }

    private static (IReadOnlyList<double>? Rows, IReadOnlyList<double>? Columns) Scores(string? text, int[,] shape)
    {
        if (text is null)
        {
            return (null, null);
        }
        var parts = text.Split('/');
        if (parts.Length != 2)
        {
            throw new CalcInputException("--scores: expected \"row scores/column scores\", e.g. \"1,2,3/0,1\"");
        }
        return (ScoreList(parts[0], shape.GetLength(0), "row"), ScoreList(parts[1], shape.GetLength(1), "column"));
    }

    private static IReadOnlyList<double> ScoreList(string text, int count, string what)
    {
        var values = text.Split(',', StringSplitOptions.TrimEntries).Select(v =>
            double.TryParse(v, System.Globalization.NumberStyles.Float, System.Globalization.CultureInfo.InvariantCulture, out var d) && double.IsFinite(d)
                ? d
                : throw new CalcInputException($"--scores: '{v}' is not a number")).ToList();
        if (values.Count != count)
        {
            throw new CalcInputException($"--scores: {values.Count} {what} scores for {count} {what}s");
        }
        return values;
    }

    private static T Choose<T>(OptionSet<T> choices, string name, string option = "--method") where T : struct, Enum =>
        choices.TryParse(name, out var chosen)
            ? chosen
            : throw new CalcInputException($"{option}: unknown '{name}'{choices.Hint(name)}");

    private static void CheckEvents(int events, int n, string eventsOption, string nOption)
    {
        if (n < 0 || events < 0)
        {
            throw new CalcInputException($"{(events < 0 ? eventsOption : nOption)}: counts cannot be negative");
        }
        if (events > n)
        {
            throw new CalcInputException($"{eventsOption}: {events} events cannot exceed {nOption} {n}");
        }
    }

    private static double CheckLevel(double level) =>
        MethodCatalog.ConfidenceLevel.Contains(level)
            ? level
            : throw new CalcInputException(string.Create(System.Globalization.CultureInfo.InvariantCulture,
                $"--level: {level} is not {MethodCatalog.ConfidenceLevel.Describe()}"));

    /// <summary>Every input of calc is a command-line value, so any input it cannot use is a usage error (exit code 1).</summary>
    private static int Run(TextWriter error, Action work)
    {
        try
        {
            work();
            return ExitCodes.Success;
        }
        catch (CalcInputException e)
        {
            error.WriteLine($"outputforge: error: {e.Message}");
            return ExitCodes.Usage;
        }
        catch (CalcFileException e)
        {
            error.WriteLine($"outputforge: error: {e.Message}");
            return ExitCodes.InputError;
        }
        catch (ArgumentException e)
        {
            error.WriteLine($"outputforge: error: {e.Message.Split(" (Parameter")[0]}");
            return ExitCodes.Usage;
        }
    }
}
