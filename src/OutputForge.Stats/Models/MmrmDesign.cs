using MathNet.Numerics.LinearAlgebra;

namespace OutputForge.Stats.Models;

/// <summary>
/// The fixed-effects design of a mixed model for repeated measures: an intercept and the columns of
/// each term. Class covariates are coded against their first level (as R's contr.treatment), the
/// columns of an interaction are the products of its factors' indicator columns with the first factor
/// varying fastest, and a covariate-by-factor term multiplies those by the covariate. The same terms
/// coded with sum-to-zero contrasts (level l of k: 1 at l, -1 at the last level) define the Type 3
/// hypotheses, and the reference grid of all class levels with every covariate at its mean over the
/// analysed records gives the least squares means (Searle, Speed and Milliken 1980).
/// </summary>
public sealed class MmrmDesign
{
    private readonly LinearModelFactor[][] _termFactors;
    private readonly LinearModelCovariate?[] _termCovariates;
    private readonly List<int[]> _columnLevels = [];

    public MmrmDesign(MmrmData data, IReadOnlyList<MmrmTerm> terms)
    {
        Terms = terms;
        _termFactors = terms.Select(t => t.Factors.Select(data.FactorNamed).ToArray()).ToArray();
        _termCovariates = terms.Select(t => t.Covariate is null ? null : data.CovariateNamed(t.Covariate)).ToArray();
        CheckHierarchy(terms);
        var names = new List<string> { "(Intercept)" };
        var termOfColumn = new List<int> { -1 };
        _columnLevels.Add([]);
        for (var t = 0; t < terms.Count; t++)
        {
            foreach (var levels in LevelTuples(_termFactors[t]))
            {
                var parts = _termFactors[t].Select((f, i) => $"{f.Name}[{f.Levels[levels[i] + 1]}]").ToList();
                if (terms[t].Covariate is { } c)
                {
                    parts.Add(c);
                }
                names.Add(string.Join(":", parts));
                termOfColumn.Add(t);
                _columnLevels.Add(levels);
            }
        }
        ColumnNames = names;
        TermOfColumn = termOfColumn;
        CovariateMeans = data.Covariates.ToDictionary(c => c.Name, c => c.Values.Average(), StringComparer.Ordinal);
        ReferenceCoded = Build(data.RecordCount, sumCoded: false);
        SumCoded = Build(data.RecordCount, sumCoded: true);
    }

    public IReadOnlyList<MmrmTerm> Terms { get; }
    public IReadOnlyList<string> ColumnNames { get; }

    /// <summary>The index in <see cref="Terms"/> of each column; -1 for the intercept.</summary>
    public IReadOnlyList<int> TermOfColumn { get; }

    /// <summary>Each numeric covariate's mean over the analysed records (the value LS means are taken at).</summary>
    public IReadOnlyDictionary<string, double> CovariateMeans { get; }

    /// <summary>The design matrix X (records by columns) in reference coding: the coefficients reported.</summary>
    public Matrix<double> ReferenceCoded { get; }

    /// <summary>The same column space in sum-to-zero coding, used only to state Type 3 hypotheses.</summary>
    public Matrix<double> SumCoded { get; }

    public int ColumnCount => ColumnNames.Count;

    /// <summary>
    /// The coefficient vector of a least squares mean: the class covariates named in
    /// <paramref name="levels"/> at those levels, every other class covariate of the model averaged with
    /// equal weight 1/k over its k levels, and numeric covariates at their means.
    /// </summary>
    public Vector<double> LeastSquaresMeanWeights(IReadOnlyDictionary<string, string> levels)
    {
        foreach (var name in levels.Keys.Where(n => !_termFactors.SelectMany(f => f).Any(f => f.Name == n)))
        {
            throw new ArgumentException($"'{name}' is not a class covariate of the model", nameof(levels));
        }
        var c = Vector<double>.Build.Dense(ColumnCount);
        c[0] = 1;
        for (var j = 1; j < ColumnCount; j++)
        {
            var t = TermOfColumn[j];
            var value = _termCovariates[t] is { } cov ? CovariateMeans[cov.Name] : 1.0;
            for (var i = 0; i < _termFactors[t].Length; i++)
            {
                var f = _termFactors[t][i];
                var column = _columnLevels[j][i] + 1;
                value *= levels.TryGetValue(f.Name, out var level)
                    ? (f.LevelIndex(level) == column ? 1 : 0)
                    : 1.0 / f.Levels.Count;
            }
            c[j] = value;
        }
        return c;
    }

    /// <summary>The columns of term <paramref name="term"/> (indices into <see cref="ColumnNames"/>).</summary>
    public IReadOnlyList<int> ColumnsOf(int term) => Enumerable.Range(0, ColumnCount).Where(j => TermOfColumn[j] == term).ToList();

    /// <summary>
    /// Whether each column varies within some subject (a within-subject effect) or is constant within
    /// every subject (a between-subject effect), for the between-within degrees of freedom.
    /// </summary>
    public bool[] WithinSubjectColumns(IReadOnlyList<string> subject)
    {
        var within = new bool[ColumnCount];
        var first = new Dictionary<string, int>(StringComparer.Ordinal);
        for (var n = 0; n < subject.Count; n++)
        {
            if (!first.TryGetValue(subject[n], out var f))
            {
                first[subject[n]] = n;
                continue;
            }
            for (var j = 0; j < ColumnCount; j++)
            {
                within[j] |= ReferenceCoded[n, j] != ReferenceCoded[f, j];
            }
        }
        return within;
    }

    private Matrix<double> Build(int rows, bool sumCoded)
    {
        var x = Matrix<double>.Build.Dense(rows, ColumnCount);
        for (var n = 0; n < rows; n++)
        {
            x[n, 0] = 1;
            for (var j = 1; j < ColumnCount; j++)
            {
                var t = TermOfColumn[j];
                var value = _termCovariates[t]?.Values[n] ?? 1.0;
                for (var i = 0; i < _termFactors[t].Length && value != 0; i++)
                {
                    var f = _termFactors[t][i];
                    var level = f.LevelOfRow[n];
                    var column = _columnLevels[j][i];
                    value *= sumCoded
                        ? (level == column ? 1 : level == f.Levels.Count - 1 ? -1 : 0)
                        : (level == column + 1 ? 1 : 0);
                }
                x[n, j] = value;
            }
        }
        return x;
    }

    /// <summary>All tuples of non-reference level positions (0 = second level), the first factor fastest.</summary>
    private static IEnumerable<int[]> LevelTuples(LinearModelFactor[] factors)
    {
        var counts = factors.Select(f => f.Levels.Count - 1).ToArray();
        if (counts.Any(c => c <= 0))
        {
            yield break;
        }
        var current = new int[factors.Length];
        while (true)
        {
            yield return (int[])current.Clone();
            var i = 0;
            while (i < current.Length && ++current[i] == counts[i])
            {
                current[i] = 0;
                i++;
            }
            if (i == current.Length)
            {
                yield break;
            }
        }
    }

    private static void CheckHierarchy(IReadOnlyList<MmrmTerm> terms)
    {
        var names = terms.Select(t => t.Name).ToHashSet(StringComparer.Ordinal);
        foreach (var t in terms.Where(t => t.Factors.Count + (t.Covariate is null ? 0 : 1) > 1))
        {
            // Contrast coding spans the interaction's cells only when every lower-order term is present too.
            for (var omit = 0; omit < t.Factors.Count + (t.Covariate is null ? 0 : 1); omit++)
            {
                var lower = omit < t.Factors.Count
                    ? new MmrmTerm(t.Factors.Where((_, i) => i != omit).ToList(), t.Covariate)
                    : new MmrmTerm(t.Factors);
                if (!names.Contains(lower.Name))
                {
                    throw new ArgumentException($"the model term {t.Name} needs the term {lower.Name} in the model (contrast coding)", nameof(terms));
                }
            }
        }
        if (names.Count != terms.Count)
        {
            throw new ArgumentException("a model term is listed twice", nameof(terms));
        }
    }
}
