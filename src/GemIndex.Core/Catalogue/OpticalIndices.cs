using GemIndex.Core.Optics.Indicatrix;

namespace GemIndex.Core.Catalogue;

/// <summary>
/// A material's principal refractive indices at 589.3 nm as ranges: one index n (isotropic, amorphous,
/// aggregate), ω and ε (uniaxial), or α, β and γ (biaxial). Build it with the factory for its character.
/// </summary>
public sealed record OpticalIndices
{
    private OpticalIndices(OpticCharacter character) => Character = character;

    /// <summary>Which set of indices this is.</summary>
    public OpticCharacter Character { get; }

    /// <summary>n, for single-index characters; null otherwise.</summary>
    public PropertyRange? Single { get; private init; }

    /// <summary>ω (ordinary ray), uniaxial only.</summary>
    public PropertyRange? Omega { get; private init; }

    /// <summary>ε (extraordinary ray, its extreme value), uniaxial only.</summary>
    public PropertyRange? Epsilon { get; private init; }

    /// <summary>α (lowest), biaxial only.</summary>
    public PropertyRange? Alpha { get; private init; }

    /// <summary>β (intermediate), biaxial only.</summary>
    public PropertyRange? Beta { get; private init; }

    /// <summary>γ (highest), biaxial only.</summary>
    public PropertyRange? Gamma { get; private init; }

    /// <summary>One index range for an isotropic, amorphous or aggregate material.</summary>
    /// <exception cref="ArgumentException">The character is uniaxial or biaxial.</exception>
    public static OpticalIndices SingleIndex(PropertyRange n, OpticCharacter character = OpticCharacter.Isotropic) =>
        character is OpticCharacter.Uniaxial or OpticCharacter.Biaxial
            ? throw new ArgumentException($"a single index cannot describe a {character} material", nameof(character))
            : new OpticalIndices(character) { Single = n };

    /// <summary>ω and ε ranges of a uniaxial material.</summary>
    public static OpticalIndices Uniaxial(PropertyRange omega, PropertyRange epsilon) =>
        new(OpticCharacter.Uniaxial) { Omega = omega, Epsilon = epsilon };

    /// <summary>α, β and γ ranges of a biaxial material.</summary>
    public static OpticalIndices Biaxial(PropertyRange alpha, PropertyRange beta, PropertyRange gamma) =>
        new(OpticCharacter.Biaxial) { Alpha = alpha, Beta = beta, Gamma = gamma };

    /// <summary>The range of the lowest principal index (n, min(ω, ε) or α).</summary>
    public PropertyRange Lowest => Character switch
    {
        OpticCharacter.Uniaxial => Omega!.Value.Centre <= Epsilon!.Value.Centre ? Omega.Value : Epsilon.Value,
        OpticCharacter.Biaxial => Alpha!.Value,
        _ => Single!.Value,
    };

    /// <summary>The range of the highest principal index (n, max(ω, ε) or γ).</summary>
    public PropertyRange Highest => Character switch
    {
        OpticCharacter.Uniaxial => Omega!.Value.Centre <= Epsilon!.Value.Centre ? Epsilon!.Value : Omega.Value,
        OpticCharacter.Biaxial => Gamma!.Value,
        _ => Single!.Value,
    };

    /// <summary>Every principal-index range this material has, in the order n | ω, ε | α, β, γ.</summary>
    public IEnumerable<(string Name, PropertyRange Range)> Named()
    {
        if (Single is { } n) yield return ("n", n);
        if (Omega is { } w) yield return ("ω", w);
        if (Epsilon is { } e) yield return ("ε", e);
        if (Alpha is { } a) yield return ("α", a);
        if (Beta is { } b) yield return ("β", b);
        if (Gamma is { } g) yield return ("γ", g);
    }
}
