using System.Text.Json;
using System.Text.Json.Serialization;
using System.Text.Json.Serialization.Metadata;

namespace GemIndex.Cli.CommandLine.Calc;

/// <summary>The shapes the <c>calc</c> commands write with <c>--json</c>, source-generated, snake_case, units in the names.</summary>
[JsonSourceGenerationOptions(
    PropertyNamingPolicy = JsonKnownNamingPolicy.SnakeCaseLower,
    WriteIndented = true,
    DefaultIgnoreCondition = JsonIgnoreCondition.WhenWritingNull)]
[JsonSerializable(typeof(CalcSnellCommand.SnellResult))]
[JsonSerializable(typeof(CalcCriticalAngleCommand.CriticalAngleResult))]
[JsonSerializable(typeof(CalcRefractometerCommand.RefractometerResult))]
[JsonSerializable(typeof(CalcReflectanceCommand.ReflectanceResult))]
[JsonSerializable(typeof(CalcBrewsterCommand.BrewsterResult))]
[JsonSerializable(typeof(CalcPrismCommand.PrismResult))]
[JsonSerializable(typeof(CalcDispersionCommand.DispersionResult))]
[JsonSerializable(typeof(CalcDispersionCommand.ConversionResult))]
[JsonSerializable(typeof(CalcIndicatrixCommand.IndicatrixResult))]
[JsonSerializable(typeof(CalcSpecificGravityCommand.SpecificGravityResult))]
[JsonSerializable(typeof(CalcCaratsCommand.CaratsResult))]
internal sealed partial class CalcJson : JsonSerializerContext
{
    public static void Write<T>(TextWriter output, T value) =>
        output.WriteLine(JsonSerializer.Serialize(value, (JsonTypeInfo<T>)Default.GetTypeInfo(typeof(T))!));
}
