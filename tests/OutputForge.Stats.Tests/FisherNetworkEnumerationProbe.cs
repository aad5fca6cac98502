namespace OutputForge.Stats.Tests;

/// <summary>Reaches the internal network enumeration so that it can be compared with the 2 x 2 formula.</summary>
internal static class FisherNetworkEnumerationProbe
{
    public static double? PValue(int[,] table) => FisherNetworkEnumeration.PValue(table);
}
