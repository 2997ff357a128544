using System.Collections.Immutable;
using GemIndex.Core.Identification;

namespace GemIndex.Core.Bench;

/// <summary>
/// One stone's readings as given, before any check: every value is the text a person typed or a file held, keyed by
/// its <see cref="BenchField"/> name, and the rotation steps in order. Every front end (batch line, command-line
/// options, text UI form, workbook) fills this one type; <see cref="BenchReader"/> reads it. A field that is absent
/// was not observed; a field present with blank text is an error (an empty word is not "not given").
/// </summary>
public sealed record BenchReadings
{
    /// <summary>The values by field name.</summary>
    public ImmutableSortedDictionary<string, string> Values { get; init; } = ImmutableSortedDictionary.Create<string, string>(StringComparer.Ordinal);

    /// <summary>The rotation steps in the order read.</summary>
    public ImmutableList<EdgeStepText> Steps { get; init; } = [];

    /// <summary>The text of a field, or null when it was not given.</summary>
    public string? Text(string field) => Values.TryGetValue(field, out string? text) ? text : null;

    /// <summary>These readings with one more field (null leaves it out).</summary>
    public BenchReadings With(string field, string? text) => text is null ? this : this with { Values = Values.SetItem(field, text) };

    /// <summary>These readings with one more rotation step.</summary>
    public BenchReadings WithStep(EdgeStepText step) => this with { Steps = Steps.Add(step) };

    /// <summary>
    /// These readings without the fields and steps <paramref name="refused"/> names (<see cref="BenchReader"/>'s errors):
    /// what a ranking that goes on despite errors used, so that what is kept of a stone is what its answer was worked out on.
    /// </summary>
    public BenchReadings WithoutRefused(IEnumerable<BenchFieldError> refused)
    {
        var fields = refused.Select(e => e.Field).ToHashSet(StringComparer.Ordinal);
        if (fields.Count == 0) return this;
        bool StepRefused(int i) => fields.Contains(BenchField.Step(i)) || fields.Any(f => f.StartsWith(BenchField.Step(i) + ".", StringComparison.Ordinal));
        return this with
        {
            Values = Values.RemoveRange(fields),
            Steps = [.. Steps.Where((_, i) => !StepRefused(i))],
        };
    }

    /// <summary>
    /// These readings as <paramref name="reading"/> (their reading by <see cref="BenchReader"/>) used them: without the
    /// refused fields and steps, without every field of a test the reader left out whole (an SG typed beside weights
    /// drops both; "over the limit" beside a high edge drops the refractometer; fire by eye beside measured indices drops
    /// the dispersion), and with only the heavy-liquid entries it took. What is kept of a stone is then what its answer
    /// was worked out on: ranked again, it gives the same answer.
    /// </summary>
    public BenchReadings AsUsedBy(BenchReading reading)
    {
        BenchReadings kept = WithoutRefused(reading.Errors);
        BenchSheet s = reading.Sheet;
        var drop = new List<string>();
        void DropUnless(bool used, params string[] fields) { if (!used) drop.AddRange(fields); }
        DropUnless(s.Refractometer is not null, BenchField.Method, BenchField.Spot, BenchField.OverLimit, BenchField.LiquidLimit,
            BenchField.LightNm, BenchField.Precision, BenchField.CalibrationOffset);
        DropUnless(s.SpecificGravity is not null, BenchField.Sg, BenchField.AirCt, BenchField.WaterCt, BenchField.WaterC);
        DropUnless(s.Polariscope is not null, BenchField.Polariscope);
        DropUnless(s.Pleochroism is not null, BenchField.Pleochroism);
        DropUnless(s.Dispersion is not null, BenchField.Dispersion, BenchField.IndexAtB, BenchField.IndexAtG);
        DropUnless(s.ThermalProbe is not null, BenchField.ThermalProbe);
        DropUnless(s.Electrical is not null, BenchField.Electrical);
        DropUnless(s.Reflectance is not null, BenchField.Reflectance);
        DropUnless(s.UvLong is not null, BenchField.UvLong);
        DropUnless(s.UvShort is not null, BenchField.UvShort);
        DropUnless(s.AbsorptionLinesNanometres is not null, BenchField.Absorption);
        DropUnless(s.Colour is not null, BenchField.Colour);
        DropUnless(s.Cut is not null, BenchField.Cut);
        DropUnless(s.Transparency is not null, BenchField.Transparency);
        DropUnless(s.Magnification is not null, BenchField.FeaturesPresent, BenchField.FeaturesAbsent);
        var values = kept.Values.RemoveRange(drop);
        // A bad heavy-liquid entry beside good ones drops only itself: each entry kept as typed if it reads alone.
        if (Text(BenchField.HeavyLiquids) is { } liquids)
        {
            var taken = BenchSyntax.HeavyLiquidEntries(liquids)
                .Where(e => BenchReader.Read(new BenchReadings().With(BenchField.HeavyLiquids, e)).Errors.Count == 0).ToList();
            values = s.HeavyLiquids.Count == 0 || taken.Count == 0 ? values.Remove(BenchField.HeavyLiquids)
                : values.SetItem(BenchField.HeavyLiquids, BenchSyntax.HeavyLiquids(taken));
        }
        return kept with { Values = values, Steps = s.Refractometer is null ? [] : kept.Steps };
    }

    /// <summary>Equal when every field and step is equal.</summary>
    public bool Equals(BenchReadings? other) =>
        other is not null && Values.Count == other.Values.Count && Values.All(p => other.Text(p.Key) == p.Value) && Steps.SequenceEqual(other.Steps);

    /// <inheritdoc />
    public override int GetHashCode() => HashCode.Combine(Values.Count, Steps.Count);
}
