using System.Text.Json;
using OutputForge.Cli;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.Cli;

/// <summary>`outputforge calc multiplicity`: adjusted p-values and decisions from the command line or a small CSV file.</summary>
public sealed class CalcMultiplicityTests
{
    private static (int Code, string Output, string Error) Run(params string[] args)
    {
        var output = new StringWriter();
        var error = new StringWriter();
        var code = Program.Run(["calc", "multiplicity", .. args], error, output);
        return (code, output.ToString(), error.ToString());
    }

    private static JsonElement[] Hypotheses(params string[] args)
    {
        var (code, output, error) = Run([.. args, "--json"]);
        Assert.True(code == 0, error);
        return JsonDocument.Parse(output).RootElement.GetProperty("hypotheses").EnumerateArray().Select(e => e.Clone()).ToArray();
    }

    [Fact]
    public void Holm_gives_R_p_adjust_values_and_the_order_of_rejection()
    {
        // R 4.2.2 p.adjust(c(0.01, 0.04, 0.03, 0.005), "holm") = 0.03, 0.06, 0.06, 0.02
        // (tests/OutputForge.Stats.Tests/Oracles/multiplicity_oracles.json, case "distinct").
        var result = Hypotheses("--p", "0.01,0.04,0.03,0.005", "--method", "holm");
        Assert.Equal(["H1", "H2", "H3", "H4"], result.Select(h => h.GetProperty("hypothesis").GetString()));
        Assert.Equal([0.03, 0.06, 0.06, 0.02], result.Select(h => Math.Round(h.GetProperty("adjustedP").GetDouble(), 15)));
        Assert.Equal([true, false, false, true], result.Select(h => h.GetProperty("rejected").GetBoolean()));
        Assert.Equal([2, 0, 0, 1], result.Select(h => h.GetProperty("rejectionOrder").ValueKind == JsonValueKind.Null ? 0 : h.GetProperty("rejectionOrder").GetInt32()));
    }

    [Fact]
    public void The_graphical_approach_from_a_file_gives_the_hand_worked_example()
    {
        // Two doses with a primary and a secondary hypothesis each, the graph and the hand computation of
        // tests/OutputForge.Stats.Tests/GraphicalProcedureTests (Bretz et al. 2009, Algorithm 1's update):
        // adjusted p-values 0.02, 0.03, 0.02, 0.5; at alpha 0.025 the two of dose 1 are rejected, primary first.
        using var folder = new TempFolder();
        var file = folder.Write("graph.csv", """
            hypothesis,p,weight,P1,P2,S1,S2
            P1,0.01,0.5,0,0,1,0
            P2,0.03,0.5,0,0,0,1
            S1,0.005,0,0,1,0,0
            S2,0.5,0,1,0,0,0
            """);
        var result = Hypotheses("--file", file, "--method", "graphical", "--alpha", "0.025");
        Assert.Equal(["P1", "P2", "S1", "S2"], result.Select(h => h.GetProperty("hypothesis").GetString()));
        Assert.Equal([0.02, 0.03, 0.02, 0.5], result.Select(h => Math.Round(h.GetProperty("adjustedP").GetDouble(), 14)));
        Assert.Equal([1, 0, 2, 0], result.Select(h => h.GetProperty("rejectionOrder").ValueKind == JsonValueKind.Null ? 0 : h.GetProperty("rejectionOrder").GetInt32()));
        // The same graph on the command line.
        var inline = Hypotheses("--p", "0.01,0.03,0.005,0.5", "--method", "graphical", "--alpha", "0.025", "--weights", "0.5,0.5,0,0",
            "--transitions", "0,0,1,0;0,0,0,1;0,1,0,0;1,0,0,0");
        Assert.Equal(result.Select(h => h.GetProperty("adjustedP").GetDouble()), inline.Select(h => h.GetProperty("adjustedP").GetDouble()));
    }

    [Fact]
    public void The_readable_output_has_one_line_per_hypothesis()
    {
        var (code, output, _) = Run("--p", "0.01,0.2", "--method", "bonferroni");
        Assert.Equal(0, code);
        Assert.Equal(["multiplicity: bonferroni, familywise alpha 0.05", "H1: raw p 0.01, adjusted p 0.02, rejected, order 1", "H2: raw p 0.2, adjusted p 0.4, not rejected"],
            output.Split('\n', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries));
    }

    [Theory]
    [InlineData("the weights sum to 1.2; they must sum to at most 1", "--p", "0.01,0.02", "--method", "weighted-bonferroni", "--weights", "0.6,0.6")]
    [InlineData("row 1 of the transition matrix sums to 1.5", "--p", "0.01,0.02,0.03", "--method", "graphical", "--weights", "0.5,0.5,0", "--transitions", "0,0.8,0.7;1,0,0;1,0,0")]
    [InlineData("the diagonal must be 0", "--p", "0.01,0.02", "--method", "graphical", "--weights", "0.5,0.5", "--transitions", "0.5,0.5;1,0")]
    [InlineData("the graphical procedure needs a transition matrix", "--p", "0.01,0.02", "--method", "graphical", "--weights", "0.5,0.5")]
    [InlineData("the holm procedure takes no weights", "--p", "0.01,0.02", "--method", "holm", "--weights", "0.5,0.5")]
    [InlineData("p-value 2 is 1.2; a p-value must lie between 0 and 1", "--p", "0.01,1.2", "--method", "holm")]
    [InlineData("--p: 'abc' is not a number", "--p", "0.01,abc", "--method", "holm")]
    [InlineData("either with --p or with --file", "--method", "holm")]
    [InlineData("--alpha: 1.5 is not strictly between 0 and 1", "--p", "0.01", "--method", "holm", "--alpha", "1.5")]
    [InlineData("unknown 'holmes'", "--p", "0.01", "--method", "holmes")]
    public void Bad_arguments_are_usage_errors_with_one_line_and_exit_code_1(string message, params string[] args)
    {
        var (code, output, error) = Run(args);
        Assert.Equal(ExitCodes.Usage, code);
        Assert.Empty(output);
        var line = Assert.Single(error.Split('\n', StringSplitOptions.RemoveEmptyEntries));
        Assert.Contains(message, line, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("hypothesis,p\nA,0.01\nB,x\n", "graph.csv line 3: 'x' in column 'p' is not a number")]
    [InlineData("name,p\nA,0.01\n", "graph.csv line 1: the header must name the columns 'hypothesis' and 'p'")]
    [InlineData("hypothesis,p\nA,0.01,3\n", "graph.csv line 2: 3 values but the header has 2 columns")]
    [InlineData("hypothesis,p\nA,0.01\nA,0.02\n", "graph.csv: hypothesis name 'A' is given twice")]
    [InlineData("hypothesis,p,weight,A,B\nA,0.01,0.7,0,1\nB,0.02,0.7,1,0\n", "graph.csv: the weights sum to 1.4; they must sum to at most 1")]
    [InlineData("hypothesis,p,weight,A\nA,0.01,0.5,0\nB,0.02,0.5,1\n", "graph.csv line 1: the transition matrix has no column for hypothesis 'B'")]
    public void A_file_that_cannot_be_used_is_named_with_its_line_and_exit_code_2(string content, string message)
    {
        using var folder = new TempFolder();
        var file = folder.Write("graph.csv", content);
        var (code, output, error) = Run("--file", file, "--method", "graphical");
        Assert.Equal(ExitCodes.InputError, code);
        Assert.Empty(output);
        var line = Assert.Single(error.Split('\n', StringSplitOptions.RemoveEmptyEntries));
        Assert.StartsWith("outputforge: error: " + message, line, StringComparison.Ordinal);
    }
}
