using OutputForge.Stats;

namespace OutputForge.Analysis;

/// <summary>The spec's method names, the Stats methods they select, and how footnotes name them.</summary>
public static class MethodCatalog
{
    public static ProportionCiMethod ProportionMethod(string name) => name switch
    {
        "wald" => ProportionCiMethod.Wald,
        "wilson" => ProportionCiMethod.Wilson,
        "wilson-cc" => ProportionCiMethod.WilsonCorrected,
        "clopper-pearson" => ProportionCiMethod.ClopperPearson,
        "agresti-coull" => ProportionCiMethod.AgrestiCoull,
        "jeffreys" => ProportionCiMethod.Jeffreys,
        _ => throw new ArgumentOutOfRangeException(nameof(name), name, "unknown proportion interval method"),
    };

    public static DifferenceCiMethod DifferenceMethod(string name) => name switch
    {
        "wald" => DifferenceCiMethod.Wald,
        "wald-cc" => DifferenceCiMethod.WaldCorrected,
        "newcombe" => DifferenceCiMethod.Newcombe,
        "agresti-caffo" => DifferenceCiMethod.AgrestiCaffo,
        "miettinen-nurminen" => DifferenceCiMethod.MiettinenNurminen,
        _ => throw new ArgumentOutOfRangeException(nameof(name), name, "unknown difference interval method"),
    };

    public static string Describe(ProportionCiMethod method) => method switch
    {
        ProportionCiMethod.Wald => "Wald (normal approximation)",
        ProportionCiMethod.Wilson => "Wilson score",
        ProportionCiMethod.WilsonCorrected => "Wilson score with continuity correction",
        ProportionCiMethod.ClopperPearson => "Clopper-Pearson exact",
        ProportionCiMethod.AgrestiCoull => "Agresti-Coull",
        ProportionCiMethod.Jeffreys => "Jeffreys",
        _ => method.ToString(),
    };

    public static string Describe(DifferenceCiMethod method) => method switch
    {
        DifferenceCiMethod.Wald => "Wald (normal approximation)",
        DifferenceCiMethod.WaldCorrected => "Wald with continuity correction",
        DifferenceCiMethod.Newcombe => "Newcombe hybrid score",
        DifferenceCiMethod.AgrestiCaffo => "Agresti-Caffo",
        DifferenceCiMethod.MiettinenNurminen => "Miettinen-Nurminen score",
        _ => method.ToString(),
    };

    /// <summary>"95%" for 0.95, "97.5%" for 0.975.</summary>
    public static string LevelText(double level) =>
        (level * 100).ToString("0.###", System.Globalization.CultureInfo.InvariantCulture) + "%";
}
