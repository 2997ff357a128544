using System.Globalization;
using GemIndex.Core.Bench;
using GemIndex.Core.Quantities;
using GemIndex.Data.Batch;
using GemIndex.Data.Workbook;

namespace GemIndex.Cli.TextUi.Bench;

/// <summary>Turns a stored stone back into the form's texts and choices.</summary>
internal static class StoneFormText
{
    public static string Number(double v) => v.ToString("0.#####", CultureInfo.InvariantCulture);

    /// <summary>
    /// A refractive index as the bench writes it: at least three decimals (a refractometer reads to 0.001, so 1.770 is a
    /// reading of 1.770, not 1.77; common practice), more when stored.
    /// </summary>
    public static string Index(double v) => v.ToString("0.000##", CultureInfo.InvariantCulture);

    /// <summary>A spot reading as the bench writes it: at least two decimals (read to about 0.01; common practice).</summary>
    public static string Spot(double v) => v.ToString("0.00###", CultureInfo.InvariantCulture);

    public static double? TryNumber(string text) => BenchNumber.TryParse(text, out double v, out _) ? v : null;

    public static IEnumerable<KeyValuePair<string, string>> From(StoneSheet s)
    {
        StoneReadings r = s.Readings;
        yield return new(BenchFields.Reference, s.Reference);
        yield return new(BenchFields.Weight, s.WeightCarats is { } w ? Number(w) : "");
        yield return new(BenchFields.Dimensions, s.Dimensions);
        yield return new(BenchFields.Shape, s.Shape);
        yield return new(BenchFields.CuttingStyle, s.CuttingStyle);
        yield return new(BenchFields.Transparency, s.Transparency);
        yield return new(BenchFields.Notes, s.Notes);
        yield return new(BenchFields.Colour, r.Colour ?? "");
        yield return new(BenchFields.Spot, r.Refractometer?.Spot is { } spot ? Spot(spot) : "");
        yield return new(BenchFields.LiquidLimit, r.Refractometer?.LiquidLimit is { } ll ? Index(ll) : "");
        yield return new(BenchFields.LightNm, r.Refractometer?.LightNm is { } nm ? Number(nm) : "");
        yield return new(BenchFields.Precision, r.Refractometer?.Precision is { } precision ? Number(precision) : "");
        yield return new(BenchFields.CalibrationOffset, r.Refractometer?.CalibrationOffset is { } offset ? Number(offset) : "");
        yield return new(BenchFields.Sg, r.Sg is { } sg ? Number(sg) : "");
        yield return new(BenchFields.AirCt, r.SgWeighing?.AirCt is { } a ? Number(a) : "");
        yield return new(BenchFields.WaterCt, r.SgWeighing?.WaterCt is { } b ? Number(b) : "");
        yield return new(BenchFields.WaterC, r.SgWeighing?.WaterC is { } c ? Number(c) : "");
        yield return new(BenchFields.HeavyLiquids, BenchSyntax.HeavyLiquids(r.HeavyLiquids.Select(h => $"{Number(h.Density)} {h.Result}")));
        yield return new(BenchFields.IndexAtB, r.DispersionIndices is { } d ? Index(d.NB) : "");
        yield return new(BenchFields.IndexAtG, r.DispersionIndices is { } g ? Index(g.NG) : "");
        yield return new(BenchFields.Reflectance, r.ReflectancePct is { } reflectance ? Number(reflectance) : "");
        yield return new(BenchFields.Absorption, r.AbsorptionNm is { } lines ? BenchSyntax.Lines(lines.Select(Number)) : "");
        yield return new(BenchFields.FeaturesPresent, BenchSyntax.Features(r.FeaturesPresent));
        yield return new(BenchFields.FeaturesAbsent, BenchSyntax.Features(r.FeaturesAbsent));
    }

    public static IEnumerable<KeyValuePair<string, string>> Choices(StoneReadings r)
    {
        if (r.Refractometer is { OverLimit: true }) yield return new(BenchFields.OverLimit, "yes");
        foreach (var (field, word) in r.ChoiceWords)
            if (word is { Length: > 0 }) yield return new(field, word);
    }
}
