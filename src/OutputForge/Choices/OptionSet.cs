namespace OutputForge.Choices;

/// <summary>
/// The choices of one option (an interval method, a test, a sort order ...): names and typed values defined once, in
/// <see cref="MethodCatalog"/>, for the spec reader, the schema, the `calc` command and docs/methods.md alike.
/// </summary>
public sealed class OptionSet<T> : IOptionSet where T : struct, Enum
{
    private readonly Dictionary<string, OptionChoice<T>> _byName;

    public OptionSet(string key, string title, IReadOnlyList<OptionChoice<T>> choices, T? defaultValue = null,
        IReadOnlyList<RetiredName>? retired = null)
    {
        Key = key;
        Title = title;
        Choices = choices;
        Default = defaultValue;
        Retired = retired ?? [];
        _byName = choices.ToDictionary(c => c.Name, StringComparer.Ordinal);
        if (defaultValue is { } d && !choices.Any(c => c.Value.Equals(d)))
        {
            throw new ArgumentException($"the default of {key} is not one of its choices", nameof(defaultValue));
        }
    }

    public string Key { get; }
    public string Title { get; }
    public IReadOnlyList<OptionChoice<T>> Choices { get; }
    public T? Default { get; }
    public IReadOnlyList<RetiredName> Retired { get; }
    public Type ValueType => typeof(T);
    public IReadOnlyList<string> Names => Choices.Select(c => c.Name).ToList();
    public string? DefaultName => Default is { } d ? NameOf(d) : null;

    /// <summary>The default, for the settings classes' initializers; an error where the option has none.</summary>
    public T DefaultValue => Default ?? throw new InvalidOperationException($"{Key} has no default");

    public string NameOf(T value) => Choices.First(c => c.Value.Equals(value)).Name;

    public string Describe(T value) => Choices.First(c => c.Value.Equals(value)).Description;

    public string Describe(string name) => _byName[name].Description;

    public bool TryParse(string name, out T value)
    {
        if (_byName.TryGetValue(name, out var choice))
        {
            value = choice.Value;
            return true;
        }
        value = default;
        return false;
    }

    /// <summary>What to tell a user who wrote <paramref name="name"/>: the new name of a retired one, else the nearest accepted name.</summary>
    public string Hint(string name) =>
        Retired.FirstOrDefault(r => r.Old == name) is { } retired
            ? $" (now called '{retired.New}')"
            : Naming.NearestName.Hint(name, Names);

    /// <summary>The same choices restricted to some values, with their own key and default (e.g. the tests a continuous variable can have).</summary>
    public OptionSet<T> Subset(string key, string title, T? defaultValue, params T[] values) =>
        new(key, title, Choices.Where(c => values.Contains(c.Value)).ToList(), defaultValue,
            Retired.Where(r => values.Any(v => NameOf(v) == r.New)).ToList());
}
