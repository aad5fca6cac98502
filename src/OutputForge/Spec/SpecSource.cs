namespace OutputForge.Spec;

/// <summary>The file a spec object came from and where its values stand, so that later stages can point into it.</summary>
public sealed class SpecSource
{
    public SpecSource(string file, JsonPositionMap positions)
    {
        File = file;
        Positions = positions;
    }

    /// <summary>The spec file as the user named it (for messages).</summary>
    public string File { get; }

    public JsonPositionMap Positions { get; }

    /// <summary>A problem located at the value of <paramref name="pointer"/> (a JSON Pointer such as "/endpoint/where").</summary>
    public SpecProblem Problem(string pointer, string message, int characterOffset = 0)
    {
        var position = Positions.Find(pointer);
        return new SpecProblem(File, position?.Line, position is null ? null : position.Value.Column + characterOffset,
            JsonPositionMap.ToJsonPath(pointer), message);
    }

    /// <summary>A problem located at the key of <paramref name="pointer"/> (for unknown keys).</summary>
    public SpecProblem KeyProblem(string pointer, string message)
    {
        var position = Positions.FindKey(pointer);
        return new SpecProblem(File, position?.Line, position?.Column, JsonPositionMap.ToJsonPath(pointer), message);
    }

    /// <summary>A problem of a known kind located at the value of <paramref name="pointer"/>.</summary>
    public SpecProblem Problem(SpecProblemCode code, string pointer, string message, int characterOffset = 0) =>
        Problem(pointer, message, characterOffset) with { Code = code };

    public SpecException Error(string pointer, string message) => new(Problem(pointer, message));

    public SpecException Error(SpecProblemCode code, string pointer, string message) => new(Problem(code, pointer, message));
}
