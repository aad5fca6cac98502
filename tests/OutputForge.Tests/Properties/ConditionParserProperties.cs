using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using OutputForge.Data;
using OutputForge.Expressions;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.Properties;

/// <summary>Property-based checks of the condition language: any text parses or fails with our own error pointing inside it.</summary>
public sealed class ConditionParserProperties : IDisposable
{
    private readonly TempFolder _folder = new();
    private readonly Dataset _data;

    public ConditionParserProperties()
    {
        _data = CsvDatasetReader.Read("adsl", _folder.Write("adsl.csv", "USUBJID,SEX,AGE,TRTSDT\nS1,F,40,2026-01-10\nS2,M,,\n"));
    }

    public void Dispose() => _folder.Dispose();

    private void ParsesOrFailsInside(string text)
    {
        try
        {
            var condition = Condition.Compile(text, _data);
            _ = condition.Matches(0) | condition.Matches(1);
        }
        catch (ConditionSyntaxException e)
        {
            Assert.InRange(e.Position, 1, text.Length + 1);
        }
    }

    [Property(MaxTest = 1000)]
    public void Any_string_parses_or_fails_with_a_position(string? text) => ParsesOrFailsInside(text ?? string.Empty);

    private static readonly string[] Pieces =
        ["SEX", "AGE", "TRTSDT", "XYZ", "=", "!=", "<", ">=", "'F'", "\"M\"", "40", "-1.5", "'2026-01-01'", "(", ")", ",",
         "and", "or", "not", "in", "is", "missing", "'", "@", " "];

    [Property(MaxTest = 1000)]
    public Property Any_sequence_of_language_pieces_parses_or_fails_with_a_position()
    {
        var text = Gen.ListOf(Gen.Elements(Pieces)).Select(p => string.Join(" ", p));
        return Prop.ForAll(text.ToArbitrary(), t => ParsesOrFailsInside(t));
    }
}
