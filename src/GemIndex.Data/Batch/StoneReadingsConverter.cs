using System.Globalization;
using GemIndex.Core.Bench;
using GemIndex.Core.Identification;
using GemIndex.Core.Quantities;

namespace GemIndex.Data.Batch;

/// <summary>
/// Stored readings (<see cref="StoneReadings"/>) to Core's <see cref="BenchReadings"/> and back. Numbers are written
/// round-trip ("R"), so nothing is lost on the way; every check is Core's <see cref="BenchReader"/>.
/// </summary>
public static class StoneReadingsConverter
{
    /// <summary>The stored readings as the texts Core reads.</summary>
    public static BenchReadings ToReadings(StoneReadings s)
    {
        var r = new BenchReadings().With(BenchField.Id, s.Id);
        if (s.Refractometer is { } rf)
        {
            r = r.With(BenchField.Method, rf.Method).With(BenchField.LightNm, Number(rf.LightNm)).With(BenchField.LiquidLimit, Number(rf.LiquidLimit))
                .With(BenchField.Spot, Number(rf.Spot)).With(BenchField.OverLimit, rf.OverLimit ? "yes" : null)
                .With(BenchField.Precision, Number(rf.Precision)).With(BenchField.CalibrationOffset, Number(rf.CalibrationOffset));
            foreach (var step in rf.Readings) r = r.WithStep(new EdgeStepText(Number(step.RotationDeg)!, Number(step.Low)!, Number(step.High) ?? ""));
        }
        r = r.With(BenchField.Sg, Number(s.Sg));
        if (s.SgWeighing is { } w) r = r.With(BenchField.AirCt, Number(w.AirCt)).With(BenchField.WaterCt, Number(w.WaterCt)).With(BenchField.WaterC, Number(w.WaterC));
        if (s.HeavyLiquids.Count > 0) r = r.With(BenchField.HeavyLiquids, BenchSyntax.HeavyLiquids(s.HeavyLiquids.Select(h => $"{Number(h.Density)} {h.Result}")));
        if (s.DispersionIndices is { } d) r = r.With(BenchField.IndexAtB, Number(d.NB)).With(BenchField.IndexAtG, Number(d.NG));
        r = r.With(BenchField.Reflectance, Number(s.ReflectancePct));
        r = r.With(BenchField.Polariscope, s.Polariscope).With(BenchField.Pleochroism, s.Pleochroism).With(BenchField.Dispersion, s.Dispersion)
            .With(BenchField.ThermalProbe, s.ThermalProbe).With(BenchField.Electrical, s.Electrical).With(BenchField.UvLong, s.UvLong)
            .With(BenchField.UvShort, s.UvShort).With(BenchField.Colour, s.Colour).With(BenchField.Cut, s.Cut).With(BenchField.Transparency, s.Transparency);
        if (s.AbsorptionNm is { } lines) r = r.With(BenchField.Absorption, BenchSyntax.Lines(lines.Select(l => Number(l)!)));
        if (s.FeaturesPresent.Count > 0) r = r.With(BenchField.FeaturesPresent, BenchSyntax.Features(s.FeaturesPresent));
        if (s.FeaturesAbsent.Count > 0) r = r.With(BenchField.FeaturesAbsent, BenchSyntax.Features(s.FeaturesAbsent));
        return r;
    }

    /// <summary>
    /// Readings as typed into stored readings. Lenient: a number that does not parse is left out (the text UI keeps
    /// it in its draft); strict: it is an error naming the field.
    /// </summary>
    /// <exception cref="BatchInputException">Strict, and a number or a heavy-liquid entry does not parse (every such field named).</exception>
    public static StoneReadings FromReadings(BenchReadings r, bool lenient)
    {
        var errors = new List<BenchFieldError>();
        double? Num(string field, string? text)
        {
            if (text is null) return null;
            if (BenchNumber.TryParse(BenchSyntax.NumberText(field, text), out double v, out string problem)) return v;
            if (!lenient) errors.Add(new BenchFieldError(field, BenchText.Shown(text), "a number", problem));
            return null;
        }
        var steps = new List<EdgeReadingEntry>();
        bool unrotated = r.Steps.All(s => s.Rotation.Trim().Length == 0);
        for (int i = 0; i < r.Steps.Count; i++)
        {
            EdgeStepText s = r.Steps[i];
            string field = BenchField.Step(i);
            double? rotation = unrotated ? i * 180.0 / r.Steps.Count : s.Rotation.Trim().Length == 0 ? 0 : Num(field + ".rotation_deg", s.Rotation);
            double? low = Num(field + ".low", s.Low);
            double? high = s.High.Trim().Length == 0 ? null : Num(field + ".high", s.High);
            if (rotation is { } rot && low is { } lo && (s.High.Trim().Length == 0 || high is not null)) steps.Add(new EdgeReadingEntry(rot, lo, high));
        }
        double? spot = Num(BenchField.Spot, r.Text(BenchField.Spot));
        bool over = r.Text(BenchField.OverLimit)?.Trim().ToLowerInvariant() is "yes" or "true";
        RefractometerReadings? refractometer = steps.Count > 0 || spot is not null || over || r.Text(BenchField.Method) is not null ? new RefractometerReadings
        {
            Method = r.Text(BenchField.Method) ?? (spot is not null && steps.Count == 0 ? "spot" : "facet"),
            LightNm = Num(BenchField.LightNm, r.Text(BenchField.LightNm)),
            LiquidLimit = Num(BenchField.LiquidLimit, r.Text(BenchField.LiquidLimit)),
            Readings = steps,
            Spot = spot,
            OverLimit = over,
            Precision = Num(BenchField.Precision, r.Text(BenchField.Precision)),
            CalibrationOffset = Num(BenchField.CalibrationOffset, r.Text(BenchField.CalibrationOffset)),
        } : null;
        double? air = Num(BenchField.AirCt, r.Text(BenchField.AirCt)), water = Num(BenchField.WaterCt, r.Text(BenchField.WaterCt));
        double? celsius = Num(BenchField.WaterC, r.Text(BenchField.WaterC));
        var liquids = new List<HeavyLiquidReading>();
        foreach (string entry in BenchSyntax.HeavyLiquidEntries(r.Text(BenchField.HeavyLiquids) ?? ""))
            if (BenchSyntax.HeavyLiquid(entry) is { } parts && Num(BenchField.HeavyLiquids, parts.Density) is { } density) liquids.Add(new HeavyLiquidReading(density, parts.Result));
            else if (!lenient && BenchSyntax.HeavyLiquid(entry) is null) errors.Add(new BenchFieldError(BenchField.HeavyLiquids, BenchText.Shown(entry), "DENSITY RESULT", "is not a density and a result."));
        double? nB = Num(BenchField.IndexAtB, r.Text(BenchField.IndexAtB)), nG = Num(BenchField.IndexAtG, r.Text(BenchField.IndexAtG));
        List<double>? lines = null;
        if (r.Text(BenchField.Absorption) is { } text)
        {
            lines = [];
            foreach (string part in BenchSyntax.Lines(text))
                if (Num(BenchField.Absorption, part) is { } nm) lines.Add(nm);
        }
        if (errors.Count > 0) throw new BatchInputException(errors);
        return new StoneReadings
        {
            Id = r.Text(BenchField.Id) ?? "",
            Refractometer = refractometer,
            Sg = Num(BenchField.Sg, r.Text(BenchField.Sg)),
            SgWeighing = air is not null || water is not null || celsius is not null ? new HydrostaticReadings(air, water, celsius) : null,
            HeavyLiquids = liquids,
            Polariscope = r.Text(BenchField.Polariscope),
            Pleochroism = r.Text(BenchField.Pleochroism),
            Dispersion = r.Text(BenchField.Dispersion),
            DispersionIndices = nB is { } b && nG is { } g ? (b, g) : null,
            ThermalProbe = r.Text(BenchField.ThermalProbe),
            Electrical = r.Text(BenchField.Electrical),
            ReflectancePct = Num(BenchField.Reflectance, r.Text(BenchField.Reflectance)),
            UvLong = r.Text(BenchField.UvLong),
            UvShort = r.Text(BenchField.UvShort),
            AbsorptionNm = lines,
            Colour = r.Text(BenchField.Colour),
            Cut = r.Text(BenchField.Cut),
            Transparency = r.Text(BenchField.Transparency),
            FeaturesPresent = [.. BenchSyntax.Features(r.Text(BenchField.FeaturesPresent) ?? "")],
            FeaturesAbsent = [.. BenchSyntax.Features(r.Text(BenchField.FeaturesAbsent) ?? "")],
        };
    }

    /// <summary>Reads stored readings into a Core bench sheet.</summary>
    /// <exception cref="BatchInputException">Some fields cannot be used (every one named).</exception>
    public static BenchSheet ToBenchSheet(StoneReadings r)
    {
        BenchReading reading = BenchReader.Read(ToReadings(r));
        return reading.Errors.Count == 0 ? reading.Sheet : throw new BatchInputException(reading.Errors);
    }

    private static string? Number(double? v) => v?.ToString("R", CultureInfo.InvariantCulture);
}
