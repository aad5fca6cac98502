using System.Globalization;

namespace OutputForge.Demo;

/// <summary>Text forms of dates and one-decimal measurements in the demonstration datasets.</summary>
internal static class DemoValueFormat
{
    /// <summary>ISO 8601 calendar date, YYYY-MM-DD.</summary>
    public static string? Date(DateOnly? date) =>
        date?.ToString("yyyy-MM-dd", CultureInfo.InvariantCulture);

    /// <summary>A value held in tenths, printed with exactly one decimal ("6.0", "-2.5").</summary>
    public static string? Tenths(int? tenths) =>
        tenths is { } t ? (t / 10m).ToString("0.0", CultureInfo.InvariantCulture) : null;

    /// <summary>100 x change / base, rounded half away from zero to one decimal; exact decimal arithmetic.</summary>
    public static string PercentChange(int changeTenths, int baseTenths) =>
        Math.Round(100m * changeTenths / baseTenths, 1, MidpointRounding.AwayFromZero)
            .ToString("0.0", CultureInfo.InvariantCulture);

    public static string? Flag(bool value) => value ? "Y" : "N";
}
