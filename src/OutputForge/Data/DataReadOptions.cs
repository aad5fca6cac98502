namespace OutputForge.Data;

/// <summary>Options of reading datasets.</summary>
public sealed record DataReadOptions(ControlCharacterPolicy ControlCharacters = ControlCharacterPolicy.Refuse)
{
    public static readonly DataReadOptions Default = new();
}
