namespace OutputForge.Stats.Models;

/// <summary>A remark on an adjusted logistic regression that a table must carry, as data: its kind and its wording.</summary>
public sealed record LogisticAnalysisNote(LogisticNoteKind Kind, string Text);

/// <summary>What a <see cref="LogisticAnalysisNote"/> says.</summary>
public enum LogisticNoteKind
{
    /// <summary>The responses are separated, so Firth's penalized likelihood replaced maximum likelihood.</summary>
    SeparationFirthUsed,

    /// <summary>Firth's penalized likelihood was asked for, without separation.</summary>
    FirthRequested,

    /// <summary>A profile-likelihood limit does not exist (the profile never reaches the quantile on that side).</summary>
    ProfileLimitUnbounded,

    /// <summary>An iteration stopped at its limit before converging.</summary>
    NotConverged,
}
