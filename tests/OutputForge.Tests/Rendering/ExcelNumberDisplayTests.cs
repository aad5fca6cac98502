using System.Globalization;
using OutputForge.Rendering.Excel;

namespace OutputForge.Tests.Rendering;

public sealed class ExcelNumberDisplayTests
{
    /// <summary>
    /// Source: Oracles/spreadsheet_display.csv, produced by Oracles/spreadsheet_display.py, which
    /// lets LibreOffice Calc 7.4.7.2 open an .xlsx with these numbers and formats and export the
    /// displayed text. The one difference allowed is the sign of a rounded zero ("-0.0" or "0.0"),
    /// which Calc drops and Excel, recalled from memory, keeps.
    /// </summary>
    [Fact]
    public void Display_matches_what_a_spreadsheet_application_shows()
    {
        string path = Path.Combine(RepositoryRoot.Find(), "tests", "OutputForge.Tests", "Rendering", "Oracles", "spreadsheet_display.csv");
        var cases = File.ReadAllLines(path).Where(l => !l.StartsWith('#')).Skip(1).Select(l => l.Split(',')).ToList();

        Assert.True(cases.Count >= 25, $"only {cases.Count} cases in {path}");
        foreach (var c in cases)
        {
            double value = double.Parse(c[0], CultureInfo.InvariantCulture);
            string? shown = ExcelNumberDisplay.Display(value, c[1]);
            Assert.True(shown is not null, $"{c[0]} in {c[1]}: format not recognised");
            Assert.True(shown.TrimStart('-') == c[2].TrimStart('-') && (shown == c[2] || IsZero(c[2])),
                $"{c[0]} in {c[1]}: expected \"{c[2]}\", got \"{shown}\"");
        }
    }

    [Theory]
    [InlineData("#,##0.0")]
    [InlineData("0.0E+00")]
    [InlineData("General")]
    public void Other_formats_are_not_judged(string format)
    {
        Assert.Null(ExcelNumberDisplay.Display(1234.5, format));
        Assert.True(ExcelNumberDisplay.Agrees(1234.5, format, "anything"));
    }

    [Theory]
    [InlineData(0.41207, "0.000", "0.412", true)]
    [InlineData(0.4126, "0.000", "0.412", false)]
    [InlineData(-0.04, "0.0", "0.0", true)]
    [InlineData(-0.04, "0.0", "-0.0", true)]
    [InlineData(0.25333, "0.0%", "25.3%", true)]
    [InlineData(0.25333, "0.0%", "25.3", false)]
    public void Agreement_of_a_number_with_the_table_text(double value, string format, string text, bool agrees) =>
        Assert.Equal(agrees, ExcelNumberDisplay.Agrees(value, format, text));

    private static bool IsZero(string text) => text.All(ch => ch is '0' or '.' or '-' or '%');
}
