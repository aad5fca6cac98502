namespace OutputForge.Demo;

/// <summary>An investigational site: its number, its region and its share of enrolment.</summary>
internal sealed record StudySite(string SiteId, string Region, double EnrolmentWeight)
{
    public const string NorthAmerica = "North America";
    public const string Europe = "Europe";
    public const string AsiaPacific = "Asia Pacific";

    public static IReadOnlyList<string> Regions { get; } = [NorthAmerica, Europe, AsiaPacific];

    /// <summary>
    /// 24 sites: 1xx North America, 2xx Europe, 3xx Asia Pacific. Unequal weights because real sites
    /// recruit unequally; about 40% North America, 36% Europe, 24% Asia Pacific.
    /// </summary>
    public static IReadOnlyList<StudySite> All { get; } =
    [
        new("101", NorthAmerica, 1.6), new("102", NorthAmerica, 1.2), new("103", NorthAmerica, 0.9),
        new("104", NorthAmerica, 1.4), new("105", NorthAmerica, 1.0), new("106", NorthAmerica, 0.7),
        new("107", NorthAmerica, 1.1), new("108", NorthAmerica, 0.8), new("109", NorthAmerica, 0.9),
        new("201", Europe, 1.3), new("202", Europe, 1.0), new("203", Europe, 0.8),
        new("204", Europe, 1.5), new("205", Europe, 0.9), new("206", Europe, 0.7),
        new("207", Europe, 1.1), new("208", Europe, 0.6), new("209", Europe, 0.7),
        new("301", AsiaPacific, 1.4), new("302", AsiaPacific, 1.0), new("303", AsiaPacific, 0.9),
        new("304", AsiaPacific, 0.8), new("305", AsiaPacific, 0.6), new("306", AsiaPacific, 0.4),
    ];
}
