using GemIndex.Core.Gravity;
using GemIndex.Core.Identification;
using GemIndex.Core.Observations;
using GemIndex.Core.Quantities;
using GemIndex.Core.Readings;

namespace GemIndex.Data.Batch;

/// <summary>
/// Turns batch readings into a Core bench sheet, checking every value through Core's own validation and naming
/// the field of anything out of range ("refractometer.readings[2].high: high edge is 1.54; allowed: …").
/// </summary>
public static class StoneReadingsConverter
{
    /// <summary>Water temperature assumed when a hydrostatic weighing gives none (a room at 20 °C).</summary>
    public const double DefaultWaterCelsius = 20;

    /// <summary>
    /// Standard uncertainty of one weighing in carats: a 0.001 ct balance, with the surface tension on the wire and
    /// air bubbles that a bench weighing in water carries (common practice: SG to ±0.01 on stones over about 1 ct).
    /// </summary>
    public const double WeighingUncertaintyCarats = 0.002;

    /// <summary>Standard uncertainty assumed for an SG given as a plain number (common practice: ±0.01–0.02).</summary>
    public const double DirectSpecificGravityUncertainty = 0.01;

    /// <summary>Converts the readings; throws on the first bad field.</summary>
    /// <exception cref="BatchInputException">A word is unknown or a value out of range (the message names the field).</exception>
    public static BenchSheet ToBenchSheet(StoneReadings r) => new()
    {
        Id = r.Id,
        Refractometer = r.Refractometer is { } rf ? Refractometer(rf) : null,
        SpecificGravity = Field("sg", () => r.Sg is { } sg ? new SpecificGravity(sg, DirectSpecificGravityUncertainty)
            : r.SgWeighing is { } w ? Weighing(w) : (SpecificGravity?)null),
        HeavyLiquids = [.. r.HeavyLiquids.Select((h, i) => Field($"heavy_liquids[{i}]", () => new HeavyLiquidResult(
            new SpecificGravity(h.Density), Word<HeavyLiquidOutcome>($"heavy_liquids[{i}].result", h.Result))))],
        Polariscope = Optional<PolariscopeReaction>("polariscope", r.Polariscope),
        Pleochroism = Optional<PleochroismObservation>("pleochroism", r.Pleochroism),
        Dispersion = r.DispersionIndices is { } d
            ? Field("dispersion", () => DispersionObservation.FromIndices(d.NB, d.NG))
            : r.Dispersion is { } word ? DispersionObservation.ByEye(Word<DispersionStrength>("dispersion", word)) : null,
        ThermalProbe = Optional<ThermalProbeResult>("thermal_probe", r.ThermalProbe),
        Electrical = Optional<ElectricalResult>("electrical", r.Electrical),
        UvLong = Optional<FluorescenceStrength>("uv_long", r.UvLong),
        UvShort = Optional<FluorescenceStrength>("uv_short", r.UvShort),
        AbsorptionLinesNanometres = r.AbsorptionNm is { } lines
            ? [.. lines.Select((l, i) => Field($"absorption_nm[{i}]", () => { QuantityOutOfRangeException.ThrowIfOutside("absorption line", l, 380, 780, "nm"); return l; }))]
            : null,
        Colour = string.IsNullOrWhiteSpace(r.Colour) ? null : r.Colour.Trim(),
    };

    private static RefractometerObservation Refractometer(RefractometerReadings rf)
    {
        var method = Word<RefractometerMethod>("refractometer.method", rf.Method);
        var steps = rf.Readings.Select((s, i) => Field($"refractometer.readings[{i}]", () => new ShadowEdgeStep(s.RotationDeg, s.Low, s.High))).ToList();
        // With no liquid stated, the usual 1.79 is assumed, unless the readings themselves show a denser liquid was used.
        double highest = steps.Select(x => x.High ?? x.Low).Append(rf.Spot ?? 0).Max();
        double liquid = rf.LiquidLimit ?? Math.Max(RefractometerObservation.DefaultLiquidLimit, Math.Min(highest, 2.2));
        return Field("refractometer", () => new RefractometerObservation(method, steps, rf.Spot, rf.OverLimit,
            rf.LightNm ?? RefractometerObservation.SodiumLightNanometres, liquid));
    }

    private static SpecificGravity Weighing(HydrostaticReadings w)
    {
        var air = Field("sg.air_ct", () => Mass.FromCarats(w.AirCt, WeighingUncertaintyCarats));
        var water = Field("sg.water_ct", () => Mass.FromCarats(w.WaterCt, WeighingUncertaintyCarats));
        var temperature = Field("sg.water_c", () => WaterDensity.At(Temperature.FromCelsius(w.WaterC ?? DefaultWaterCelsius)).Temperature);
        return Field("sg.water_ct", () => HydrostaticWeighing.SpecificGravityOf(air, water, temperature));
    }

    private static T? Optional<T>(string field, string? word) where T : struct, Enum =>
        string.IsNullOrWhiteSpace(word) ? null : Word<T>(field, word);

    /// <summary>The enum value named by a batch word ("singly_refractive" → SinglyRefractive).</summary>
    private static T Word<T>(string field, string word) where T : struct, Enum
    {
        string key = word.Trim().Replace("_", "").Replace("-", "").Replace(" ", "");
        foreach (T value in Enum.GetValues<T>())
            if (string.Equals(value.ToString(), key, StringComparison.OrdinalIgnoreCase)) return value;
        throw new BatchInputException(field, $"'{word}' is not one of {string.Join(" | ", Words<T>())}");
    }

    /// <summary>The batch words of an enum: SinglyRefractive → singly_refractive.</summary>
    public static IEnumerable<string> Words<T>() where T : struct, Enum =>
        Enum.GetNames<T>().Select(n => string.Concat(n.Select((c, i) => i > 0 && char.IsUpper(c) ? "_" + char.ToLowerInvariant(c) : char.ToLowerInvariant(c).ToString())));

    private static T Field<T>(string field, Func<T> make)
    {
        try { return make(); }
        catch (QuantityOutOfRangeException e) { throw new BatchInputException(field, e.Message); }
    }
}
