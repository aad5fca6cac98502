using System.Text;

namespace OutputForge.Tests.Snapshots;

/// <summary>
/// A line diff (longest common subsequence) printed as "-approved" / "+received" lines with two
/// lines of context, at most <see cref="MaxLines"/> lines, so a failing snapshot reads like a review.
/// </summary>
public static class LineDiff
{
    public const int MaxLines = 60;
    private const int Context = 2;

    public static string Describe(string[] approved, string[] received)
    {
        int n = approved.Length, m = received.Length;
        var common = new int[n + 1, m + 1];
        for (int i = n - 1; i >= 0; i--)
            for (int j = m - 1; j >= 0; j--)
                common[i, j] = approved[i] == received[j] ? common[i + 1, j + 1] + 1 : Math.Max(common[i + 1, j], common[i, j + 1]);

        var script = new List<(char Kind, int Line, string Text)>();
        int a = 0, b = 0;
        while (a < n || b < m)
        {
            if (a < n && b < m && approved[a] == received[b])
                script.Add((' ', a++ + 1, received[b++]));
            else if (a < n && (b == m || common[a + 1, b] >= common[a, b + 1]))
                script.Add(('-', a + 1, approved[a++]));
            else
                script.Add(('+', b + 1, received[b++]));
        }
        var show = new bool[script.Count];
        for (int i = 0; i < script.Count; i++)
        {
            if (script[i].Kind == ' ')
                continue;
            for (int k = Math.Max(0, i - Context); k <= Math.Min(script.Count - 1, i + Context); k++)
                show[k] = true;
        }
        var text = new StringBuilder();
        int lines = 0;
        for (int i = 0; i < script.Count && lines < MaxLines; i++)
        {
            if (!show[i])
                continue;
            if (i > 0 && !show[i - 1])
                text.Append("  ...\n");
            text.Append(script[i].Kind).Append(' ').Append(script[i].Text).Append('\n');
            lines++;
        }
        return text.ToString();
    }
}
