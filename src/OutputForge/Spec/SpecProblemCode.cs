
namespace OutputForge.Spec;

/// <summary>
/// What kind of problem a <see cref="SpecProblem"/> is: the fix hints of `check` and any tool reading problems choose by
/// it, never by the wording of the message.
/// </summary>
public enum SpecProblemCode
{
    /// <summary>A problem with no more specific code (e.g. a schema rule such as a pattern or a bound).</summary>
    Other,
    UnreadableFile,
    InvalidJson,
    UnknownKey,
    MissingKey,
    WrongType,

    /// <summary>A value that is not one of the option's names (<see cref="SpecProblem.Expected"/> lists them).</summary>
    NotAChoice,

    /// <summary>A name an option no longer accepts; <see cref="SpecProblem.Suggestion"/> is the name that replaced it.</summary>
    RetiredName,

    /// <summary>A name of the study spec (population, dataset) that the study does not define.</summary>
    UnknownReference,

    ConditionSyntax,

    /// <summary>The old missing-value test ("is missing") where "is null" belongs.</summary>
    MissingValueTest,

    /// <summary>A variable the dataset does not have.</summary>
    UnknownVariable,

    /// <summary>A value (PARAMCD, AVISIT, arm, level) that no record of the data has.</summary>
    UnknownDataValue,

    /// <summary>A population, arm or selection without subjects.</summary>
    NoSubjects,

    /// <summary>An endpoint selection giving a subject more than one record.</summary>
    DuplicateRecords,
}
