namespace GemIndex.Bench.Independent;

/// <summary>
/// A method of growth whose stones read differently from the species' row of the property table: the published figures of
/// that method. A stone of the method keeps where its values fell within (or beyond) the species' ranges, mapped onto the
/// method's ranges, so the other draws of a seed are unchanged.
/// </summary>
internal sealed record MethodProperties
{
    public required string Species { get; init; }

    public required string Method { get; init; }

    /// <summary>The method's range of the index the species' row draws (n for an isotropic species).</summary>
    public required IndexRange Index { get; init; }

    public required IndexRange SpecificGravity { get; init; }

    public required string Citation { get; init; }

    /// <summary>The rows: only methods with published figures that differ from the species' own.</summary>
    public static readonly MethodProperties[] All =
    [
        new()
        {
            Species = "spinel", Method = "flame fusion",
            Index = new(1.725, 1.735), SpecificGravity = new(3.62, 3.66),
            Citation = "blog.legendartbeads.com 'Synthetic spinel' (2013): a slightly higher refractive index (about 1.73) than natural spinel, "
                       + "density about 3.64, from the excess alumina of the flame-fusion boule; gemstones-guide.com 'Synthetic spinel': 2.5 Al2O3 to 1 MgO. "
                       + "Ranges: ±0.005 and ±0.02 about the published figures, judgement",
        },
        new()
        {
            // The species' row spans natural rutile's niobium- and tantalum-rich stones (SG up to 5.6); the boule is TiO2.
            Species = "rutile", Method = "flame fusion",
            Index = new(2.61, 2.62), SpecificGravity = new(4.23, 4.28),
            Citation = "1-cultured-diamonds.com 'Synthetic rutile': relative density 4.25, refractive index 2.62–2.90, birefringence 0.287; gemdat.awj.mine.nu "
                       + "'Rutile' (Henn and Milisenda, Gemmological Tables 2004): synthetic rutile SG 4.26, RI 2.616–2.903. Ranges: the index as the species' row "
                       + "(over the limit at a bench), SG ±0.02 about the two figures read, judgement",
        },
    ];

    /// <summary>The row for a stone of this species made by this method, if its figures differ from the species'.</summary>
    public static MethodProperties? For(string species, string? method) =>
        method is null ? null : All.FirstOrDefault(m => m.Species == species && m.Method == method);

    /// <summary>
    /// The principal values and SG of a stone of the method: each value moved from the species' range onto the method's by
    /// the same linear map (so a stone drawn beyond the species' range lies as far beyond the method's, in proportion).
    /// </summary>
    public ((double X, double Y, double Z) Principal, double SpecificGravity) Apply(SpeciesProperties species, (double X, double Y, double Z) principal, double sg)
    {
        var from = species.Indices.Drawn;
        double drawn = Map(principal.X, from, Index);
        double shift = drawn - principal.X;
        return ((drawn, principal.Y + shift, principal.Z + shift), Map(sg, species.SpecificGravity, SpecificGravity));
    }

    private static double Map(double value, IndexRange from, IndexRange to) =>
        from.Width > 0 ? to.Low + (value - from.Low) / from.Width * to.Width : to.Low + to.Width / 2 + (value - from.Low);
}
