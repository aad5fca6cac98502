using OutputForge.Expressions;

namespace OutputForge.Spec;

/// <summary>
/// A condition written in a spec, with where it stands, so that a condition error can name the
/// spec file, the JSON path and the character.
/// </summary>
public sealed record SpecConditionText(string Text, SpecSource Source, string Pointer)
{
    /// <summary>Compiles against <paramref name="variables"/>; a problem becomes a <see cref="SpecException"/> pointing into the file.</summary>
    public Condition Compile(IVariableSource variables)
    {
        try
        {
            return Condition.Compile(Text, variables);
        }
        catch (ConditionSyntaxException e)
        {
            // +1 for the opening quote of the JSON string; exact when the condition has no escapes.
            var code = e.Problem switch
            {
                ConditionProblem.UnknownVariable => SpecProblemCode.UnknownVariable,
                ConditionProblem.MissingValueTest => SpecProblemCode.MissingValueTest,
                _ => SpecProblemCode.ConditionSyntax,
            };
            throw new SpecException(Source.Problem(code, Pointer,
                $"{e.Message} (at character {e.Position} of \"{Text}\")", e.Position));
        }
    }
}
