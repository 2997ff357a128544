using GemIndex.Core.Optics.Dispersion;

namespace GemIndex.Core.Tests.Optics.Dispersion;

/// <summary>Published Sellmeier models used as reference materials in the dispersion tests.</summary>
public static class DispersionModels
{
    /// <summary>Fused silica, Malitson (1965), J. Opt. Soc. Am. 55, 1205 (coefficients as given in DOMAIN.md §7).</summary>
    public static SellmeierModel FusedSilica { get; } = new(
        new SellmeierTerm(0.6961663, 0.0684043 * 0.0684043),
        new SellmeierTerm(0.4079426, 0.1162414 * 0.1162414),
        new SellmeierTerm(0.8974794, 9.896161 * 9.896161));

    /// <summary>
    /// Sapphire ordinary ray, Malitson &amp; Dodge (1972), J. Opt. Soc. Am. 62, 1405. Coefficients from memory
    /// (DOMAIN.md §7), not read from the paper.
    /// </summary>
    public static SellmeierModel SapphireOrdinary { get; } = new(
        new SellmeierTerm(1.4313493, 0.0726631 * 0.0726631),
        new SellmeierTerm(0.65054713, 0.1193242 * 0.1193242),
        new SellmeierTerm(5.3414021, 18.028251 * 18.028251));

    /// <summary>Diamond, Peter (1923), Z. Phys. 15, 358. Coefficients from memory (DOMAIN.md §7).</summary>
    public static SellmeierModel Diamond { get; } = new(
        new SellmeierTerm(0.3306, 0.1750 * 0.1750),
        new SellmeierTerm(4.3356, 0.1060 * 0.1060));
}
