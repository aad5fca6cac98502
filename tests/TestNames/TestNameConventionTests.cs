using System.Reflection;
using System.Text.RegularExpressions;

namespace OutputForge.TestNames;

// The house convention for test names (DEVELOPERS.md, "Rules for tests"): a sentence that says what holds, its words
// joined by underscores. This file is compiled into every test project (tests/Directory.Build.targets) and checks the
// tests of the project it is in. Names from before the convention are listed in test-name-exceptions.txt; that list
// only shrinks: a listed test that is renamed or removed must leave it.
public sealed class TestNameConventionTests
{
    // A word is lower case, Capitalized, or kept as written when it is an acronym or a number (ADSL, ISO, 8601, 2x2).
    // A word that joins words in PascalCase ("ShellsNeed") is not a word, so a PascalCase name does not match.
    private const string Word = "(?:[A-Z]?[a-z0-9]+|[A-Z0-9]+)";
    private static readonly Regex Sentence = new($"^{Word}(?:_{Word})+$", RegexOptions.CultureInvariant);

    private const string ExceptionsResource = "OutputForge.TestNames.test-name-exceptions.txt";

    [Theory]
    [InlineData("A_wrong_variable_name_gives_one_located_line_and_exit_code_2", true)]
    [InlineData("Dates_are_ISO_8601", true)]
    [InlineData("Breslow_Day_is_the_Stats_test_on_the_levels_as_strata", true)]
    [InlineData("DemoShellsNeedNoDataAndKeepTheTablesLayout", false)]
    [InlineData("ParseDate_returns_null", false)]
    [InlineData("Reads", false)]
    [InlineData("Two__underscores", false)]
    public void The_convention_accepts_sentences_and_rejects_pascal_case(string name, bool accepted)
    {
        Assert.Equal(accepted, Sentence.IsMatch(name));
    }

    [Fact]
    public void New_test_names_are_sentences_with_words_joined_by_underscores()
    {
        var assembly = typeof(TestNameConventionTests).Assembly;
        var tests = TestMethods(assembly).ToList();
        Assert.NotEmpty(tests);
        var exceptions = Exceptions();

        var offending = tests.Where(t => !Sentence.IsMatch(t.Method) && !exceptions.Contains(t.FullName))
            .Select(t => t.FullName).Order(StringComparer.Ordinal).ToList();
        Assert.True(offending.Count == 0,
            "Test names must be sentences with words joined by underscores (DEVELOPERS.md, \"Rules for tests\"); rename:\n"
            + string.Join("\n", offending));

        // The list only shrinks: an entry of this project whose test is gone or now follows the convention goes.
        var byName = tests.ToDictionary(t => t.FullName, StringComparer.Ordinal);
        var stale = exceptions.Where(e => assembly.GetType(e[..e.LastIndexOf('.')]) is not null
                                          && (!byName.TryGetValue(e, out var test) || Sentence.IsMatch(test.Method)))
            .Order(StringComparer.Ordinal).ToList();
        Assert.True(stale.Count == 0,
            "Remove from tests/TestNames/test-name-exceptions.txt (renamed, removed or now following the convention):\n"
            + string.Join("\n", stale));
    }

    private sealed record TestName(string FullName, string Method);

    private static IEnumerable<TestName> TestMethods(Assembly assembly) =>
        from type in assembly.GetTypes()
        from method in type.GetMethods(BindingFlags.Public | BindingFlags.NonPublic | BindingFlags.Instance
                                       | BindingFlags.Static | BindingFlags.DeclaredOnly)
        where method.GetCustomAttributes(inherit: true).Any(a => a is FactAttribute)
        select new TestName($"{type.FullName}.{method.Name}", method.Name);

    private static HashSet<string> Exceptions()
    {
        using var stream = typeof(TestNameConventionTests).Assembly.GetManifestResourceStream(ExceptionsResource)
                           ?? throw new InvalidOperationException($"embedded resource {ExceptionsResource} is missing");
        using var reader = new StreamReader(stream);
        return reader.ReadToEnd().Split('\n').Select(l => l.Trim())
            .Where(l => l.Length > 0 && !l.StartsWith('#')).ToHashSet(StringComparer.Ordinal);
    }
}
