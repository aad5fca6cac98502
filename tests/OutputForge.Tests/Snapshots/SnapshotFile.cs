using System.Text;

namespace OutputForge.Tests.Snapshots;

/// <summary>
/// Compares a text snapshot with its approved copy in Snapshots/Approved. On a difference the
/// snapshot is written beside it as NAME.received.txt and the failure shows a line diff. To approve
/// every current snapshot, run the tests with OUTPUTFORGE_APPROVE=1: the received texts then
/// become the approved files (review the change with git diff before committing).
/// </summary>
public static class SnapshotFile
{
    public const string ApproveVariable = "OUTPUTFORGE_APPROVE";

    public static string Folder => Path.Combine(Rendering.RepositoryRoot.Find(), "tests", "OutputForge.Tests", "Snapshots", "Approved");

    private static bool Approving => Environment.GetEnvironmentVariable(ApproveVariable) == "1";

    /// <summary>Null when the snapshot matches (or was approved), otherwise a readable account of the difference.</summary>
    public static string? Compare(string name, string actual)
    {
        string approvedPath = Path.Combine(Folder, name + ".approved.txt");
        string receivedPath = Path.Combine(Folder, name + ".received.txt");
        string? approved = File.Exists(approvedPath) ? File.ReadAllText(approvedPath, Encoding.UTF8) : null;
        if (approved == actual)
        {
            File.Delete(receivedPath);
            return null;
        }
        if (Approving)
        {
            File.WriteAllText(approvedPath, actual, new UTF8Encoding(false));
            File.Delete(receivedPath);
            return null;
        }
        File.WriteAllText(receivedPath, actual, new UTF8Encoding(false));
        string relative = $"tests/OutputForge.Tests/Snapshots/Approved/{name}";
        if (approved is null)
            return $"{name}: no approved snapshot {relative}.approved.txt; received {relative}.received.txt (approve with {ApproveVariable}=1)";
        return $"{name}: differs from {relative}.approved.txt (received {relative}.received.txt; approve with {ApproveVariable}=1):\n"
               + LineDiff.Describe(approved.Split('\n'), actual.Split('\n'));
    }
}
