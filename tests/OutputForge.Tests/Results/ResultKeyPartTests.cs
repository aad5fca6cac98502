using OutputForge.Results;

namespace OutputForge.Tests.Results;

/// <summary>How one name is written in key form, and the tie-break of equal keys (docs/results.md, "Keys").</summary>
public sealed class ResultKeyPartTests
{
    [Theory]
    [InlineData("SEX", "sex")]
    [InlineData("F", "f")]
    [InlineData("QF-217 10 mg", "qf-217-10-mg")]
    [InlineData("mean (sd)", "mean-sd")]
    [InlineData("q1, q3", "q1-q3")]
    [InlineData("min - max", "min-max")]
    [InlineData("<65", "lt-65")]
    [InlineData(">=65", "ge-65")]
    [InlineData("<=18", "le-18")]
    [InlineData(">80", "gt-80")]
    [InlineData("25-<30", "25-lt-30")]
    [InlineData("≥ 2", "ge-2")]
    [InlineData("A+B", "a-plus-b")]
    [InlineData("100%", "100-pct")]
    [InlineData("Injury, poisoning and procedural complications", "injury-poisoning-and-procedural-complications")]
    [InlineData("0.5 mg", "0.5-mg")]
    [InlineData("29.5", "29.5")]
    [InlineData("v1.2.3", "v1.2.3")]
    [InlineData("end.", "end")]
    [InlineData("a. b", "a-b")]
    [InlineData("Café crème", "cafe-creme")]
    [InlineData("5 µg", "5-u3bc-g")]
    [InlineData("\"quoted\"\r\nline", "quoted-line")]
    [InlineData("  --  ", "blank")]
    [InlineData("", "blank")]
    [InlineData("(missing)", "missing")]
    [InlineData("soc:Gastrointestinal disorders", "soc-gastrointestinal-disorders")]
    [InlineData("under_score/slash", "under-score-slash")]
    public void A_name_is_written_in_key_form(string name, string part)
    {
        Assert.Equal(part, ResultKey.Part(name));
        Assert.True(ResultKey.IsKey(part), part);
        Assert.Equal(part, ResultKey.Part(part));
    }

    [Fact]
    public void A_key_joins_its_parts_outer_to_inner_with_a_slash()
    {
        Assert.Equal("sex/f", ResultKey.Of("SEX", "F"));
        Assert.Equal("soc-eye-disorders/pt-dry-eye/severity-mild", ResultKey.Below(ResultKey.Part("soc Eye disorders"), "pt Dry eye", "severity MILD"));
    }

    [Fact]
    public void Equal_keys_are_told_apart_in_order_and_distinct_keys_are_kept()
    {
        Assert.Equal(["header", "sex/f", "sex/f_2", "sex/m", "sex/f_3", "header_2"],
            ResultKey.Distinct(["header", "sex/f", "sex/f", "sex/m", "sex/f", "header"]));
        Assert.Equal(["a", "b"], ResultKey.Distinct(["a", "b"]));
        Assert.True(ResultKey.IsKey("sex/f_2"));
    }

    [Theory]
    [InlineData("SEX/F")]
    [InlineData("age/mean (sd)")]
    [InlineData("age/q1, q3")]
    [InlineData("soc:eye")]
    [InlineData("-a")]
    [InlineData("a-")]
    [InlineData("a//b")]
    [InlineData("a.b")]
    [InlineData("a_1")]
    [InlineData("a_b")]
    [InlineData("")]
    [InlineData("a\"b")]
    public void Text_outside_the_scheme_is_not_a_key(string text) => Assert.False(ResultKey.IsKey(text));
}
