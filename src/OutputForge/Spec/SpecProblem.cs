namespace OutputForge.Spec;

/// <summary>One problem found in a spec file, located by line, column and JSON path.</summary>
public sealed record SpecProblem(string File, int? Line, int? Column, string JsonPath, string Message, bool IsWarning = false)
{
    public override string ToString()
    {
        var where = File;
        if (Line is not null)
        {
            where += $":{Line}";
            if (Column is not null)
            {
                where += $":{Column}";
            }
        }
        return $"{where}: {JsonPath}: {Message}";
    }
}
