using System.Text.Json;
using System.Text.Json.Serialization;

namespace OutputForge.Spec;

/// <summary>Reads a spec's "any-arm", "total" or arm value as an <see cref="ArmChoice"/>, once, when the spec loads.</summary>
internal sealed class ArmChoiceJsonConverter : JsonConverter<ArmChoice>
{
    public override ArmChoice Read(ref Utf8JsonReader reader, Type typeToConvert, JsonSerializerOptions options) =>
        reader.TokenType == JsonTokenType.String
            ? ArmChoice.Parse(reader.GetString()!)
            : throw new JsonException("expected \"any-arm\", \"total\" or an arm's value in the data");

    public override void Write(Utf8JsonWriter writer, ArmChoice value, JsonSerializerOptions options) => writer.WriteStringValue(value.Text);
}
