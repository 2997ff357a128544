using GemIndex.Core.Magnification;
using GemIndex.Core.Observations;
using GemIndex.Core.Optics.Indicatrix;

namespace GemIndex.Core.Catalogue;

/// <summary>
/// One catalogue entry: a gem material (species and variety, or a man-made material) with the ranges and
/// usual reactions the bench tests can observe, how often it reaches a bench, and the source of each value.
/// Indices are at 589.3 nm. Immutable; checked as a whole by the catalogue check.
/// </summary>
public sealed record Material
{
    /// <summary>A unique display name within the catalogue ("ruby", "flame-fusion synthetic ruby").</summary>
    public required string Name { get; init; }

    /// <summary>Lower-case mineral species, or the trade's plain name for a man-made or non-mineral material.</summary>
    public required string Species { get; init; }

    /// <summary>Variety or trade name ("ruby", "hessonite"); may equal the species.</summary>
    public required string Variety { get; init; }

    /// <summary>The family file this entry came from ("corundum", "glass-and-plastics").</summary>
    public string Family { get; init; } = "";

    /// <summary>Natural, synthetic, imitation, treated, composite or cultured.</summary>
    public required OriginClass Origin { get; init; }

    /// <summary>Crystal system, or amorphous.</summary>
    public required CrystalSystem CrystalSystem { get; init; }

    /// <summary>Principal index ranges at 589.3 nm, which also fix the optic character.</summary>
    public required OpticalIndices Indices { get; init; }

    /// <summary>Optic sign (None for single-index characters).</summary>
    public OpticSign Sign { get; init; } = OpticSign.None;

    /// <summary>Birefringence range; null for single-index characters.</summary>
    public PropertyRange? Birefringence { get; init; }

    /// <summary>Specific gravity range.</summary>
    public required PropertyRange SpecificGravity { get; init; }

    /// <summary>
    /// The part of <see cref="SpecificGravity"/> where most stones lie, where a source says so ("usually about 2.15"); the
    /// rest of the range holds the rare extremes. Null: the whole range alike.
    /// </summary>
    public PropertyRange? SpecificGravityUsual { get; init; }

    /// <summary>Dispersion nG − nB (430.8 nm and 686.7 nm), where known.</summary>
    public double? Dispersion { get; init; }

    /// <summary>Mohs hardness range, where known.</summary>
    public PropertyRange? Hardness { get; init; }

    /// <summary>Usual strength of pleochroism in coloured stones.</summary>
    public PleochroismStrength Pleochroism { get; init; } = PleochroismStrength.None;

    /// <summary>The polariscope reactions this material usually shows (one or more).</summary>
    public IReadOnlyList<PolariscopeReaction> Polariscope { get; init; } = [];

    /// <summary>What a heat-conduction probe usually reads.</summary>
    public ThermalProbeResult ThermalProbe { get; init; } = ThermalProbeResult.Negative;

    /// <summary>What a conductivity tester usually reads.</summary>
    public ElectricalResult Electrical { get; init; } = ElectricalResult.Insulating;

    /// <summary>Usual long-wave (365 nm) fluorescence strengths; empty when not known.</summary>
    public IReadOnlyList<FluorescenceStrength> UvLong { get; init; } = [];

    /// <summary>Usual short-wave (254 nm) fluorescence strengths; empty when not known.</summary>
    public IReadOnlyList<FluorescenceStrength> UvShort { get; init; } = [];

    /// <summary>Diagnostic absorption lines or band centres seen in a hand spectroscope, with how plainly each shows.</summary>
    public IReadOnlyList<AbsorptionLine> AbsorptionLines { get; init; } = [];

    /// <summary>The wavelengths of <see cref="AbsorptionLines"/>, nm.</summary>
    public IReadOnlyList<double> AbsorptionLinesNanometres => [.. AbsorptionLines.Select(l => l.Nanometres)];

    /// <summary>Usual colours, plain lower-case words.</summary>
    public IReadOnlyList<string> Colours { get; init; } = [];

    /// <summary>
    /// How common this variety or origin is among stones of its species (its share of the species' prior: the
    /// variety's "share" in the family file).
    /// </summary>
    public BenchFrequency Frequency { get; init; } = BenchFrequency.Occasional;

    /// <summary>How often the species reaches a bench: the prior sits on the species and is split among its entries by <see cref="Frequency"/>.</summary>
    public BenchFrequency SpeciesFrequency { get; init; } = BenchFrequency.Occasional;

    /// <summary>The forms it is met in (single crystal, aggregate, amorphous).</summary>
    public MaterialForm Forms { get; init; } = MaterialForm.Crystal;

    /// <summary>Opaque: no light passes, so polariscope and dichroscope cannot be used.</summary>
    public bool IsOpaque { get; init; }

    /// <summary>Porous, fragile or treated with something that immersion would harm: do not weigh in water.</summary>
    public bool DoNotImmerse { get; init; }

    /// <summary>Short notes for the bench user.</summary>
    public string Notes { get; init; } = "";

    /// <summary>
    /// A rule that restricts trade in the material (a CITES listing, or national rules), or null: shown as a caution
    /// whenever the material is a serious candidate, never weighed as evidence.
    /// </summary>
    public TradeRule? TradeRule { get; init; }

    /// <summary>
    /// The mineral group the species belongs to ("tourmaline", "garnet", "feldspar"), or null: species of one group
    /// that the bench tests leave open are named together in the answer, never weighed as evidence.
    /// </summary>
    public string? MineralGroup { get; init; }

    /// <summary>
    /// The trade defines the entry's name by its colour (emerald, aquamarine, ruby, a sapphire named by its colour), so a
    /// stone of another colour is not it: its colour test takes none of its species' other colours (docs/ranking.md §2).
    /// </summary>
    public bool NamedByColour { get; init; }

    /// <summary>
    /// The specific refractivity (n − 1)/ρ the material keeps (<see cref="Optics.GladstoneDale"/>), or null: when set, an
    /// index read on the stone bounds the SG it may have, and the SG is weighed within those bounds (man-made glass,
    /// whose catch-all entry spans indices 1.46–1.93 and SG 2.2–6.05 but never a light glass of high index).
    /// </summary>
    public PropertyRange? SpecificRefractivity { get; init; }

    /// <summary>
    /// The source of each value, by field name as the family files spell it ("omega", "sg", "uv_long"); a field
    /// missing here has no source. Keys are <see cref="CatalogueFields"/> names.
    /// </summary>
    public IReadOnlyDictionary<string, ValueSource> Sources { get; init; } = new Dictionary<string, ValueSource>();

    /// <summary>
    /// The fields this entry states itself instead of inheriting them from its species (a variety's own colours, a
    /// synthetic's narrower range); empty for an entry that inherits everything or stands alone.
    /// </summary>
    public IReadOnlyList<string> StatedFields { get; init; } = [];

    /// <summary>True for an entry from the user's own catalogue rather than the shipped one.</summary>
    public bool IsUserEntry { get; init; }

    /// <summary>
    /// How likely the entry is to hold each magnification feature (reference-db/magnification.json, attached when the
    /// catalogue loads); null: the defaults of its origin (<see cref="MagnificationProfile.ForOrigin"/>).
    /// </summary>
    public MagnificationProfile? Magnification { get; init; }

    /// <summary>
    /// The entry's magnification profile: its own, or its origin's defaults, with the doubling of facet edges its
    /// birefringence gives (<see cref="Magnification.FacetDoubling"/>).
    /// </summary>
    public MagnificationProfile MagnificationProfile =>
        (Magnification ?? MagnificationProfile.ForOrigin(Origin)).With(MagnificationFeature.FacetDoubling, FacetDoubling.Held(this));

    /// <summary>Optic character, from the indices.</summary>
    public OpticCharacter OpticCharacter => Indices.Character;
}
