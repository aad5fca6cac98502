namespace OutputForge.Spec;

/// <summary>What a table id may be beyond the schema's pattern.</summary>
public static class TableIds
{
    /// <summary>
    /// The longest table id: table numbers are short ("14.2.1.1"); 64 characters keep every file named after the id
    /// ("shell-" + id + "-forest.png") far inside the 255 a file name may hold, with room for the folder's path.
    /// </summary>
    public const int MaxLength = 64;
}
