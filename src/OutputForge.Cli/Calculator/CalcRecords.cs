using System.Globalization;
using OutputForge.Data;
using OutputForge.Expressions;
using OutputForge.Stats.Models;

namespace OutputForge.Cli.Calculator;

/// <summary>
/// The CSV file a model command of `calc` reads (the project's CSV rules: a header row, RFC 4180, UTF-8, empty or "."
/// missing): its variables looked up by the option that names them, and the records the model uses, those with no
/// missing value in any of its variables (how many were left out is said, never hidden). Class covariates take their
/// levels in ordinal text order, or numeric order for a numeric variable; a named first level becomes the reference.
/// </summary>
internal sealed class CalcRecords
{
    private readonly Dataset _data;
    private readonly List<int> _rows = [];

    private CalcRecords(Dataset data, IReadOnlyList<DataColumn> used)
    {
        _data = data;
        for (var row = 0; row < data.RowCount; row++)
        {
            if (used.All(c => !c.IsMissing(row)))
            {
                _rows.Add(row);
            }
        }
        LeftOut = data.RowCount - _rows.Count;
        if (_rows.Count == 0)
        {
            throw new DataException(data.File, null, null, "no record has a value in every variable the model uses");
        }
    }

    public int Count => _rows.Count;

    /// <summary>Records left out for a missing value in a variable of the model.</summary>
    public int LeftOut { get; }

    public string File => _data.File;

    /// <summary>Reads <paramref name="path"/> and keeps the records with every variable of <paramref name="variables"/> (option, name) present.</summary>
    public static CalcRecords Read(string path, IReadOnlyList<(string Option, string Name)> variables)
    {
        if (!System.IO.File.Exists(path))
        {
            throw new CalcInputException($"--data: {path} does not exist (expected a CSV file with a header row)");
        }
        var data = CsvDatasetReader.Read(Path.GetFileNameWithoutExtension(path), path);
        var columns = variables.Select(v => Column(data, v.Option, v.Name)).ToList();
        return new CalcRecords(data, columns);
    }

    private static DataColumn Column(Dataset data, string option, string name) =>
        data.Find(name) ?? throw new CalcInputException($"{option}: {data.File} has no variable {name}{Naming.NearestName.Hint(name, data.Columns.Select(c => c.Name).ToList())}");

    public int Line(int record) => _data.LineOfRow[_rows[record]];

    public string TextOf(string name, int record) => _data.Get(name).GetText(_rows[record])!;

    public IReadOnlyList<double> Numbers(string name)
    {
        var column = _data.Get(name);
        if (column.Kind != VariableKind.Number)
        {
            var row = _rows.First(r => !double.IsFinite(column.GetNumber(r)));
            throw new DataException(_data.File, _data.LineOfRow[row], name, $"expected a number, found '{column.GetText(row)}'");
        }
        return _rows.Select(r => column.GetNumber(r)).ToList();
    }

    /// <summary>The 0/1 response: numbers 0 and 1, or the texts Y and N.</summary>
    public IReadOnlyList<int> Binary(string name)
    {
        var column = _data.Get(name);
        return _rows.Select(r =>
        {
            var text = column.GetText(r);
            return text switch
            {
                "1" or "Y" => 1,
                "0" or "N" => 0,
                _ => throw new DataException(_data.File, _data.LineOfRow[r], name, $"expected 1 or 0 (or Y or N), found '{text}'"),
            };
        }).ToList();
    }

    /// <summary>A class covariate; <paramref name="first"/> (the control) leads when given, else the sorted order.</summary>
    public LinearModelFactor Factor(string option, string name, string? first = null, IReadOnlyList<string>? order = null)
    {
        var column = _data.Get(name);
        var values = _rows.Select(r => column.GetText(r)!).ToList();
        var distinct = values.Distinct(StringComparer.Ordinal).ToList();
        List<string> levels;
        if (order is not null)
        {
            var unknown = distinct.FirstOrDefault(v => !order.Contains(v, StringComparer.Ordinal));
            if (unknown is not null)
            {
                throw new CalcInputException($"{option}: {name} has the value '{unknown}', which the list does not name");
            }
            levels = order.Where(distinct.Contains).ToList();
        }
        else
        {
            levels = column.Kind == VariableKind.Number
                ? distinct.OrderBy(v => double.Parse(v, CultureInfo.InvariantCulture)).ToList()
                : distinct.Order(StringComparer.Ordinal).ToList();
        }
        if (first is not null)
        {
            if (!levels.Contains(first, StringComparer.Ordinal))
            {
                throw new CalcInputException($"--control: {name} has no value '{first}'{Naming.NearestName.Hint(first, levels)}");
            }
            levels.Remove(first);
            levels.Insert(0, first);
        }
        var index = levels.Select((l, i) => (l, i)).ToDictionary(p => p.l, p => p.i, StringComparer.Ordinal);
        return new LinearModelFactor(name, levels, values.Select(v => index[v]).ToList());
    }

    /// <summary>
    /// The visit as a class covariate in time order: numeric values in numeric order; text values in the order first seen
    /// in the file, which <paramref name="notes"/> then says (the order of the covariance matrix matters to the structured
    /// covariances).
    /// </summary>
    public LinearModelFactor VisitFactor(string name, List<string> notes)
    {
        var column = _data.Get(name);
        if (column.Kind == VariableKind.Number)
        {
            return Factor("--visit", name);
        }
        var order = _rows.Select(r => column.GetText(r)!).Distinct(StringComparer.Ordinal).ToList();
        notes.Add($"visits in the order first seen in the file: {string.Join(", ", order)} (--visits sets the order)");
        return Factor("--visit", name, order: order);
    }

    /// <summary>"A,B" into names; empty or absent gives none.</summary>
    public static IReadOnlyList<string> Names(string? list) =>
        string.IsNullOrWhiteSpace(list) ? [] : list.Split(',', StringSplitOptions.TrimEntries | StringSplitOptions.RemoveEmptyEntries);
}
