namespace OutputForge.Stats.Tests;

/// <summary>
/// NIST Statistical Reference Datasets, linear regression: Norris (ozone monitor calibration). The
/// data are read from ../shared/reference/nist-strd/Norris.dat; the certified values below are copied
/// from that file's header (lines 31 to 46). NIST asks for agreement to at least 9 significant digits.
/// </summary>
public sealed class LinearModelNistTests
{
    /// <summary>The data lines of a StRD file: the rows after the "Data:" line of the data section.</summary>
    private static (double[] Y, double[] X) ReadNorris(string path)
    {
        var lines = File.ReadAllLines(path);
        // Data start on line 61 (file header "Data (lines 61 to 96)").
        var rows = lines.Skip(60).Take(36).Select(l => l.Split(' ', StringSplitOptions.RemoveEmptyEntries)).ToList();
        return (rows.Select(r => EfficacyOracles.Number(r[0])).ToArray(), rows.Select(r => EfficacyOracles.Number(r[1])).ToArray());
    }

    private const string Norris = "reference/nist-strd/Norris.dat";

    [SharedFileFact(Norris)]
    public void Norris_agrees_with_the_certified_values_to_nine_digits()
    {
        var (y, x) = ReadNorris(SharedFile.Find(Norris)!);
        Assert.Equal(36, y.Length);
        var design = LinearModelDesign.Build(y.Length, [new LinearModelCovariate("x", x)], []);
        var fit = LinearModel.Fit(y, design);
        Assert.True(fit.IsEstimable);
        const double digits = 1e-9;
        // Certified values, NIST StRD Norris.dat.
        EfficacyOracles.Close(-0.262323073774029, fit.Coefficients[0], digits, "B0");
        EfficacyOracles.Close(1.00211681802045, fit.Coefficients[1], digits, "B1");
        EfficacyOracles.Close(0.232818234301152, fit.StandardError(0), digits, "SD of B0");
        EfficacyOracles.Close(0.429796848199937E-03, fit.StandardError(1), digits, "SD of B1");
        EfficacyOracles.Close(0.884796396144373, fit.ResidualStandardDeviation, digits, "residual SD");
        EfficacyOracles.Close(26.6173985294224, fit.ResidualSumOfSquares, digits, "residual sum of squares");
        Assert.Equal(34, fit.ResidualDegreesOfFreedom);
    }
}
