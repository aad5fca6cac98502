using OutputForge.Analysis;
using OutputForge.Data;
using OutputForge.Spec;

namespace OutputForge.Pipeline.Manifest;

/// <summary>
/// The spec and data files of a run with their SHA-256 digests, taken before any table is produced
/// (a data file's from the very bytes its reader parsed), so the manifest and every table's source
/// line name the same bytes.
/// </summary>
public sealed record RunInputs(IReadOnlyList<ManifestFile> Specs, IReadOnlyList<ManifestFile> Data)
{
    public static RunInputs Read(SpecPackage package, StudyData data)
    {
        var study = package.Study;
        var specs = new List<ManifestFile>
        {
            new(Path.GetFileName(study.Source.File), FileDigest.Sha256(study.Source.File)),
        };
        specs.AddRange(package.Tables.Select(t => new ManifestFile(SpecPaths.RelativeToStudy(study, t), FileDigest.Sha256(t.Source.File))));
        var files = study.Data.Datasets
            .OrderBy(d => d.Key, StringComparer.Ordinal)
            // A dataset the run left unread (no selected table uses it) is still named by its whole file's digest, from
            // disk; its rows are not counted.
            .Select(d => data.Unread.Contains(d.Key)
                ? new ManifestFile(d.Value, FileDigest.Sha256(Path.Combine(data.Folder, d.Value)), d.Key)
                : new ManifestFile(d.Value, data[d.Key].ContentSha256 ?? FileDigest.Sha256(Path.Combine(data.Folder, d.Value)), d.Key, data[d.Key].RowCount))
            .ToList();
        return new RunInputs(specs, files);
    }

    /// <summary>The spec file and data files one table used, from its provenance.</summary>
    public IReadOnlyList<ManifestFile> ForTable(string specFile, IEnumerable<string> datasets)
    {
        var inputs = Specs.Where(s => s.Name == specFile).ToList();
        inputs.AddRange(datasets.Distinct(StringComparer.Ordinal).Select(d => Data.First(f => f.Dataset == d)));
        return inputs;
    }

    /// <summary>How the source line names each dataset's file: "adsl.csv (SHA-256 1a2b3c4d)".</summary>
    public IReadOnlyDictionary<string, string> SourceLineNames() =>
        Data.ToDictionary(d => d.Dataset!, d => $"{d.Name} (SHA-256 {FileDigest.Short(d.Sha256)})", StringComparer.Ordinal);
}
