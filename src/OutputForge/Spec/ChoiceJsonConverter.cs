using System.Text.Json;
using System.Text.Json.Serialization;
using OutputForge.Choices;

namespace OutputForge.Spec;

/// <summary>
/// Reads (and writes) an option's name as its typed value through <see cref="MethodCatalog"/>, so that a spec's choices
/// are parsed once, when it loads, and analyses compare enum values. The schema (generated from the same catalogue)
/// has already refused an unknown name with its location; the error here guards a model read without the schema.
/// </summary>
internal sealed class ChoiceJsonConverterFactory : JsonConverterFactory
{
    public override bool CanConvert(Type typeToConvert) => MethodCatalog.ForType(typeToConvert) is not null;

    public override JsonConverter CreateConverter(Type typeToConvert, JsonSerializerOptions options) =>
        (JsonConverter)Activator.CreateInstance(typeof(ChoiceConverter<>).MakeGenericType(typeToConvert),
            MethodCatalog.ForType(typeToConvert))!;

    private sealed class ChoiceConverter<T>(IOptionSet set) : JsonConverter<T> where T : struct, Enum
    {
        private readonly OptionSet<T> _set = (OptionSet<T>)set;

        public override T Read(ref Utf8JsonReader reader, Type typeToConvert, JsonSerializerOptions options)
        {
            var name = reader.TokenType == JsonTokenType.String ? reader.GetString()! : throw new JsonException($"expected one of the names of {_set.Key}");
            return _set.TryParse(name, out var value)
                ? value
                : throw new JsonException($"'{name}' is not a choice of {_set.Key}{_set.Hint(name)}");
        }

        public override void Write(Utf8JsonWriter writer, T value, JsonSerializerOptions options) =>
            writer.WriteStringValue(_set.NameOf(value));
    }
}
