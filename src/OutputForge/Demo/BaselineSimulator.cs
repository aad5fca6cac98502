namespace OutputForge.Demo;

/// <summary>
/// Demographics, body measurements, disease history and baseline itch of one subject. The mixes are
/// invented but shaped like an adult dermatology population: mostly under 65, more women than men,
/// race and ethnicity depending on the region of the site.
/// </summary>
internal static class BaselineSimulator
{
    public const string Moderate = "Moderate";
    public const string Severe = "Severe";

    private static readonly string[] RaceValues =
        ["WHITE", "BLACK OR AFRICAN AMERICAN", "ASIAN", "AMERICAN INDIAN OR ALASKA NATIVE", "MULTIPLE"];

    // Race weights per region, in RaceValues order.
    private static readonly double[] NorthAmericaRace = [70, 16, 7, 2, 5];
    private static readonly double[] EuropeRace = [91, 4, 3, 0, 2];
    private static readonly double[] AsiaPacificRace = [8, 0, 89, 0, 3];

    public static void Simulate(DemoSubject subject, Xoshiro256StarStar random)
    {
        var region = subject.Site.Region;

        subject.Age = (int)Math.Round(random.TruncatedNormal(48.5, 14.5, 18, 85.49), MidpointRounding.AwayFromZero);
        subject.Sex = random.Chance(0.58) ? "F" : "M";

        var raceIndex = random.WeightedIndex(region switch
        {
            StudySite.NorthAmerica => NorthAmericaRace,
            StudySite.Europe => EuropeRace,
            _ => AsiaPacificRace,
        });
        subject.Race = RaceValues[raceIndex];
        subject.RaceCode = raceIndex + 1;

        var hispanicShare = region switch { StudySite.NorthAmerica => 0.17, StudySite.Europe => 0.04, _ => 0.01 };
        var ethnicDraw = random.NextDouble();
        subject.Ethnicity = ethnicDraw < 0.015 ? null
            : ethnicDraw < 0.035 ? "NOT REPORTED"
            : random.Chance(hispanicShare) ? "HISPANIC OR LATINO"
            : "NOT HISPANIC OR LATINO";

        SimulateBody(subject, random, region == StudySite.AsiaPacific);

        // Severity stratum: "Severe" means a baseline weekly mean itch score of at least 7.
        subject.Severity = random.Chance(0.45) ? Severe : Moderate;
        subject.ItchBaselineTenths = subject.Severity == Severe
            ? Tenths(random.TruncatedNormal(7.9, 0.8, 7.0, 10.0), 70, 100)
            : Tenths(random.TruncatedNormal(5.7, 0.8, 4.0, 6.94), 40, 69);

        var years = Math.Min(random.LogNormal(4.5, 0.8), subject.Age - 17.0);
        subject.DiseaseYearsTenths = Tenths(years, 3, (subject.Age - 17) * 10);

        // About 1% of subjects were randomized in the wrong region stratum (an IRT entry error).
        if (random.Chance(0.01))
        {
            var otherRegions = StudySite.Regions.Where(r => r != region).ToArray();
            subject.StratumRegion = otherRegions[random.NextInt(otherRegions.Length)];
        }
        else
        {
            subject.StratumRegion = region;
        }

        subject.MajorDeviation = random.Chance(0.05);
    }

    private static void SimulateBody(DemoSubject subject, Xoshiro256StarStar random, bool asiaPacific)
    {
        var female = subject.Sex == "F";
        var heightMean = (female ? 162.5 : 176.0) - (asiaPacific ? 6.0 : 0.0);
        var heightCm = random.TruncatedNormal(heightMean, female ? 6.5 : 7.2, 140, 205);
        var bmi = Math.Clamp(random.LogNormal(asiaPacific ? 24.0 : 26.8, 0.17), 16.0, 55.0);
        var weightKg = bmi * heightCm * heightCm / 10000.0;

        int? height = random.Chance(0.012) ? null : Tenths(heightCm, 1400, 2050);
        int? weight = random.Chance(0.010) ? null : Tenths(weightKg, 350, 2000);
        subject.HeightTenths = height;
        subject.WeightTenths = weight;
        subject.BmiTenths = height is { } h && weight is { } w ? BodyMassIndexTenths(h, w) : null;
    }

    /// <summary>BMI = weight (kg) / height (m)^2 from the recorded one-decimal values, rounded half away from zero.</summary>
    public static int BodyMassIndexTenths(int heightTenths, int weightTenths)
    {
        var meters = heightTenths / 1000m;
        var bmi = (weightTenths / 10m) / (meters * meters);
        return (int)Math.Round(bmi * 10m, MidpointRounding.AwayFromZero);
    }

    private static int Tenths(double value, int min, int max) =>
        Math.Clamp((int)Math.Round(value * 10.0, MidpointRounding.AwayFromZero), min, max);
}
