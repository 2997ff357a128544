namespace GemIndex.Bench.Independent;

/// <summary>
/// A species' principal indices as a composition series, so that they move together as they do in a real stone:
/// the lowest index, the birefringence, and (biaxial) where β sits between α and γ as a fraction of γ − α
/// (below one half: positive). Uniaxial: the lowest index with the sign saying whether it is ω (+) or ε (−).
/// A source that gives nα, nβ, nγ ranges is converted to this form in the property table, row by row.
/// </summary>
internal sealed record PrincipalValues
{
    public required OpticModel Model { get; init; }

    /// <summary>The lowest principal index: n (isotropic), ω (uniaxial +), ε (uniaxial −), α (biaxial).</summary>
    public required IndexRange Lowest { get; init; }

    /// <summary>
    /// The index whose published range a stone is drawn from, the others following by the birefringence: n, ω (uniaxial
    /// of either sign) or α. For a negative uniaxial row this is ω, not ε: drawing ε over its widest span and adding the
    /// birefringence would put ω beyond the very range the row cites.
    /// </summary>
    public IndexRange Drawn => _omega ?? Lowest;

    private IndexRange? _omega;

    /// <summary>γ − α or |ε − ω|; zero for isotropic.</summary>
    public IndexRange Birefringence { get; init; } = IndexRange.At(0);

    /// <summary>Uniaxial: the ε range the row cites beside ω and the birefringence, if it cites one.</summary>
    public IndexRange? Epsilon { get; init; }

    /// <summary>
    /// The birefringences a stone with this ω may take: the row's range, narrowed so that ε stays in its cited range too
    /// (a tourmaline of low ω cannot take the highest birefringence); the row's range when none is cited or nothing fits.
    /// </summary>
    public IndexRange BirefringenceFor(double omega)
    {
        if (Model != OpticModel.Uniaxial || Epsilon is not { } e) return Birefringence;
        double low = Positive ? e.Low - omega : omega - e.High, high = Positive ? e.High - omega : omega - e.Low;
        double from = Math.Max(Birefringence.Low, low), to = Math.Min(Birefringence.High, high);
        return from <= to ? new(from, to) : Birefringence;
    }

    /// <summary>Uniaxial and biaxial: true for a positive sign.</summary>
    public bool Positive { get; init; }

    /// <summary>Biaxial: (β − α)/(γ − α).</summary>
    public IndexRange BetaFraction { get; init; } = IndexRange.At(0.5);

    /// <summary>The highest principal index the published ranges allow.</summary>
    public double HighestMaximum => Lowest.High + Birefringence.High;

    /// <summary>Isotropic material.</summary>
    public static PrincipalValues Single(double low, double high) => new() { Model = OpticModel.Isotropic, Lowest = new(low, high) };

    /// <summary>
    /// Uniaxial: ω range and birefringence range; ε = ω ± birefringence by the sign. When the row also cites an ε range,
    /// a stone's birefringence is drawn where both hold (<see cref="BirefringenceFor"/>).
    /// </summary>
    public static PrincipalValues Uniaxial(IndexRange omega, IndexRange birefringence, bool positive, IndexRange? epsilon = null) => new()
    {
        Epsilon = epsilon,
        Model = OpticModel.Uniaxial,
        Lowest = positive ? omega : new(omega.Low - birefringence.High, omega.High - birefringence.Low),
        Birefringence = birefringence,
        Positive = positive,
        _omega = positive ? null : omega,
    };

    /// <summary>Biaxial: α range, birefringence range and where β sits.</summary>
    public static PrincipalValues Biaxial(IndexRange alpha, IndexRange birefringence, IndexRange betaFraction) => new()
    {
        Model = OpticModel.Biaxial,
        Lowest = alpha,
        Birefringence = birefringence,
        BetaFraction = betaFraction,
        Positive = betaFraction.High < 0.5,
    };
}
