using System.Globalization;
using System.Text.Json;
using OutputForge.Analysis;
using OutputForge.Data;
using OutputForge.Spec;
using OutputForge.Results;

namespace OutputForge.Kinds.CategoricalByVisit;

/// <summary>
/// The spec's response categories in display order: how a record's value is matched to one (numeric
/// value for a number, exact text for a string), their labels, results keys and column scores.
/// </summary>
internal sealed class ResponseCategories
{
    private ResponseCategories(IReadOnlyList<Category> items) => Items = items;

    public sealed record Category(string ValueText, double? Number, string Label, string Key, double? TableScore);

    public IReadOnlyList<Category> Items { get; }

    public int Count => Items.Count;

    public static ResponseCategories From(CategoricalByVisitSettings settings, SpecSource source)
    {
        var items = new List<Category>();
        for (var i = 0; i < settings.Categories.Count; i++)
        {
            var spec = settings.Categories[i];
            var pointer = $"/categoricalByVisit/categories/{i}";
            string text;
            double? number = null;
            if (spec.Value.ValueKind == JsonValueKind.Number)
            {
                number = spec.Value.GetDouble();
                text = number.Value.ToString("0.##########", CultureInfo.InvariantCulture);
            }
            else
            {
                text = spec.Value.GetString() ?? string.Empty;
            }
            if (items.Any(c => c.ValueText == text))
            {
                throw new SpecException(source.Problem(pointer + "/value", $"category '{text}' is listed twice"));
            }
            var key = "category-" + ResultKey.Part(text);
            if (items.Any(c => c.Key == key))
            {
                throw new SpecException(source.Problem(pointer + "/value",
                    $"categories '{items.First(c => c.Key == key).ValueText}' and '{text}' have the same results key '{key}'; their values must differ in more than letter case, accents or punctuation"));
            }
            items.Add(new Category(text, number, spec.Label ?? text, key, spec.Score ?? number));
        }
        return new ResponseCategories(items);
    }

    /// <summary>The index of the category of a non-missing value, or -1 when it is none of them.</summary>
    public int IndexOf(DataColumn column, int row)
    {
        var text = column.GetText(row);
        // A column made text by some other value still holds numbers in its other rows: read them as numbers, so the
        // message names the value that is no category, not a number that is one.
        var number = column.Kind == Expressions.VariableKind.Number ? column.GetNumber(row)
            : double.TryParse(text, NumberStyles.Float, CultureInfo.InvariantCulture, out var parsed) ? parsed : double.NaN;
        for (var i = 0; i < Items.Count; i++)
        {
            var c = Items[i];
            if (c.Number is { } value ? number == value : string.Equals(text, c.ValueText, StringComparison.Ordinal))
            {
                return i;
            }
        }
        return -1;
    }

    /// <summary>
    /// Column scores for the spec's choice: category values (each category's score or numeric value) or equal
    /// spacing (1, 2, ...); empty for modified ridits, whose scores come from each stratum's table.
    /// </summary>
    public double[] Scores(ColumnScores choice, SpecSource source)
    {
        if (choice == ColumnScores.ModifiedRidit)
        {
            return [];
        }
        if (choice == ColumnScores.EqualSpacing)
        {
            return Enumerable.Range(1, Items.Count).Select(i => (double)i).ToArray();
        }
        var scores = new double[Items.Count];
        for (var i = 0; i < Items.Count; i++)
        {
            scores[i] = Items[i].TableScore ?? throw new SpecException(source.Problem($"/categoricalByVisit/categories/{i}",
                $"category '{Items[i].ValueText}' is text and has no \"score\"; category-values scores need a number for every category (or use \"scores\": \"equal-spacing\")"));
        }
        return scores;
    }
}
