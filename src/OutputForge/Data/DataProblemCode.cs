namespace OutputForge.Data;

/// <summary>
/// What kind of problem a <see cref="DataException"/> is: `check` chooses its hint, and groups repeated problems, by it,
/// never by the wording of the message.
/// </summary>
public enum DataProblemCode
{
    /// <summary>The file itself: encoding, CSV syntax, header, a value that cannot be stored.</summary>
    File,

    /// <summary>An ADaM flag (name ending in FL) holding a value other than Y, N or nothing.</summary>
    Flag,

    /// <summary>A dataset without USUBJID, whose records cannot be linked to ADSL.</summary>
    NoSubjectVariable,

    /// <summary>A subject of an analysis dataset that ADSL does not have.</summary>
    UnknownSubject,

    /// <summary>ADSL without USUBJID.</summary>
    NoSubjectLevelVariable,

    /// <summary>ADSL with a header but no rows.</summary>
    NoSubjects,

    /// <summary>A record whose USUBJID is empty.</summary>
    EmptySubject,

    /// <summary>A subject with a second ADSL row.</summary>
    RepeatedSubject,
}
