using OutputForge.Analysis;
using OutputForge.Kinds.Responders;
using OutputForge.Results;
using OutputForge.Stats;

namespace OutputForge.Kinds.Subgroups;

/// <summary>
/// The treatment-by-subgroup interaction test of one active arm against the control over the levels
/// of one subgroup variable, on the subjects of those two arms only. "likelihood-ratio" compares the
/// logistic models response ~ arm + subgroup + arm:subgroup and response ~ arm + subgroup (deviance
/// difference on (levels - 1) degrees of freedom); both models are categorical, so the cell counts
/// determine the likelihood and each cell is expanded to its responders and non-responders.
/// "breslow-day" tests the homogeneity of the odds ratios over the levels (Breslow and Day 1980),
/// "breslow-day-tarone" with Tarone's (1985) correction. Levels where either arm has no subjects in
/// the denominator carry no information on the interaction and are left out, with a note naming the level; so are the
/// levels the Breslow-Day test leaves out (Stats' stratum remarks, named here by the levels' labels).
/// </summary>
internal static class SubgroupInteraction
{
    public const string LevelTerm = "Level";
    public const string TestName = "interaction test";

    /// <param name="about">What the test is about (the variable's interaction and the comparison), for the notes.</param>
    /// <param name="armLabels">The labels of the active arm and the control, for a level without subjects of one.</param>
    public static TestResult Compute(InteractionTest method, IReadOnlyList<(SubgroupLevel Level, ResponderCounts Active, ResponderCounts Control)> cells,
        NoteSubject about, (string Active, string Control) armLabels, List<ResultNote> notes)
    {
        string Group(int group) => group == 1 ? armLabels.Active : armLabels.Control;
        var used = new List<(SubgroupLevel Level, ResponderCounts Active, ResponderCounts Control)>();
        for (var k = 0; k < cells.Count; k++)
        {
            var cell = cells[k];
            if (cell.Active.Denominator == 0 || cell.Control.Denominator == 0)
            {
                var remark = cell.Active.Denominator == 0 && cell.Control.Denominator == 0
                    ? new StratumRemark(k, StratumRemarkReason.NoSubjects, TestName)
                    : new StratumRemark(k, StratumRemarkReason.EmptyGroup, TestName, cell.Active.Denominator == 0 ? 1 : 2);
                notes.Add(StratumNotes.LeftOut(remark, about, [cell.Level.Label], Group, LevelTerm));
                continue;
            }
            used.Add(cell);
        }
        var name = method == InteractionTest.LikelihoodRatio ? LogisticLikelihoodRatioTest.MethodName
            : method == InteractionTest.BreslowDay ? BreslowDayTest.MethodName : BreslowDayTest.TaroneMethodName;
        if (used.Count < 2)
        {
            return TestResult.NotEstimable(name, "fewer than two levels have subjects in both arms");
        }
        if (method != InteractionTest.LikelihoodRatio)
        {
            var strata = used.Select(c => new StratumCounts(c.Active.Responders, c.Active.Denominator, c.Control.Responders, c.Control.Denominator)).ToList();
            var test = BreslowDayTest.Compute(strata, taroneCorrection: method == InteractionTest.BreslowDayTarone);
            // The test returns the strata by their index in the order given; name them by the levels' labels.
            notes.AddRange(test.StratumRemarks.Select(r => StratumNotes.LeftOut(r, about, [used[r.Stratum].Level.Label], Group, LevelTerm)));
            notes.AddRange(test.Notes.Select(n => ResultNote.Warning(NoteKind.MethodRemark, about, ("text", n))));
            return test;
        }
        var response = new List<int>();
        var arm = new List<int>();
        var level = new List<int>();
        for (var k = 0; k < used.Count; k++)
        {
            Expand(used[k].Control, 0, k, response, arm, level);
            Expand(used[k].Active, 1, k, response, arm, level);
        }
        var armLevels = new[] { "control", "active" };
        var levelNames = used.Select(c => c.Level.Label).ToList();
        var (reducedX, reducedColumns) = TwoFactorDesign.Build(arm, armLevels, level, levelNames, interaction: false);
        var (fullX, fullColumns) = TwoFactorDesign.Build(arm, armLevels, level, levelNames, interaction: true);
        var reduced = LogisticRegression.Fit(response, reducedX, reducedColumns);
        var full = LogisticRegression.Fit(response, fullX, fullColumns);
        return LogisticLikelihoodRatioTest.Compute(reduced, full);
    }

    private static void Expand(ResponderCounts counts, int armIndex, int levelIndex, List<int> response, List<int> arm, List<int> level)
    {
        for (var i = 0; i < counts.Denominator; i++)
        {
            response.Add(i < counts.Responders ? 1 : 0);
            arm.Add(armIndex);
            level.Add(levelIndex);
        }
    }
}
