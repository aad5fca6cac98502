using System.Globalization;
using OutputForge.Data;
using OutputForge.Expressions;

namespace OutputForge.Analysis.StandIns;

/// <summary>A column of stand-in records, typed as the dataset reader would type the same text.</summary>
public static class StandInColumn
{
    public static DataColumn Create(string name, VariableKind kind, IReadOnlyList<string?> text)
    {
        var values = text.ToArray();
        if (values.All(v => v is null))
        {
            // Unlike a file's empty column, a stand-in keeps the kind its conditions compare it as.
            return new DataColumn(name, kind, values, kind == VariableKind.Text ? null : values.Select(_ => double.NaN).ToArray());
        }
        return kind switch
        {
            VariableKind.Number when values.All(v => v is null || double.TryParse(v, NumberStyles.Float, CultureInfo.InvariantCulture, out _)) =>
                new DataColumn(name, VariableKind.Number, values,
                    values.Select(v => v is null ? double.NaN : double.Parse(v, NumberStyles.Float, CultureInfo.InvariantCulture)).ToArray()),
            VariableKind.Date when values.All(v => v is null || DateOnly.TryParseExact(v, "yyyy-MM-dd", CultureInfo.InvariantCulture, DateTimeStyles.None, out _)) =>
                new DataColumn(name, VariableKind.Date, values,
                    values.Select(v => v is null ? double.NaN : DateOnly.ParseExact(v, "yyyy-MM-dd", CultureInfo.InvariantCulture).DayNumber).Select(d => (double)d).ToArray()),
            _ => new DataColumn(name, VariableKind.Text, values, null),
        };
    }
}
