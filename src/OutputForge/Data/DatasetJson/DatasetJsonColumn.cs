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
    public string? DataType { get; set; }
    public string? TargetDataType { get; set; }
    public int? Length { get; set; }
    public string? DisplayFormat { get; set; }
    public int? KeySequence { get; set; }

    public bool IsNumber => DataType is "integer" or "float" or "double" or "decimal";
}
