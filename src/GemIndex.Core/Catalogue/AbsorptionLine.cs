namespace GemIndex.Core.Catalogue;

/// <summary>A line or band centre a hand spectroscope shows for a material, with how plainly it shows.</summary>
/// <param name="Nanometres">The wavelength of the line or the band's centre, nm.</param>
/// <param name="Strength">How plainly it shows: a strong line is rarely missed, a faint one often.</param>
public readonly record struct AbsorptionLine(double Nanometres, LineStrength Strength = LineStrength.Moderate);
