using OutputForge.Analysis.StandIns;

namespace OutputForge.Kinds.Responders;

/// <summary>Responder tables: one endpoint record per subject, half of each arm meeting the response definition.</summary>
public sealed class ResponderStandIn : IShellStandIn
{
    public void Add(ShellRecords records)
    {
        var endpoint = records.Table.Endpoint!;
        var response = endpoint.Response ?? "AVALC = 'Y'";
        var responder = EndpointStandIn.Selected(records, endpoint, condition: response, conditionPointer: "/endpoint/response");
        var nonResponder = EndpointStandIn.Selected(records, endpoint, condition: $"not ({response})", conditionPointer: "/endpoint/response");
        foreach (var subject in records.Subjects)
        {
            // A stratified analysis reads its strata from ADSL; two stand-in strata, each with responders
            // and non-responders, make every stratified statistic (homogeneity included) estimable.
            foreach (var stratum in records.Table.Settings<ResponderSettings>().Stratified?.Strata ?? [])
            {
                records.SetIfAbsent(subject, stratum, subject.IndexInArm % 2 == 0 ? "Stratum 1" : "Stratum 2", Expressions.VariableKind.Text);
            }
            records.AddRecord(endpoint.Dataset,
                EndpointStandIn.For(subject, subject.IndexInArm < ShellRecords.SubjectsPerArm / 2 ? responder : nonResponder));
        }
    }
}
