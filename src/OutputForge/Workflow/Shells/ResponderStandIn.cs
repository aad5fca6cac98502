namespace OutputForge.Workflow.Shells;

/// <summary>Responder tables: one endpoint record per subject, half of each arm meeting the response definition.</summary>
public sealed class ResponderStandIn : IShellStandIn
{
    public string Kind => "responders";

    public void Add(ShellRecords records)
    {
        var endpoint = records.Table.Endpoint!;
        var response = endpoint.Response ?? "AVALC = 'Y'";
        var responder = EndpointStandIn.Selected(records, endpoint, condition: response, conditionPointer: "/endpoint/response");
        var nonResponder = EndpointStandIn.Selected(records, endpoint, condition: $"not ({response})", conditionPointer: "/endpoint/response");
        foreach (var subject in records.Subjects)
        {
            records.AddRecord(endpoint.Dataset,
                EndpointStandIn.For(subject, subject.IndexInArm < ShellData.SubjectsPerArm / 2 ? responder : nonResponder));
        }
    }
}
