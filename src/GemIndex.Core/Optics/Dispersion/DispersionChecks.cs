using GemIndex.Core.Quantities;

namespace GemIndex.Core.Optics.Dispersion;

/// <summary>Input checks shared by the dispersion models and fits.</summary>
internal static class DispersionChecks
{
    /// <summary>Rejects an unset (default) wavelength, which holds 0 nm.</summary>
    public static void Wavelength(Wavelength wavelength) =>
        QuantityOutOfRangeException.ThrowIfOutside("wavelength", wavelength.Nanometres,
            Quantities.Wavelength.MinimumNanometres, Quantities.Wavelength.MaximumNanometres, "nm");

    /// <summary>Rejects a model value that is not an index from 1 to 4 at this wavelength.</summary>
    public static double ModelIndex(double index, Wavelength wavelength)
    {
        if (!(index >= RefractiveIndex.Minimum && index <= RefractiveIndex.Maximum))
            throw new QuantityOutOfRangeException("wavelength", wavelength.Nanometres,
                "a wavelength where this dispersion model gives an index from 1 to 4", "nm");
        return index;
    }

    /// <summary>
    /// Refuses a fit with fewer points than parameters, or with a wavelength given twice, and returns the points'
    /// wavelengths (µm) and indices.
    /// </summary>
    public static (double[] Micrometres, double[] Indices) FitPoints(IReadOnlyList<DispersionPoint> points, int parameters, string model)
    {
        ArgumentNullException.ThrowIfNull(points);
        // As many points as parameters is allowed: the curve then passes through each (two indices at B and G give
        // the trade's nG − nB exactly), with no residual left to judge the readings by.
        if (points.Count < parameters)
            throw new QuantityOutOfRangeException($"number of points for a {parameters}-parameter {model} fit", points.Count,
                $"{parameters} or more (the number of parameters)");
        foreach (DispersionPoint p in points)
        {
            Wavelength(p.Wavelength);
            QuantityOutOfRangeException.ThrowIfOutside("refractive index", p.Index, RefractiveIndex.Minimum, RefractiveIndex.Maximum);
        }
        var repeated = points.GroupBy(p => p.Wavelength.Nanometres).FirstOrDefault(g => g.Count() > 1);
        if (repeated is not null)
            throw new ArgumentException(FormattableString.Invariant(
                $"wavelength {repeated.Key} nm is given {repeated.Count()} times; a {model} fit needs distinct wavelengths (average repeated readings first)."),
                nameof(points));
        return (points.Select(p => p.Wavelength.Micrometres).ToArray(), points.Select(p => p.Index).ToArray());
    }
}
