namespace OutputForge.Demo;

/// <summary>Raised when the demonstration study cannot be generated as asked (bad size, unwritable folder).</summary>
public sealed class DemoStudyException : Exception
{
    public DemoStudyException(string message) : base(message) { }

    public DemoStudyException(string message, Exception inner) : base(message, inner) { }
}
