using System.Text;

namespace OutputForge.Tests.Rendering;

/// <summary>
/// Compares an output with its approved copy under Rendering/Approved. On a difference the output
/// is written beside it as NAME.received.txt (review it, then rename it to NAME.approved.txt to
/// approve the change) and the test fails naming the first differing line.
/// </summary>
public static class ApprovedFile
{
    public static void Verify(string name, string actual)
    {
        string directory = Path.Combine(RepositoryRoot.Find(), "tests", "OutputForge.Tests", "Rendering", "Approved");
        string approvedPath = Path.Combine(directory, name + ".approved.txt");
        string receivedPath = Path.Combine(directory, name + ".received.txt");
        string? approved = File.Exists(approvedPath) ? File.ReadAllText(approvedPath, Encoding.UTF8) : null;
        if (approved == actual)
        {
            File.Delete(receivedPath);
            return;
        }

        File.WriteAllText(receivedPath, actual, new UTF8Encoding(false));
        string relative = Path.Combine("tests", "OutputForge.Tests", "Rendering", "Approved", name);
        if (approved is null)
            Assert.Fail($"No approved output {relative}.approved.txt; the output was written to {relative}.received.txt.");
        Assert.Fail($"Output differs from {relative}.approved.txt {FirstDifference(approved, actual)}; " +
                    $"the output was written to {relative}.received.txt.");
    }

    private static string FirstDifference(string approved, string actual)
    {
        var expectedLines = approved.Split('\n');
        var actualLines = actual.Split('\n');
        for (int i = 0; i < Math.Max(expectedLines.Length, actualLines.Length); i++)
        {
            string? e = i < expectedLines.Length ? expectedLines[i] : null;
            string? a = i < actualLines.Length ? actualLines[i] : null;
            if (e != a)
                return $"at line {i + 1}: expected \"{e ?? "(end of file)"}\" but got \"{a ?? "(end of file)"}\"";
        }
        return "in line endings or encoding";
    }
}
