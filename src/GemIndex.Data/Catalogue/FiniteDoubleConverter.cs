using System.Text;
using System.Text.Json;
using System.Text.Json.Serialization;

namespace GemIndex.Data.Catalogue;

/// <summary>Numbers only, finite only: 1e400 would otherwise read as Infinity without error (STACK.md §9).</summary>
internal sealed class FiniteDoubleConverter : JsonConverter<double>
{
    public override double Read(ref Utf8JsonReader reader, Type typeToConvert, JsonSerializerOptions options)
    {
        if (reader.TokenType != JsonTokenType.Number)
            throw new JsonException($"expected a number, found {reader.TokenType}");
        if (!reader.TryGetDouble(out double d) || !double.IsFinite(d))
            throw new JsonException($"number out of range: {Encoding.UTF8.GetString(reader.ValueSpan)}");
        return d;
    }

    public override void Write(Utf8JsonWriter writer, double value, JsonSerializerOptions options)
    {
        if (!double.IsFinite(value)) throw new JsonException($"cannot write {value} as JSON");
        writer.WriteNumberValue(value);
    }
}
