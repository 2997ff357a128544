namespace GemIndex.Bench.Independent;

/// <summary>
/// The benchmark's own model of the doubling of facet edges (docs/benchmark.md, "Magnification"), from the stone's true
/// principal values, not from the engine's ramp over the birefringence. Of the stones looked at, a share is also looked
/// at for doubling. The examiner turns the stone and looks through it in three random directions; in a direction at θ
/// from the optic axis the two images of a back facet edge lie about t·B·sin²θ/n apart (t the stone's depth, B the
/// birefringence, n the mean index; the biaxial case taken alike), and they are parted when that separation passes the
/// instrument's resolution, with a soft edge. A singly refractive, aggregate or opaque stone shows none but by a slip.
/// Every number is a judgement of the benchmark (the resolutions: a 10x loupe about 0.03 mm, a microscope at 20–40x
/// about half; depths of cut stones 2–8 mm).
/// </summary>
internal static class DoublingSighting
{
    public const string Word = "doubling";

    /// <summary>Of the stones looked at under magnification, the share also looked at for doubling (judgement).</summary>
    public const double LookShare = 0.4;

    public const double LoupeResolutionMillimetres = 0.03, MicroscopeResolutionMillimetres = 0.015;

    public const double ShallowestMillimetres = 2, DeepestMillimetres = 8, MostLikelySighting = 0.97, Slip = 0.01;

    /// <summary>
    /// Whether doubling is looked for, and if so whether it is written as seen; the same count of draws whatever the
    /// outcome, from the stream given (its own, so that the benchmark's other draws stay as they were).
    /// </summary>
    public static bool? Look(Random random, SpeciesProperties species, (double X, double Y, double Z) principal, bool microscope, bool opaque)
    {
        bool looked = random.NextDouble() < LookShare;
        double depth = ShallowestMillimetres + (DeepestMillimetres - ShallowestMillimetres) * random.NextDouble();
        double bestSine2 = 0;
        for (int i = 0; i < 3; i++)
        {
            double cosine = 2 * random.NextDouble() - 1;   // a direction uniform over the sphere
            bestSine2 = Math.Max(bestSine2, 1 - cosine * cosine);
        }
        double u = random.NextDouble(), slip = random.NextDouble();
        if (!looked) return null;
        if (opaque || species.Form != StoneForm.Crystal || species.Indices.Model == OpticModel.Isotropic) return slip < Slip;
        double lowest = Math.Min(principal.X, Math.Min(principal.Y, principal.Z));
        double highest = Math.Max(principal.X, Math.Max(principal.Y, principal.Z));
        double mean = (principal.X + principal.Y + principal.Z) / 3;
        double separation = depth * (highest - lowest) * bestSine2 / mean;
        double resolution = microscope ? MicroscopeResolutionMillimetres : LoupeResolutionMillimetres;
        double p = MostLikelySighting / (1 + Math.Exp(-(separation - resolution) / (0.25 * resolution)));
        return u < p || slip < Slip;
    }
}
