namespace OutputForge.Choices;

/// <summary>The names of one option's choices, whatever their type: what the schema, the docs and the checks need.</summary>
public interface IOptionSet
{
    /// <summary>The option's key in the catalogue, e.g. "proportion-interval"; schema fragments refer to it.</summary>
    string Key { get; }

    /// <summary>What the option chooses, for the docs, e.g. "Interval of a single proportion".</summary>
    string Title { get; }

    Type ValueType { get; }

    /// <summary>The accepted names, in the order the schema and the docs list them.</summary>
    IReadOnlyList<string> Names { get; }

    /// <summary>The name of the default choice; null where the option has no default (e.g. a required choice).</summary>
    string? DefaultName { get; }

    IReadOnlyList<RetiredName> Retired { get; }

    /// <summary>The description of the choice named <paramref name="name"/>.</summary>
    string Describe(string name);
}
