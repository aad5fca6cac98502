using MathNet.Numerics.LinearAlgebra;

namespace OutputForge.Stats.Models;

/// <summary>
/// The design matrix of a general linear model: an intercept column, one column per numeric
/// covariate, and for each class covariate one indicator column per level except the first
/// (reference coding, as R's contr.treatment). Column names say what each coefficient means.
/// </summary>
public sealed class LinearModelDesign
{
    private LinearModelDesign(Matrix<double> matrix, IReadOnlyList<string> columnNames,
        IReadOnlyList<LinearModelCovariate> covariates, IReadOnlyList<LinearModelFactor> factors)
    {
        Matrix = matrix;
        ColumnNames = columnNames;
        Covariates = covariates;
        Factors = factors;
    }

    public Matrix<double> Matrix { get; }
    public IReadOnlyList<string> ColumnNames { get; }
    public IReadOnlyList<LinearModelCovariate> Covariates { get; }
    public IReadOnlyList<LinearModelFactor> Factors { get; }
    public int RowCount => Matrix.RowCount;

    public static LinearModelDesign Build(int rows, IReadOnlyList<LinearModelCovariate> covariates, IReadOnlyList<LinearModelFactor> factors)
    {
        foreach (var c in covariates.Where(c => c.Values.Count != rows))
        {
            throw new ArgumentException($"covariate {c.Name} has {c.Values.Count} values for {rows} observations");
        }
        foreach (var f in factors.Where(f => f.LevelOfRow.Count != rows))
        {
            throw new ArgumentException($"class covariate {f.Name} has {f.LevelOfRow.Count} values for {rows} observations");
        }
        var names = new List<string> { "(Intercept)" };
        names.AddRange(covariates.Select(c => c.Name));
        foreach (var f in factors)
        {
            names.AddRange(f.Levels.Skip(1).Select(l => $"{f.Name}[{l}]"));
        }
        // Filled column by column into MathNet's column-major storage: one pass per column instead of an indexer call per cell.
        var cells = new double[rows * names.Count];
        Array.Fill(cells, 1.0, 0, rows);
        var column = 1;
        foreach (var c in covariates)
        {
            for (var i = 0; i < rows; i++)
            {
                cells[column * rows + i] = c.Values[i];
            }
            column++;
        }
        foreach (var f in factors)
        {
            for (var i = 0; i < rows; i++)
            {
                var level = f.LevelOfRow[i];
                if (level >= 1)
                {
                    cells[(column + level - 1) * rows + i] = 1;
                }
            }
            column += f.Levels.Count - 1;
        }
        var matrix = Matrix<double>.Build.Dense(rows, names.Count, cells);
        return new LinearModelDesign(matrix, names, covariates, factors);
    }

    /// <summary>The first column of the indicators of <paramref name="factor"/> (its second level).</summary>
    public int FirstColumnOf(LinearModelFactor factor)
    {
        var column = 1 + Covariates.Count;
        foreach (var f in Factors)
        {
            if (ReferenceEquals(f, factor))
            {
                return column;
            }
            column += f.Levels.Count - 1;
        }
        throw new ArgumentException($"{factor.Name} is not a class covariate of this model", nameof(factor));
    }
}
