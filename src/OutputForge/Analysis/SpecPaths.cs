using OutputForge.Spec;

namespace OutputForge.Analysis;

/// <summary>How outputs name spec files: relative to the study file's folder, with forward slashes, so the source line is the same on every machine.</summary>
public static class SpecPaths
{
    public static string RelativeToStudy(StudySpec study, TableSpec table) =>
        Path.GetRelativePath(study.Folder, Path.GetFullPath(table.Source.File)).Replace('\\', '/');
}
