using OutputForge.Files;

namespace OutputForge.Data;

/// <summary>
/// Where a dataset file may really be: inside the data folder, or inside a folder the user allowed. The study spec
/// names dataset files without folders, but a symbolic link in the data folder could still lead anywhere on the
/// machine; the link is followed (<see cref="RealPath"/>) and refused when it leaves these folders.
/// </summary>
public static class DatasetFileScope
{
    public static void Check(string path, string dataFolder, IReadOnlyList<string> allowedFolders)
    {
        string real;
        try
        {
            real = RealPath.Of(path);
        }
        catch (IOException e)
        {
            throw new DataException(path, null, null, $"cannot follow the file's symbolic links ({e.Message})");
        }
        if (RealPath.IsInside(real, RealPath.Of(dataFolder)) || allowedFolders.Any(folder => RealPath.IsInside(real, RealPath.Of(folder))))
        {
            return;
        }
        throw new DataException(path, null, null,
            $"the file is a symbolic link that leads outside the data folder {Path.GetFullPath(dataFolder).TrimEnd(Path.DirectorySeparatorChar)}; " +
            "datasets are read only from inside the data folder (allow the link's folder with --allow-folder)");
    }
}
