namespace OutputForge.Demo;

/// <summary>
/// Writes the demo study's data (data/) and specs (specs/) into a folder: first into a staging
/// folder beside it, then moved into place, so an interrupted demo leaves no half-written file.
/// </summary>
internal static class DemoPackageWriter
{
    /// <summary>Returns the study file's path under <paramref name="root"/>.</summary>
    public static string Write(string root, DemoStudyOptions options) => Write(root, options, DemoDataFormat.Csv);

    /// <summary>Writes the data in <paramref name="dataFormat"/> (<see cref="DemoDataFormat"/>); returns the study file's path.</summary>
    public static string Write(string root, DemoStudyOptions options, string dataFormat)
    {
        var full = Path.GetFullPath(root).TrimEnd(Path.DirectorySeparatorChar);
        var parent = Path.GetDirectoryName(full) ?? throw new DemoStudyException($"{root}: cannot write into the root folder");
        var staging = Path.Combine(parent, $".{Path.GetFileName(full)}.demo-staging-{Guid.NewGuid():N}");
        try
        {
            DemoStudyGenerator.WriteCsv(Path.Combine(staging, "data"), options);
            var studyFile = DemoSpecFiles.Write(staging);
            if (options.Pooled is { } pooled)
                studyFile = PooledSpecSet.Write(staging, pooled.WeeklyParameters);
            DemoDataFormat.Convert(Path.Combine(staging, "data"), Path.Combine(staging, "specs"), dataFormat);
            foreach (var file in Directory.GetFiles(staging, "*", SearchOption.AllDirectories).Order(StringComparer.Ordinal))
            {
                var target = Path.Combine(full, Path.GetRelativePath(staging, file));
                Directory.CreateDirectory(Path.GetDirectoryName(target)!);
                File.Move(file, target, overwrite: true);
            }
            return Path.Combine(full, Path.GetRelativePath(staging, studyFile));
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            throw new DemoStudyException($"{root}: cannot write the demo study ({e.Message})");
        }
        finally
        {
            if (Directory.Exists(staging))
            {
                Directory.Delete(staging, recursive: true);
            }
        }
    }
}
