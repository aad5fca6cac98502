using OutputForge.Expressions;
using OutputForge.Analysis.StandIns;

namespace OutputForge.Kinds.Subgroups;

/// <summary>
/// Subgroup tables: the responder stand-in records, with each subgroup variable's levels from the
/// spec (or one placeholder level) spread evenly over every arm. Subjects come in pairs, one
/// responder and one non-responder, that share every level, so each level of each arm holds at least
/// the table's minimum per arm with both outcomes and no model separates.
/// </summary>
public sealed class SubgroupStandIn : IShellStandIn
{
    public int SubjectsPerArm(Spec.TableSpec table)
    {
        var settings = table.Settings<SubgroupSettings>();
        var pairsPerLevel = Math.Max(1, (settings.MinimumPerArm + 1) / 2);
        return 2 * pairsPerLevel * LevelCycle(settings);
    }

    public void Add(ShellRecords records)
    {
        var settings = records.Table.Settings<SubgroupSettings>();
        var endpoint = records.Table.Endpoint!;
        var response = endpoint.Response ?? "AVALC = 'Y'";
        var responder = EndpointStandIn.Selected(records, endpoint, condition: response, conditionPointer: "/endpoint/response");
        var nonResponder = EndpointStandIn.Selected(records, endpoint, condition: $"not ({response})", conditionPointer: "/endpoint/response");
        foreach (var subject in records.Subjects)
        {
            var pair = subject.IndexInArm / 2;
            foreach (var variable in settings.Variables)
            {
                var levels = LevelsOf(variable);
                records.SetIfAbsent(subject, variable.Variable, levels[pair % levels.Count], VariableKind.Text);
            }
            records.AddRecord(endpoint.Dataset, EndpointStandIn.For(subject, subject.IndexInArm % 2 == 0 ? responder : nonResponder));
        }
    }

    private static IReadOnlyList<string> LevelsOf(SubgroupVariableSpec variable) =>
        variable.Levels is { Count: > 0 } levels ? levels.Select(l => l.Value).ToList() : [ShellRecords.PlaceholderLevel];

    /// <summary>The least number of pairs after which every variable's levels have come round equally often.</summary>
    private static int LevelCycle(SubgroupSettings settings) =>
        settings.Variables.Select(v => LevelsOf(v).Count).Aggregate(1, (cycle, count) => cycle / Gcd(cycle, count) * count);

    private static int Gcd(int a, int b) => b == 0 ? a : Gcd(b, a % b);
}
