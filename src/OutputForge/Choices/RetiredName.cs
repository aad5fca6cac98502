namespace OutputForge.Choices;

/// <summary>
/// A name an option no longer accepts, with the name that replaced it, so that a spec or command line still using it
/// gets an error naming the new one instead of a bare list of choices.
/// </summary>
public sealed record RetiredName(string Old, string New);
