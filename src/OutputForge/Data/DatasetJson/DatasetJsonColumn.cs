namespace OutputForge.Data.DatasetJson;

/// <summary>
/// One entry of a Dataset-JSON 1.1 file's <c>columns</c> (CDISC Dataset-JSON 1.1 specification): the variable's
/// name, label, data type (string, integer, float, double, decimal, boolean, date, datetime, time, URI), length,
/// display format and key sequence, as the file gives them.
/// </summary>
public sealed class DatasetJsonColumn
{
    /// <summary>The data types of Dataset-JSON 1.1.</summary>
    public static readonly IReadOnlyList<string> DataTypes = ["string", "integer", "float", "double", "decimal", "boolean", "date", "datetime", "time", "URI"];

    public string? ItemOid { get; set; }
    public string? Name { get; set; }
    public string? Label { get; set; }
    public string? DataType
    {
        get => _dataType;
        set
        {
            _dataType = value;
            Type = value switch
            {
                "integer" => ColumnType.Integer,
                "float" or "double" => ColumnType.Float,
                "decimal" => ColumnType.Decimal,
                "boolean" => ColumnType.Boolean,
                "date" => ColumnType.Date,
                _ => ColumnType.Text,
            };
        }
    }

    private string? _dataType;

    /// <summary>How the reader treats the column's values (decided once, not per value).</summary>
    internal ColumnType Type { get; private set; } = ColumnType.Text;
    public string? TargetDataType { get; set; }
    public int? Length { get; set; }
    public string? DisplayFormat { get; set; }
    public int? KeySequence { get; set; }

    public bool IsNumber => Type is ColumnType.Integer or ColumnType.Float or ColumnType.Decimal;
}

/// <summary>The reader's groups of Dataset-JSON data types.</summary>
internal enum ColumnType { Text, Integer, Float, Decimal, Boolean, Date }
