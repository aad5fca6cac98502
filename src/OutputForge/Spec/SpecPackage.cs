namespace OutputForge.Spec;

/// <summary>A study spec with its table specs, read and checked for everything that needs no data.</summary>
public sealed record SpecPackage(StudySpec Study, IReadOnlyList<TableSpec> Tables, SpecFolderPolicy Folders);
