using OutputForge.Choices;
namespace OutputForge.Spec;

/// <summary>How the percentages of "n (%)" cells are shown.</summary>
public sealed class PercentDisplaySpec
{
    /// <summary>Decimals of percentages.</summary>
    public int Decimals { get; init; } = 1;

    /// <summary>Whether a percent sign follows the number: "14 (16%)" rather than "14 (16.3)".</summary>
    public bool Sign { get; init; }

    /// <summary>Count: a zero count shows as "0"; count-percent: as "0 (0.0)".</summary>
    public ZeroDisplay Zero { get; init; } = MethodCatalog.ZeroDisplay.DefaultValue;

    /// <summary>Whether a percentage that rounds to 0 or 100 but is not shows as "&lt;0.1" or "&gt;99.9".</summary>
    public bool Edges { get; init; }
}
