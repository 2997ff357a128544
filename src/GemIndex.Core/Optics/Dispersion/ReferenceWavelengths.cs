using GemIndex.Core.Quantities;

namespace GemIndex.Core.Optics.Dispersion;

/// <summary>
/// Named wavelengths at which indices are quoted: the Fraunhofer lines the trade and optics use. ISO 7944 names d, F
/// and C as reference wavelengths (with the Abbe number Vd built on them); the trade quotes dispersion as nG − nB and
/// reads indices in sodium light (D). Values in nm, vacuum, as given in DOMAIN.md §4.
/// </summary>
public static class ReferenceWavelengths
{
    /// <summary>Fraunhofer B, 686.7 nm (atmospheric oxygen band): the red end of the trade's nG − nB.</summary>
    public static readonly Wavelength B = Wavelength.FromNanometres(686.7);

    /// <summary>Fraunhofer C, 656.27 nm (hydrogen alpha): ISO 7944 reference, red end of Vd.</summary>
    public static readonly Wavelength C = Wavelength.FromNanometres(656.27);

    /// <summary>Fraunhofer D, 589.3 nm (sodium, mean of the D1/D2 doublet): the wavelength refractometers are read in.</summary>
    public static readonly Wavelength D = Wavelength.FromNanometres(589.3);

    /// <summary>Fraunhofer d, 587.56 nm (helium yellow): ISO 7944 reference for nd and Vd.</summary>
    public static readonly Wavelength SmallD = Wavelength.FromNanometres(587.56);

    /// <summary>Fraunhofer e, 546.07 nm (mercury green).</summary>
    public static readonly Wavelength E = Wavelength.FromNanometres(546.07);

    /// <summary>Fraunhofer F, 486.13 nm (hydrogen beta): ISO 7944 reference, blue end of Vd.</summary>
    public static readonly Wavelength F = Wavelength.FromNanometres(486.13);

    /// <summary>Fraunhofer G, 430.8 nm: the trade's G value (DOMAIN.md §4), the blue end of nG − nB.</summary>
    public static readonly Wavelength G = Wavelength.FromNanometres(430.8);
}
