using System.Text;

namespace OutputForge.Results;

/// <summary>
/// Builds the stable keys of results.json: lower case, runs of anything but letters and digits
/// turned into one dash ("QF-217 10 mg" -> "qf-217-10-mg"), so a QC programmer can write them.
/// </summary>
public static class ResultKeys
{
    public const string Total = "total";

    public static string FromLabel(string label)
    {
        var builder = new StringBuilder(label.Length);
        var dash = false;
        foreach (var c in label.Trim().ToLowerInvariant())
        {
            if (char.IsLetterOrDigit(c))
            {
                if (dash && builder.Length > 0)
                {
                    builder.Append('-');
                }
                builder.Append(c);
                dash = false;
            }
            else
            {
                dash = true;
            }
        }
        return builder.Length == 0 ? "blank" : builder.ToString();
    }
}
