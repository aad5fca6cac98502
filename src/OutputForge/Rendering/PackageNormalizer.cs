using System.IO.Compression;
using System.Text;
using System.Text.RegularExpressions;

namespace OutputForge.Rendering;

/// <summary>
/// Makes an Office Open XML package (.docx, .xlsx) a pure function of its content, so that two
/// runs with the same specs, data and timestamp give byte-identical files that can be compared
/// by hash. System.IO.Packaging names relationships with random ids ("R" and 16 hex digits) and
/// the core-properties part with a random name, and zip entries carry the time of writing; this
/// renumbers the ids in order of appearance, gives the part a fixed name, and sets the document's
/// created and modified dates and every zip entry's time to the run time.
/// </summary>
public static partial class PackageNormalizer
{
    [GeneratedRegex(@"Id=""(R[0-9a-f]{16})""")]
    private static partial Regex RandomRelationshipId();

    // Generated rather than interpreted: it scans every XML part, the largest of a combined workbook being tens of megabytes.
    [GeneratedRegex(@"\bR[0-9a-f]{16}\b")]
    private static partial Regex AnyRelationshipId();

    [GeneratedRegex(@"[0-9a-f]{32}\.psmdcp")]
    private static partial Regex RandomCorePropertiesName();

    [GeneratedRegex(@"(<dcterms:(created|modified)[^>]*>)[^<]*(</dcterms:\2>)")]
    private static partial Regex DocumentDates();

    private const string FixedCorePropertiesName = "core-properties.psmdcp";

    /// <summary>True when the bytes start like a zip archive (every OOXML package does).</summary>
    public static bool IsPackage(ReadOnlySpan<byte> bytes) =>
        bytes.Length >= 4 && bytes[0] == (byte)'P' && bytes[1] == (byte)'K' && bytes[2] == 3 && bytes[3] == 4;

    public static byte[] Normalize(byte[] package, DateTimeOffset time)
    {
        var entries = new List<(string Name, byte[] Content)>();
        using (var archive = new ZipArchive(new MemoryStream(package), ZipArchiveMode.Read))
        {
            foreach (var entry in archive.Entries)
            {
                using var stream = entry.Open();
                using var buffer = new MemoryStream();
                stream.CopyTo(buffer);
                entries.Add((entry.FullName, buffer.ToArray()));
            }
        }

        var renames = new Dictionary<string, string>(StringComparer.Ordinal);
        foreach (var (name, content) in entries.Where(e => IsText(e.Name)))
        {
            foreach (Match match in RandomRelationshipId().Matches(Encoding.UTF8.GetString(content)))
            {
                var id = match.Groups[1].Value;
                if (!renames.ContainsKey(id))
                {
                    renames[id] = "R" + (renames.Count + 1).ToString("x16", System.Globalization.CultureInfo.InvariantCulture);
                }
            }
        }

        // Dos dates start in 1980; the zip format keeps local wall-clock time with 2-second steps.
        var stamp = time.UtcDateTime < new DateTime(1980, 1, 2) ? new DateTime(1980, 1, 2) : time.UtcDateTime;
        var entryTime = new DateTimeOffset(DateTime.SpecifyKind(stamp, DateTimeKind.Unspecified), TimeSpan.Zero);
        using var output = new MemoryStream();
        using (var archive = new ZipArchive(output, ZipArchiveMode.Create, leaveOpen: true))
        {
            foreach (var (name, content) in entries)
            {
                var entry = archive.CreateEntry(RandomCorePropertiesName().Replace(name, FixedCorePropertiesName), CompressionLevel.Optimal);
                entry.LastWriteTime = entryTime;
                var bytes = IsText(name) ? Rewrite(content, renames, time) : content;
                using var stream = entry.Open();
                stream.Write(bytes);
            }
        }
        return output.ToArray();
    }

    private static bool IsText(string name) =>
        name.EndsWith(".xml", StringComparison.OrdinalIgnoreCase) || name.EndsWith(".rels", StringComparison.OrdinalIgnoreCase) ||
        name.EndsWith(".psmdcp", StringComparison.OrdinalIgnoreCase);

    private static byte[] Rewrite(byte[] content, Dictionary<string, string> renames, DateTimeOffset time)
    {
        var text = Encoding.UTF8.GetString(content);
        var rewritten = RandomCorePropertiesName().Replace(text, FixedCorePropertiesName);
        var stamp = time.UtcDateTime.ToString("yyyy-MM-dd'T'HH:mm:ss'Z'", System.Globalization.CultureInfo.InvariantCulture);
        rewritten = DocumentDates().Replace(rewritten, m => m.Groups[1].Value + stamp + m.Groups[3].Value);
        if (renames.Count > 0)
        {
            rewritten = AnyRelationshipId().Replace(rewritten, m => renames.GetValueOrDefault(m.Value, m.Value));
        }
        return ReferenceEquals(rewritten, text) || rewritten == text ? content : Encoding.UTF8.GetBytes(rewritten);
    }
}
