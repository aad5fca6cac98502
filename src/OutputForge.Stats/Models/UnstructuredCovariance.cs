using MathNet.Numerics.LinearAlgebra;

namespace OutputForge.Stats.Models;

/// <summary>
/// Unstructured covariance: theta = the lower triangle of Sigma by columns, sigma_11, sigma_21, ...,
/// sigma_T1, sigma_22, ... Sigma is linear in theta, so Kenward and Roger's second-derivative term is zero.
/// </summary>
public sealed class UnstructuredCovariance : WithinSubjectCovariance
{
    private readonly (int Row, int Column)[] _cells;
    private readonly string[] _names;

    public UnstructuredCovariance(int visitCount) : base(visitCount)
    {
        var cells = new List<(int, int)>();
        for (var j = 0; j < visitCount; j++)
        {
            for (var i = j; i < visitCount; i++)
            {
                cells.Add((i, j));
            }
        }
        _cells = cells.ToArray();
        _names = _cells.Select(c => $"covariance({c.Row + 1},{c.Column + 1})").ToArray();
    }

    public override MmrmCovarianceStructure Structure => MmrmCovarianceStructure.Unstructured;
    public override IReadOnlyList<string> ParameterNames => _names;
    public override int MinimumVisits => 1;

    public override Matrix<double> Sigma(Vector<double> theta)
    {
        var s = Zero(VisitCount);
        for (var k = 0; k < _cells.Length; k++)
        {
            s[_cells[k].Row, _cells[k].Column] = theta[k];
            s[_cells[k].Column, _cells[k].Row] = theta[k];
        }
        return s;
    }

    public override Matrix<double>[] FirstDerivatives(Vector<double> theta)
    {
        var d = new Matrix<double>[_cells.Length];
        for (var k = 0; k < _cells.Length; k++)
        {
            d[k] = Zero(VisitCount);
            d[k][_cells[k].Row, _cells[k].Column] = 1;
            d[k][_cells[k].Column, _cells[k].Row] = 1;
        }
        return d;
    }

    public override Vector<double> StartingValues(Matrix<double> empirical) =>
        Vector<double>.Build.DenseOfEnumerable(_cells.Select(c => empirical[c.Row, c.Column]));
}
