using System.Text.Json;

namespace OutputForge.Stats.Tests;

/// <summary>
/// Values produced by Oracles/generate_proportion_table_oracles.py (scipy 1.10.1, statsmodels 0.13.5,
/// R 4.2.2; the exact versions are recorded inside the JSON file next to the values).
/// </summary>
internal static class ReferenceOracles
{
    private static readonly Lazy<JsonDocument> ProportionTableDocument = new(() =>
        JsonDocument.Parse(File.ReadAllText(System.IO.Path.Combine(
            RepositoryRoot.Path, "tests", "OutputForge.Stats.Tests", "Oracles", "proportion_table_oracles.json"))));

    private static readonly Lazy<JsonDocument> FisherDocument = new(() =>
        JsonDocument.Parse(File.ReadAllText(System.IO.Path.Combine(
            RepositoryRoot.Path, "tests", "OutputForge.Stats.Tests", "Oracles", "fisher_rxc_oracles.json"))));

    private static readonly Lazy<JsonDocument> ChiSquareDocument = new(() =>
        JsonDocument.Parse(File.ReadAllText(System.IO.Path.Combine(
            RepositoryRoot.Path, "tests", "OutputForge.Stats.Tests", "Oracles", "chi_square_oracles.json"))));

    private static readonly Lazy<JsonDocument> RatioStrataDocument = new(() =>
        JsonDocument.Parse(File.ReadAllText(System.IO.Path.Combine(
            RepositoryRoot.Path, "tests", "OutputForge.Stats.Tests", "Oracles", "ratio_strata_oracles.json"))));

    private static readonly Lazy<JsonDocument> ConditionalOddsRatioDocument = new(() =>
        JsonDocument.Parse(File.ReadAllText(System.IO.Path.Combine(
            RepositoryRoot.Path, "tests", "OutputForge.Stats.Tests", "Oracles", "conditional_odds_ratio_oracles.json"))));

    private static readonly Lazy<JsonDocument> FisherLargeDocument = new(() =>
        JsonDocument.Parse(File.ReadAllText(System.IO.Path.Combine(
            RepositoryRoot.Path, "tests", "OutputForge.Stats.Tests", "Oracles", "fisher_large_oracles.json"))));

    private static readonly Lazy<JsonDocument> FisherRationalDocument = new(() =>
        JsonDocument.Parse(File.ReadAllText(System.IO.Path.Combine(
            RepositoryRoot.Path, "tests", "OutputForge.Stats.Tests", "Oracles", "fisher_rational_oracles.json"))));

    public static JsonElement ProportionTable => ProportionTableDocument.Value.RootElement;

    /// <summary>Exact rational p-values (Python 3.11 fractions) from Oracles/generate_fisher_rational_oracles.py.</summary>
    public static IEnumerable<JsonElement> FisherRational => FisherRationalDocument.Value.RootElement.GetProperty("fisher_rational").EnumerateArray();

    /// <summary>R 4.2.2 fisher.test values (or FEXACT's error) from Oracles/generate_fisher_large_oracles.R.</summary>
    public static IEnumerable<JsonElement> FisherLarge => FisherLargeDocument.Value.RootElement.GetProperty("fisher_large").EnumerateArray();

    /// <summary>R 4.2.2 fisher.test values from Oracles/generate_conditional_odds_ratio_oracles.R.</summary>
    public static IEnumerable<JsonElement> ConditionalOddsRatio => ConditionalOddsRatioDocument.Value.RootElement.GetProperty("cases").EnumerateArray();

    /// <summary>statsmodels 0.13.5 / R 4.2.2 values from Oracles/generate_ratio_strata_oracles.py.</summary>
    public static JsonElement RatioStrata => RatioStrataDocument.Value.RootElement;

    public static List<StratumCounts> Strata(string name) => RatioStrata.GetProperty("strata").GetProperty(name).GetProperty("strata")
        .EnumerateArray().Select(s => new StratumCounts(s[0].GetInt32(), s[1].GetInt32(), s[2].GetInt32(), s[3].GetInt32())).ToList();

    /// <summary>scipy 1.10.1 / R 4.2.2 values from Oracles/generate_chi_square_oracles.py.</summary>
    public static IEnumerable<JsonElement> ChiSquare(string section) => ChiSquareDocument.Value.RootElement.GetProperty(section).EnumerateArray();

    /// <summary>R 4.2.2 fisher.test values from Oracles/generate_fisher_rxc_oracles.R.</summary>
    public static IEnumerable<JsonElement> FisherRxc => FisherDocument.Value.RootElement.GetProperty("fisher_rxc").EnumerateArray();

    public static int[,] Table(JsonElement rows)
    {
        var list = rows.EnumerateArray().Select(r => r.EnumerateArray().Select(v => v.GetInt32()).ToArray()).ToArray();
        var table = new int[list.Length, list[0].Length];
        for (int i = 0; i < list.Length; i++)
        {
            for (int j = 0; j < list[0].Length; j++)
            {
                table[i, j] = list[i][j];
            }
        }
        return table;
    }

    public static IEnumerable<JsonElement> Section(string name) => ProportionTable.GetProperty(name).EnumerateArray();
}
