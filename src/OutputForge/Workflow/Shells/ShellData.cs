using System.Globalization;
using OutputForge.Data;
using OutputForge.Expressions;
using OutputForge.Spec;
using OutputForge.Analysis.StandIns;

namespace OutputForge.Workflow.Shells;

/// <summary>
/// Stand-in study data from which a table kind's own analysis lays out a mock shell before real
/// data exist: per arm of the study spec's treatment.arms, <see cref="ShellRecords.SubjectsPerArm"/> invented
/// subjects whom the table's population and subset select, to which the kind's
/// <see cref="IShellStandIn"/> adds what its analysis reads. Every value comes from the specs'
/// conditions and lists (see <see cref="ConditionWitness"/>) or is a varied stand-in number; none
/// is shown, because the shell replaces every number with a placeholder.
/// </summary>
public static class ShellData
{
    public static bool Supports(string kind) => Kinds.TableKinds.Find(kind) is not null;

    public static ShellRecords For(StudySpec study, TableSpec table)
    {
        var arms = study.Treatment.Arms ?? throw new SpecException(study.Source.Problem("/treatment",
            "shells need the arms before there are data: add \"arms\": [{\"value\": \"Placebo\", \"order\": 0}, ...] to the treatment"));
        var population = study.Populations[table.Population];
        var treatment = population.Treatment ?? study.Treatment.Variable;
        var order = population.Treatment is null ? study.Treatment.Order : population.Order;
        var selects = table.Subset is null ? population.Where : $"({population.Where}) and ({table.Subset})";
        var wherePointer = table.Subset is null ? $"/populations/{table.Population}/where" : "/subset";
        var whereSource = table.Subset is null ? study.Source : table.Source;

        var standIn = Kinds.TableKinds.Find(table.Kind)?.StandIn;
        var perArm = standIn?.SubjectsPerArm(table) ?? ShellRecords.SubjectsPerArm;
        var subjects = new List<ShellSubject>();
        var records = new ShellRecords(study, table, subjects);
        if (order is not null)
        {
            records.Declare(ShellRecords.SubjectLevel, order, VariableKind.Number);
        }
        foreach (var (arm, index) in arms.Select((a, i) => (a, i)))
        {
            var fixedValues = new Dictionary<string, string?>(StringComparer.OrdinalIgnoreCase) { [treatment] = arm.Value };
            if (order is not null)
            {
                fixedValues[order] = arm.Order.ToString("R", CultureInfo.InvariantCulture);
            }
            var values = records.Witness(selects, fixedValues, ShellRecords.SubjectLevel, whereSource, wherePointer);
            for (var k = 0; k < perArm; k++)
            {
                subjects.Add(new ShellSubject(string.Create(CultureInfo.InvariantCulture, $"SHELL-{index + 1}-{k + 1:00}"), index, k,
                    new Dictionary<string, string?>(values, StringComparer.OrdinalIgnoreCase)
                    {
                        [AdamConformance.SubjectVariable] = string.Create(CultureInfo.InvariantCulture, $"SHELL-{index + 1}-{k + 1:00}"),
                    }));
            }
        }
        standIn?.Add(records);
        return records;
    }
}
