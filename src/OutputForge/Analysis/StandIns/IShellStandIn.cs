namespace OutputForge.Analysis.StandIns;

/// <summary>
/// What one table kind adds to the stand-in study of its mock shell: the variables its analysis
/// reads from ADSL and the records of its own datasets, so that the kind's own analysis lays out
/// every row and cell the real table will have. Rows that depend on the data come from the spec
/// where it lists them (levels, visits, times) and are otherwise one row labelled
/// <see cref="ShellRecords.PlaceholderLevel"/>. Values must make every statistic estimable (a
/// statistic that is not estimable may change its cell's shape), and are never shown.
/// </summary>
/// <remarks>
/// Every table kind has one, in its folder, named in its line of the kind registry, <c>Kinds/TableKinds</c>.
/// </remarks>
public interface IShellStandIn
{
    /// <summary>How many stand-in subjects each arm needs; most kinds do with <see cref="ShellRecords.SubjectsPerArm"/>.</summary>
    int SubjectsPerArm(Spec.TableSpec table) => ShellRecords.SubjectsPerArm;

    void Add(ShellRecords records);
}
