using GemIndex.Core.Quantities;
using GemIndex.Data.Batch;

namespace GemIndex.Cli.TextUi.Bench;

/// <summary>Reads the form's texts into batch readings; a number that does not parse is reported at its field and left out.</summary>
internal sealed class FormReader(BenchSnapshot form, Dictionary<string, string> errors)
{
    public StoneReadings Read() => new()
    {
        Id = form.Text(BenchFields.Reference).Trim(),
        Refractometer = Refractometer(),
        Sg = Number(BenchFields.Sg),
        SgWeighing = Weighing() is { } weighing && string.IsNullOrWhiteSpace(form.Text(BenchFields.Sg)) ? weighing : null,
        HeavyLiquids = HeavyLiquids(),
        Polariscope = form.Choice(BenchFields.Polariscope),
        Pleochroism = form.Choice(BenchFields.Pleochroism),
        Dispersion = form.Choice(BenchFields.Dispersion),
        DispersionIndices = Number(BenchFields.IndexAtB) is { } nB && Number(BenchFields.IndexAtG) is { } nG ? (nB, nG) : null,
        ThermalProbe = form.Choice(BenchFields.ThermalProbe),
        Electrical = form.Choice(BenchFields.Electrical),
        UvLong = form.Choice(BenchFields.UvLong),
        UvShort = form.Choice(BenchFields.UvShort),
        AbsorptionNm = Absorption(),
        Colour = string.IsNullOrWhiteSpace(form.Text(BenchFields.Colour)) ? null : form.Text(BenchFields.Colour).Trim(),
    };

    private double? Number(string field) => BenchAssessor.Number(form, field, errors);

    private RefractometerReadings? Refractometer()
    {
        var steps = new List<EdgeReadingEntry>();
        for (int i = 0; i < form.Steps.Count; i++)
            if (Step(i, form.Steps[i]) is { } step) steps.Add(step);
        double? spot = Number(BenchFields.Spot);
        bool over = form.Choice(BenchFields.OverLimit) == "yes";
        var rf = new RefractometerReadings
        {
            Method = spot is not null && steps.Count == 0 ? "spot" : "facet",
            LightNm = Number(BenchFields.LightNm),
            // The form shows "default 1.79": an edge typed above it is flagged at its step, not taken as a denser liquid.
            LiquidLimit = Number(BenchFields.LiquidLimit) ?? GemIndex.Core.Identification.RefractometerObservation.DefaultLiquidLimit,
            Readings = steps,
            Spot = spot,
            OverLimit = over,
        };
        return steps.Count == 0 && spot is null && !over ? null : rf;
    }

    private EdgeReadingEntry? Step(int index, StepText s)
    {
        string key = BenchFields.Step(index);
        if (!BenchNumber.TryParse(s.Rotation, out double rotation, out string e1)) { errors[key] = "rotation: " + e1; return null; }
        if (!BenchNumber.TryParse(s.Low, out double low, out string e2)) { errors[key] = "low: " + e2; return null; }
        if (string.IsNullOrWhiteSpace(s.High)) return new EdgeReadingEntry(rotation, low, null);
        if (!BenchNumber.TryParse(s.High, out double high, out string e3)) { errors[key] = "high: " + e3; return null; }
        return new EdgeReadingEntry(rotation, low, high);
    }

    private HydrostaticReadings? Weighing()
    {
        double? air = Number(BenchFields.AirCt), water = Number(BenchFields.WaterCt), celsius = Number(BenchFields.WaterC);
        return air is { } a && water is { } w ? new HydrostaticReadings(a, w, celsius) : null;
    }

    /// <summary>"3.32 floats; 2.89 sinks": entries split by semicolons, each a density and floats | sinks | suspends.</summary>
    private List<HeavyLiquidReading> HeavyLiquids()
    {
        var list = new List<HeavyLiquidReading>();
        foreach (string entry in form.Text(BenchFields.HeavyLiquids).Split(';', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries))
        {
            string[] parts = entry.Split(' ', StringSplitOptions.RemoveEmptyEntries);
            if (parts.Length != 2) { errors[BenchFields.HeavyLiquids] = $"'{entry}': write a density and floats | sinks | suspends, e.g. 3.32 floats"; return []; }
            if (!BenchNumber.TryParse(parts[0], out double density, out string error)) { errors[BenchFields.HeavyLiquids] = error; return []; }
            list.Add(new HeavyLiquidReading(density, parts[1]));
        }
        return list;
    }

    /// <summary>Absorption lines in nm separated by spaces or semicolons; "none" = looked and saw none.</summary>
    private List<double>? Absorption()
    {
        string text = form.Text(BenchFields.Absorption).Trim();
        if (text.Length == 0) return null;
        if (text.Equals("none", StringComparison.OrdinalIgnoreCase)) return [];
        var lines = new List<double>();
        foreach (string part in text.Split([' ', ';'], StringSplitOptions.RemoveEmptyEntries))
        {
            if (!BenchNumber.TryParse(part, out double nm, out string error)) { errors[BenchFields.Absorption] = error; return null; }
            lines.Add(nm);
        }
        return lines;
    }
}
