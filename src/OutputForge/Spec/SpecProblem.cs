namespace OutputForge.Spec;

/// <summary>
/// One problem found in a spec file, located by line, column and JSON path, with what kind of problem it is
/// (<see cref="Code"/>) and its particulars as data: the key or name concerned, the values accepted there, and the name
/// that was probably meant. Hints and locations are taken from these fields, never from the message's wording.
/// </summary>
public sealed record SpecProblem(string File, int? Line, int? Column, string JsonPath, string Message, bool IsWarning = false)
{
    public SpecProblemCode Code { get; init; } = SpecProblemCode.Other;

    /// <summary>The key, name or value the problem is about (an unknown key, a missing key, a value not accepted).</summary>
    public string? Key { get; init; }

    /// <summary>The values accepted there, where the spec's schema or the catalogue lists them.</summary>
    public IReadOnlyList<string>? Expected { get; init; }

    /// <summary>The name probably meant: the nearest accepted name, or the new name of a retired one.</summary>
    public string? Suggestion { get; init; }

    public override string ToString()
    {
        var where = File;
        if (Line is not null)
        {
            where += $":{Line}";
            if (Column is not null)
            {
                where += $":{Column}";
            }
        }
        return $"{where}: {JsonPath}: {Message}";
    }
}
