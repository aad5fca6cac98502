using OutputForge.Rendering.Excel;

namespace OutputForge.Tests.Rendering;

/// <summary>Excel's sheet name rules: 31 characters, none of : \ / ? * [ ], no apostrophe at either end.</summary>
public sealed class ExcelSheetNameTests
{
    [Theory]
    [InlineData("14.2.1", "14.2.1")]
    [InlineData("14.2/1:a*b?[c]\\d", "14.2_1_a_b__c__d")]
    [InlineData("'quoted'", "quoted")]
    [InlineData("   ", "Table")]
    [InlineData("history", "History table")]
    [InlineData("14.3.1.1.1 Adverse events by body system and term", "14.3.1.1.1 Adverse events by bo")]
    public void Names_are_made_valid(string wanted, string expected)
    {
        var name = ExcelSheetName.Sanitize(wanted);

        Assert.Equal(expected, name);
        Assert.True(name.Length <= 31);
    }

    [Fact]
    public void Repeated_names_get_a_number_and_stay_within_31_characters()
    {
        var names = new ExcelSheetName();
        var wanted = new string('a', 40);

        Assert.Equal(new string('a', 31), names.Next(wanted));
        Assert.Equal(new string('a', 27) + " (2)", names.Next(wanted));
        Assert.Equal("B", names.Next("B"));
        Assert.Equal("b (2)", names.Next("b"));
    }
}
