using System.Globalization;

namespace OutputForge.Layout;

/// <summary>How a confidence level is printed in labels and notes: "95%" for 0.95, "97.5%" for 0.975.</summary>
public static class LevelText
{
    public static string Of(double level) => (level * 100).ToString("0.###", CultureInfo.InvariantCulture) + "%";
}
