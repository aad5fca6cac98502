using System.Reflection;

namespace OutputForge.Pipeline;

/// <summary>OutputForge's version as printed in outputs and by --version.</summary>
public static class ToolVersion
{
    public static string Text { get; } = Read();

    private static string Read()
    {
        var informational = typeof(ToolVersion).Assembly.GetCustomAttribute<AssemblyInformationalVersionAttribute>()?.InformationalVersion;
        var version = informational ?? typeof(ToolVersion).Assembly.GetName().Version?.ToString() ?? "0.0.0";
        var plus = version.IndexOf('+');
        return plus >= 0 ? version[..plus] : version;
    }
}
