using OutputForge.Data;
using OutputForge.Spec;

namespace OutputForge.Workflow.Check;

/// <summary>
/// The checks that need both spec and data: every condition compiles against its dataset, the
/// treatment variables exist, populations and arms are not empty, the treatment variable's values
/// are the arms the spec lists, and each table passes its own analysis (whose first problem and
/// warnings are reported; the analysis is the one `run` uses).
/// </summary>
public static class SpecDataChecks
{
    /// <param name="datasets">The datasets that could be read, by name (ADSL among them).</param>
    /// <param name="data">The study data as a run loads it, or null when the data have errors a run would stop at; the tables' analyses are then skipped.</param>
    public static void Run(SpecPackage package, IReadOnlyDictionary<string, Dataset> datasets, StudyData? data, CheckReport report)
    {
        var study = package.Study;
        var adsl = datasets["adsl"];
        foreach (var (name, population) in study.Populations)
        {
            Population(study, name, population, adsl, report);
        }
        foreach (var table in package.Tables)
        {
            Conditions(table, datasets, report);
            if (data is null)
            {
                continue;
            }
            try
            {
                var result = Kinds.TableKinds.For(table).Analysis.Analyze(study, table, data);
                foreach (var warning in Layout.TableNotes.Of(result).Warnings)
                {
                    report.Add(new CheckProblem(CheckSeverity.Warning, table.Source.File, "", $"table {table.Id}: {warning}",
                        "a run would print this warning in the table's footnotes; check that it is expected"));
                }
            }
            catch (SpecException e)
            {
                foreach (var problem in e.Problems)
                {
                    report.Add(CheckProblem.FromSpec(problem));
                }
            }
            catch (DataException e)
            {
                report.Add(CheckProblem.FromData(e, CheckHints.ForData(e)));
            }
        }
    }

    private static void Population(StudySpec study, string name, PopulationSpec population, Dataset adsl, CheckReport report)
    {
        var pointer = $"/populations/{name}";
        var where = Compile(new SpecConditionText(population.Where, study.Source, pointer + "/where"), adsl, report);
        var treatmentName = population.Treatment ?? study.Treatment.Variable;
        var treatmentPointer = population.Treatment is null ? "/treatment/variable" : pointer + "/treatment";
        var treatment = Variable(study, adsl, treatmentName, treatmentPointer, report);
        var orderName = population.Treatment is null ? study.Treatment.Order : population.Order;
        if (orderName is not null)
        {
            var order = Variable(study, adsl, orderName, population.Treatment is null ? "/treatment/order" : pointer + "/order", report);
            if (order is not null && order.Kind != Expressions.VariableKind.Number && order.DistinctValues().Count > 0)
            {
                report.Add(CheckProblem.FromSpec(study.Source.Problem(population.Treatment is null ? "/treatment/order" : pointer + "/order",
                    $"the order variable {orderName} is not numeric in {Path.GetFileName(adsl.File)}")));
            }
        }
        if (where is null || treatment is null)
        {
            return;
        }
        var counts = new Dictionary<string, int>(StringComparer.Ordinal);
        int selected = 0, withoutArm = 0;
        for (var row = 0; row < adsl.RowCount; row++)
        {
            if (!where.Matches(row))
            {
                continue;
            }
            selected++;
            if (treatment.GetText(row) is { } arm)
            {
                counts[arm] = counts.GetValueOrDefault(arm) + 1;
            }
            else
            {
                withoutArm++;
            }
        }
        var file = Path.GetFileName(adsl.File);
        if (selected == 0)
        {
            report.Add(CheckProblem.FromSpec(study.Source.Problem(SpecProblemCode.NoSubjects, pointer + "/where",
                $"population '{name}' ({population.Where}) selects no subjects of {file}")));
            return;
        }
        if (withoutArm > 0)
        {
            report.Add(new CheckProblem(CheckSeverity.Warning, adsl.File, $"variable {treatment.Name}",
                $"{withoutArm} subject{(withoutArm == 1 ? "" : "s")} of population '{name}' have no value of {treatment.Name} and will not be counted",
                "fill in the treatment variable, or accept that tables leave these subjects out (they say so in a warning)"));
        }
        if (!counts.ContainsKey(study.Treatment.Control))
        {
            report.Add(CheckProblem.FromSpec(study.Source.Problem(SpecProblemCode.NoSubjects, "/treatment/control",
                $"control arm '{study.Treatment.Control}' has no subjects in population '{name}' ({treatment.Name} values: {string.Join(", ", counts.Keys)})")));
        }
        if (study.Treatment.Arms is not { } arms)
        {
            return;
        }
        var listed = arms.Select(a => a.Value).ToHashSet(StringComparer.Ordinal);
        foreach (var value in counts.Keys.Where(v => !listed.Contains(v)))
        {
            report.Add(new CheckProblem(CheckSeverity.Error, adsl.File, $"variable {treatment.Name}",
                $"{treatment.Name} value '{value}' ({counts[value]} subjects of population '{name}') is not one of the arms of {Path.GetFileName(study.Source.File)} ({string.Join(", ", listed)})",
                "add the arm to treatment.arms of the study spec, or correct the value in the data"));
        }
        for (var i = 0; i < arms.Count; i++)
        {
            if (!counts.ContainsKey(arms[i].Value))
            {
                var problem = study.Source.Problem(SpecProblemCode.NoSubjects, $"/treatment/arms/{i}/value", $"arm '{arms[i].Value}' has no subjects in population '{name}'");
                report.Add(CheckProblem.FromSpec(problem, CheckSeverity.Warning) with
                {
                    Hint = "an empty arm shows N=0 and no percentages; check the arm's value against the data",
                });
            }
        }
    }

    private static void Conditions(TableSpec table, IReadOnlyDictionary<string, Dataset> datasets, CheckReport report)
    {
        if (table.Subset is not null)
        {
            Compile(new SpecConditionText(table.Subset, table.Source, "/subset"), datasets["adsl"], report);
        }
        if (table.Endpoint is not { } endpoint || !datasets.TryGetValue(endpoint.Dataset, out var dataset))
        {
            return;
        }
        if (endpoint.Where is not null)
        {
            Compile(new SpecConditionText(endpoint.Where, table.Source, "/endpoint/where"), dataset, report);
        }
        if (endpoint.Response is not null)
        {
            Compile(new SpecConditionText(endpoint.Response, table.Source, "/endpoint/response"), dataset, report);
        }
    }

    private static Expressions.Condition? Compile(SpecConditionText condition, Dataset dataset, CheckReport report)
    {
        try
        {
            return condition.Compile(dataset);
        }
        catch (SpecException e)
        {
            foreach (var problem in e.Problems)
            {
                report.Add(CheckProblem.FromSpec(problem));
            }
            return null;
        }
    }

    private static DataColumn? Variable(StudySpec study, Dataset adsl, string name, string pointer, CheckReport report)
    {
        var column = adsl.Find(name);
        if (column is null)
        {
            report.Add(CheckProblem.FromSpec(study.Source.Problem(SpecProblemCode.UnknownVariable, pointer,
                $"ADSL ({Path.GetFileName(adsl.File)}) has no variable {name}{Naming.NearestName.Hint(name, adsl.VariableNames)}")));
        }
        return column;
    }
}
