using OutputForge.Naming;
using OutputForge.Results;

namespace OutputForge.Workflow.Compare;

/// <summary>
/// Whether a QC file's row or column value that matched nothing was meant as a key, and which key of the table it is
/// nearest to. It was meant as a key when it is written in key form (<see cref="ResultKey.IsKey"/>: "responder"), or
/// when, written again in key form part by part, it is a key of the table: the keys of the earlier scheme ("SEX/F",
/// "AGE/mean (sd)", "soc:Gastrointestinal disorders/pt:Nausea", "week-4-category-1") come out as today's ("sex/f",
/// "age/mean-sd", "soc-gastrointestinal-disorders/pt-nausea", "week-4/category-1"). Such a value is never matched for
/// the QC programmer: a comparison must not rest on a guess, so the nearest key is named instead.
/// </summary>
internal static class QcKeyReading
{
    public static bool MeantAsKey(string written, IReadOnlyList<string> keys, out string? nearest)
    {
        var rewritten = ResultKey.Of(written.Split('/'));
        var same = keys.FirstOrDefault(k => Flat(k) == Flat(rewritten));
        nearest = same ?? NearestName.Find(rewritten, keys) ?? NearestName.Find(written, keys);
        return same is not null || ResultKey.IsKey(written);
    }

    /// <summary>The key with its parts joined by "-" as the earlier scheme joined some ("week-4-category-1").</summary>
    private static string Flat(string key) => key.Replace('/', '-');
}
