namespace GemIndex.Core.Optics.Indicatrix;

/// <summary>
/// One facet orientation of <see cref="FacetOrientationSet"/>: the facet normal N, the travel direction u at rotation 0
/// (<see cref="Indicatrix.ReferenceTravelDirection"/>) and v = N × u, the starting azimuth φ0 (as its cosine and sine)
/// and the sense of rotation (+1 or −1). At a step's rotation φ the light travels along s = cos ψ·u + sin ψ·v with
/// ψ = φ0 + sense·φ, and the section plane is spanned by N and t = N × s = cos ψ·v − sin ψ·u.
/// </summary>
internal readonly record struct FacetOrientation(Direction Normal, Direction U, Direction V, double CosStart, double SinStart, int Sense);
