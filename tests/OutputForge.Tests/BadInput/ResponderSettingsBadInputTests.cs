using OutputForge.Tests.Support;

namespace OutputForge.Tests.BadInput;

/// <summary>Malformed "responders" settings give one clear located line (file, JSON path, what was expected), as the rest of the battery.</summary>
public sealed class ResponderSettingsBadInputTests
{
    private const string Anchor = "\"response\": \"AVALC = 'Y'\"\n  }";

    private static BadInputCase T(string name, string settings, params string[] expect) =>
        new(name, ["t1.json", .. expect]) { Table = [(Anchor, Anchor + ",\n  \"responders\": " + settings)] };

    public static TheoryData<BadInputCase> Cases() => new()
    {
        T("unknown stratum variable", "{ \"stratified\": { \"strata\": [\"AGE\", \"STRATX\"] } }", "$.responders.stratified.strata[1]", "ADSL", "no variable STRATX"),
        T("unknown difference method", "{ \"stratified\": { \"strata\": [\"AGE\"], \"difference\": \"logit\" } }", "$.responders.stratified.difference"),
        T("unknown stratified test", "{ \"stratified\": { \"strata\": [\"AGE\"], \"test\": \"fisher\" } }", "$.responders.stratified.test"),
        T("no strata", "{ \"stratified\": { \"strata\": [] } }", "$.responders.stratified.strata"),
        T("strata missing", "{ \"stratified\": { \"homogeneity\": true } }", "$.responders.stratified", "strata"),
        T("unknown ratio", "{ \"ratios\": [\"hazard-ratio\"] }", "$.responders.ratios[0]"),
        T("unknown odds ratio interval", "{ \"ratios\": [\"odds-ratio\"], \"oddsRatioInterval\": \"cornfield\" }", "$.responders.oddsRatioInterval"),
        T("homogeneity is a text", "{ \"stratified\": { \"strata\": [\"AGE\"], \"homogeneity\": \"yes\" } }", "$.responders.stratified.homogeneity", "boolean"),
        T("unknown settings key", "{ \"strata\": [\"AGE\"] }", "$.responders"),
    };

    [Theory]
    [MemberData(nameof(Cases))]
    public void Bad_responder_settings_give_one_located_line(BadInputCase input)
    {
        using var study = new MiniStudy();
        input.Apply(study);
        var error = new StringWriter();
        var code = OutputForge.Cli.Program.Run(["run", "--spec", study.Folder, "--out", study.OutputFolder, "--quiet"], error);
        var text = error.ToString();
        Assert.True(code != 0, $"{input.Name}: exit code 0");
        Assert.DoesNotContain("   at ", text);
        Assert.DoesNotContain("Exception", text);
        var first = text.Split('\n', StringSplitOptions.RemoveEmptyEntries).FirstOrDefault(l => l.Contains("error", StringComparison.OrdinalIgnoreCase)) ?? text;
        foreach (var fragment in input.Expect)
        {
            Assert.True(first.Contains(fragment, StringComparison.Ordinal), $"{input.Name}: expected '{fragment}' in: {first}");
        }
    }

    [Fact]
    public void A_missing_rule_outside_the_list_is_refused()
    {
        using var study = new MiniStudy(table: MiniStudy.TableJson.Replace("\"response\": \"AVALC = 'Y'\"", "\"response\": \"AVALC = 'Y'\", \"missing\": \"imputed\""));
        var error = new StringWriter();
        Assert.NotEqual(0, OutputForge.Cli.Program.Run(["run", "--spec", study.Folder, "--out", study.OutputFolder, "--quiet"], error));
        Assert.Contains("$.endpoint.missing", error.ToString());
    }
}
