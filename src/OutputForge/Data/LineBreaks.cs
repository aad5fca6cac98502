namespace OutputForge.Data;

/// <summary>
/// Line breaks as the CSV reader counts them for its line numbers: a line feed, a carriage return followed by a line
/// feed, or a carriage return alone each end one line (inside quoted values too).
/// </summary>
internal static class LineBreaks
{
    /// <summary>The line breaks in <paramref name="bytes"/>.</summary>
    public static int Count(ReadOnlySpan<byte> bytes)
    {
        var feeds = bytes.Count((byte)'\n');
        var returns = bytes.Count((byte)'\r');
        return returns == 0 ? feeds : feeds + returns - bytes.Count("\r\n"u8);
    }

    /// <summary>
    /// At least the number of records in <paramref name="bytes"/>: every record but the last ends at a line break, and a
    /// line feed or a carriage return is in each.
    /// </summary>
    public static int Bound(ReadOnlySpan<byte> bytes) => bytes.Count((byte)'\n') + bytes.Count((byte)'\r') + 1;
}
