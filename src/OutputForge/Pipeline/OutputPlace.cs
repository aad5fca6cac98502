using System.Text;
using OutputForge.Files;

namespace OutputForge.Pipeline;

/// <summary>
/// Where a run's output folder really is, and what stands in the way of writing it, said plainly: a name too long
/// for the staging folder beside it, a part of the path that is a file, a folder without write permission.
/// </summary>
public static class OutputPlace
{
    /// <summary>The longest file name most file systems store (NAME_MAX on Linux and macOS, in UTF-8 bytes; 255 UTF-16 units on NTFS).</summary>
    public const int NameLimit = 255;

    /// <summary>What the staging and previous-package folders add to the output folder's name (".{name}.previous-{pid}-{32 hex}").</summary>
    public const int StagingNameOverhead = 60;

    /// <summary>The output folder with links resolved, refused with a plain message when it cannot be an output folder.</summary>
    public static string Resolve(string outputFolder)
    {
        string real;
        try
        {
            real = RealPath.Of(outputFolder).TrimEnd(Path.DirectorySeparatorChar);
        }
        catch (Exception e) when (e is IOException or ArgumentException or NotSupportedException)
        {
            throw new RunException($"{outputFolder}: not a usable output folder path ({e.Message})");
        }
        var name = Path.GetFileName(real);
        if (Path.GetDirectoryName(real) is null || name.Length == 0)
        {
            throw new RunException($"{outputFolder}: cannot write into the root folder; name a folder for the outputs");
        }
        var bytes = Encoding.UTF8.GetByteCount(name);
        if (bytes > NameLimit - StagingNameOverhead)
        {
            throw new RunException($"{outputFolder}: the output folder's name is {bytes} bytes long; at most {NameLimit - StagingNameOverhead} fit, " +
                $"because the run is staged in a folder beside it whose name adds {StagingNameOverhead} to it (file names hold at most {NameLimit})");
        }
        if (File.Exists(real))
        {
            throw new RunException($"{outputFolder}: is a file, not a folder; name a folder for the outputs");
        }
        return real;
    }

    /// <summary>
    /// Refuses an output folder that is, or lies inside, the data folder, or that holds the data or the spec folder:
    /// the outputs would mix with the datasets (and a later run could read a table file as a dataset), and the new
    /// package replaces the whole output folder, which must not take the study's inputs with it.
    /// </summary>
    public static void CheckApart(string outputFolder, string realOutput, string dataFolder, string specFolder)
    {
        var data = RealPath.Of(dataFolder);
        var spec = RealPath.Of(specFolder);
        if (RealPath.IsInside(realOutput, data))
        {
            throw new UsageException($"--out {outputFolder} is inside the data folder {dataFolder}; write the outputs to a folder outside the data folder");
        }
        if (RealPath.IsInside(data, realOutput) || RealPath.IsInside(spec, realOutput))
        {
            var held = RealPath.IsInside(data, realOutput) ? $"the data folder {dataFolder}" : $"the spec folder {specFolder}";
            throw new UsageException($"--out {outputFolder} holds {held}; each run replaces the whole output folder, so give a folder of its own for the outputs");
        }
    }

    /// <summary>Creates the folder that will hold the output folder, saying what is wrong when it cannot be.</summary>
    public static void CreateParent(string outputFolder, string parent)
    {
        try
        {
            Directory.CreateDirectory(parent);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            throw CannotWrite(outputFolder, parent, e);
        }
    }

    /// <summary>The plain reason a file or folder could not be made in <paramref name="parent"/>.</summary>
    public static RunException CannotWrite(string outputFolder, string parent, Exception e)
    {
        if (FileInTheWay(parent) is { } file)
        {
            return new RunException($"{outputFolder}: {file} is a file, not a folder, so the output folder cannot be made there");
        }
        return e switch
        {
            PathTooLongException => new RunException(
                $"{outputFolder}: the path is too long for this system ({parent.Length} characters before the output files' own names); choose a shorter output path"),
            UnauthorizedAccessException => new RunException($"{outputFolder}: no permission to write in {parent} ({e.Message})"),
            _ => new RunException($"{outputFolder}: cannot write in {parent} ({e.Message})"),
        };
    }

    /// <summary>The first part of <paramref name="folder"/> that exists as a file, if any.</summary>
    private static string? FileInTheWay(string folder)
    {
        for (var path = folder; !string.IsNullOrEmpty(path); path = Path.GetDirectoryName(path))
        {
            if (File.Exists(path))
            {
                return path;
            }
            if (Directory.Exists(path))
            {
                return null;
            }
        }
        return null;
    }
}
