namespace GemIndex.Bench.Independent;

/// <summary>
/// One row of the independent property table: a species' principal values, SG, optic character and sign, and its
/// categorical reactions, with the published sources it was compiled from. Values are as read in the sources named
/// in <see cref="Citation"/>; hue, UV and origin weights are judgements and say so in <see cref="Judgement"/>.
/// </summary>
internal sealed record SpeciesProperties
{
    /// <summary>The species as the sources name it (lower case); <see cref="CatalogueSpeciesNames"/> maps it to the catalogue.</summary>
    public required string Name { get; init; }

    public required PrincipalValues Indices { get; init; }

    public required IndexRange SpecificGravity { get; init; }

    /// <summary>
    /// How SG moves with the indices along the species' composition series: +1 together (garnets, olivine, beryl
    /// with alkalis), −1 opposite (topaz: fluorine lowers the indices and raises SG), 0 independent.
    /// </summary>
    public int SgFollowsIndex { get; init; }

    public StoneForm Form { get; init; } = StoneForm.Crystal;

    public PleochroismHabit Pleochroism { get; init; } = PleochroismHabit.None;

    /// <summary>nG − nB where published.</summary>
    public double? Dispersion { get; init; }

    public bool Opaque { get; init; }

    /// <summary>Porous or organic: not weighed in water (common practice).</summary>
    public bool Porous { get; init; }

    /// <summary>Heat-conduction probe reads positive (diamond, moissanite).</summary>
    public bool ThermalPositive { get; init; }

    /// <summary>Conductivity tester reads conductive.</summary>
    public bool Conductive { get; init; }

    /// <summary>Chance that a singly refractive stone shows anomalous double refraction (strain) in the polariscope.</summary>
    public double Strained { get; init; }

    public IReadOnlyList<Weighted> UvLong { get; init; } = [];

    public IReadOnlyList<Weighted> UvShort { get; init; } = [];

    public IReadOnlyList<AbsorptionHabit> Lines { get; init; } = [];

    public required IReadOnlyList<Weighted> Hues { get; init; }

    /// <summary>Share of natural, synthetic, treated, imitation, composite and cultured stones of the species at a bench.</summary>
    public IReadOnlyList<Weighted> Origins { get; init; } = [new("natural", 1)];

    /// <summary>How often the species reaches a general bench, relative (judgement).</summary>
    public double BenchWeight { get; init; } = 1;

    public required string Citation { get; init; }

    /// <summary>Where the origin shares come from, when a page was read for them (otherwise they are a judgement).</summary>
    public string OriginCitation { get; init; } = "";

    public string Judgement { get; init; } = "hue weights, UV weights and origin shares: judgement";
}
