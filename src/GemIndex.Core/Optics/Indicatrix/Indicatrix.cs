using GemIndex.Core.Quantities;

namespace GemIndex.Core.Optics.Indicatrix;

/// <summary>
/// The optical indicatrix: the ellipsoid x²/n_x² + y²/n_y² + z²/n_z² = 1 whose semi-axes are the
/// principal refractive indices α ≤ β ≤ γ (DOMAIN.md §3; the standard construction of crystal optics).
/// The principal axes lie along the crystal frame of <see cref="Direction"/>: for a biaxial indicatrix
/// X (α) along x, Y (β) along y, Z (γ) along z; for a uniaxial one the optic axis (ε) along z and ω
/// along x and y; an isotropic one is a sphere. Immutable and thread-safe.
/// </summary>
public sealed class Indicatrix
{
    // Principal indices along the crystal x, y and z axes (not sorted: a negative uniaxial has ε along z).
    private readonly RefractiveIndex _alongX;
    private readonly RefractiveIndex _alongY;
    private readonly RefractiveIndex _alongZ;

    private Indicatrix(OpticCharacter character, RefractiveIndex alongX, RefractiveIndex alongY, RefractiveIndex alongZ)
    {
        Character = character;
        _alongX = alongX;
        _alongY = alongY;
        _alongZ = alongZ;
        RefractiveIndex[] sorted = [alongX, alongY, alongZ];
        Array.Sort(sorted, (a, b) => a.Value.CompareTo(b.Value));
        Alpha = sorted[0];
        Beta = sorted[1];
        Gamma = sorted[2];
    }

    /// <summary>Isotropic (cubic or amorphous): a sphere of radius <paramref name="index"/>; α = β = γ = n.</summary>
    public static Indicatrix Isotropic(RefractiveIndex index) =>
        new(OpticCharacter.Isotropic, index, index, index);

    /// <summary>
    /// Uniaxial, with the ordinary index ω along x and y and the extraordinary index ε along the optic
    /// axis z. ε &gt; ω is positive, ε &lt; ω negative.
    /// </summary>
    /// <exception cref="QuantityOutOfRangeException">ε equals ω (that indicatrix is isotropic).</exception>
    public static Indicatrix Uniaxial(RefractiveIndex ordinary, RefractiveIndex extraordinary)
    {
        if (extraordinary.Value == ordinary.Value)
            throw new QuantityOutOfRangeException("extraordinary index ε", extraordinary.Value,
                FormattableString.Invariant($"any index other than ω {ordinary.Value:G6} (equal indices make an isotropic indicatrix)"));
        return new(OpticCharacter.Uniaxial, ordinary, ordinary, extraordinary);
    }

    /// <summary>Biaxial, with α along x, β along y and γ along z; requires α &lt; β &lt; γ.</summary>
    /// <exception cref="QuantityOutOfRangeException">
    /// β is not strictly between α and γ (named "intermediate index β"), or γ is not above β (named
    /// "highest index γ"). Two equal indices make a uniaxial indicatrix: use <see cref="Uniaxial"/>.
    /// </exception>
    public static Indicatrix Biaxial(RefractiveIndex alpha, RefractiveIndex beta, RefractiveIndex gamma)
    {
        if (!(beta.Value > alpha.Value))
            throw new QuantityOutOfRangeException("intermediate index β", beta.Value,
                FormattableString.Invariant($"above the lowest index α {alpha.Value:G6} (equal indices: use a uniaxial indicatrix)"));
        if (!(gamma.Value > beta.Value))
            throw new QuantityOutOfRangeException("highest index γ", gamma.Value,
                FormattableString.Invariant($"above the intermediate index β {beta.Value:G6} (equal indices: use a uniaxial indicatrix)"));
        return new(OpticCharacter.Biaxial, alpha, beta, gamma);
    }

    /// <summary>Isotropic, uniaxial or biaxial (never aggregate or amorphous: those have no single indicatrix).</summary>
    public OpticCharacter Character { get; }

    /// <summary>The lowest principal index α (uniaxial: min(ω, ε)).</summary>
    public RefractiveIndex Alpha { get; }

    /// <summary>The intermediate principal index β (uniaxial: ω).</summary>
    public RefractiveIndex Beta { get; }

    /// <summary>The highest principal index γ (uniaxial: max(ω, ε)).</summary>
    public RefractiveIndex Gamma { get; }

    /// <summary>
    /// γ − α (uniaxial |ε − ω|), with σ = √(σ_γ² + σ_α²) (independent indices); see
    /// <see cref="RefractiveIndex.op_Subtraction"/>. Never negative.
    /// </summary>
    public Birefringence Birefringence => Gamma - Alpha;

    /// <summary>
    /// The optic sign. Isotropic: <see cref="OpticSign.None"/>. Uniaxial: positive when ε &gt; ω.
    /// Biaxial: positive when Z (γ) is the acute bisectrix, 2Vz &lt; 90°, i.e. cos²Vz &gt; ½ in the formula of
    /// <see cref="OpticAxialAngle"/>; <see cref="OpticSign.Either"/> at exactly 90°. The trade's rule of
    /// thumb "+ when γ − β &gt; β − α" is the same test with β compared in n instead of 1/n²: 2Vz = 90°
    /// exactly when 1/β² = (1/α² + 1/γ²)/2, so the rule of thumb gives the opposite sign only when β lies
    /// between those two midpoints, a band about 3(γ − α)²/(8β) wide (0.0094 for α 1.5, γ 1.7) (β midway in n then gives 2Vz just above 90°).
    /// </summary>
    public OpticSign Sign => Character switch
    {
        OpticCharacter.Isotropic => OpticSign.None,
        OpticCharacter.Uniaxial => _alongZ.Value > _alongX.Value ? OpticSign.Positive : OpticSign.Negative,
        _ => CosSquaredVz() switch
        {
            > 0.5 => OpticSign.Positive,
            < 0.5 => OpticSign.Negative,
            _ => OpticSign.Either,
        },
    };

    /// <summary>
    /// The optic axial angle 2Vz, measured across Z (γ), 0° to 180°, from
    /// cos²Vz = α²(γ² − β²) / (β²(γ² − α²)) (DOMAIN.md §3; the standard indicatrix result, derived from the
    /// two circular sections of radius β). Null for an isotropic indicatrix, which has no optic axis.
    /// Uniaxial: 0° when positive, 180° when negative (the optic axis then lies along X), exactly, with no
    /// uncertainty (ω serves as two of the principal indices, so they cannot differ).
    /// Biaxial uncertainty, first order with independent α, β, γ: with a = α², b = β², g = γ², c = cos²Vz,
    /// ∂c/∂a = g(g − b)/(b(g − a)²), ∂c/∂b = −ag/(b²(g − a)), ∂c/∂g = a(b − a)/(b(g − a)²), ∂c/∂n = 2n ∂c/∂n²,
    /// and d(2Vz)/dc = −1/√(c(1 − c)). Near 0° or 180° that derivative diverges and first order fails; when
    /// the first-order value exceeds the standard deviation of an angle known only to lie in 0°–180°
    /// (180°/√12 ≈ 52°), that value is reported instead, meaning "not determined by these indices".
    /// </summary>
    public Angle? OpticAxialAngle
    {
        get
        {
            if (Character == OpticCharacter.Isotropic) return null;
            if (Character == OpticCharacter.Uniaxial) return Angle.FromDegrees(Sign == OpticSign.Positive ? 0 : 180);
            double c = CosSquaredVz();
            double twoVz = 2 * Math.Acos(Math.Sqrt(c));
            return Angle.FromRadians(twoVz, OpticAxialAngleUncertainty(c));
        }
    }

    /// <summary>
    /// The radius of the indicatrix along <paramref name="direction"/> d: 1/√(dᵀ·diag(1/n_x², 1/n_y², 1/n_z²)·d),
    /// the index r(N) of DOMAIN.md §3 when d is a facet normal N. Lies within [α, γ]. No uncertainty.
    /// </summary>
    /// <exception cref="QuantityOutOfRangeException"><paramref name="direction"/> is <c>default</c>.</exception>
    public RefractiveIndex RadiusAlong(Direction direction)
    {
        direction.ThrowIfDefault("direction");
        return new RefractiveIndex(1 / Math.Sqrt(InverseSquareForm(direction, direction)));
    }

    /// <summary>
    /// The direction of travel at rotation 0° on a facet with normal N: the projection onto the facet of
    /// the crystal axis least aligned with N (smallest |N·e|; ties go to z, then x, then y), normalised.
    /// A facet cut parallel to the optic axis of a uniaxial stone therefore starts with travel along the
    /// optic axis. The projection has length at least √(2/3), so the choice is numerically safe.
    /// </summary>
    /// <exception cref="QuantityOutOfRangeException"><paramref name="facetNormal"/> is <c>default</c>.</exception>
    public static Direction ReferenceTravelDirection(Direction facetNormal)
    {
        facetNormal.ThrowIfDefault("facet normal");
        Direction axis = Direction.AlongZ;
        if (Math.Abs(facetNormal.X) < Math.Abs(facetNormal.Dot(axis))) axis = Direction.AlongX;
        if (Math.Abs(facetNormal.Y) < Math.Abs(facetNormal.Dot(axis))) axis = Direction.AlongY;
        double along = facetNormal.Dot(axis);
        return new Direction(axis.X - along * facetNormal.X, axis.Y - along * facetNormal.Y, axis.Z - along * facetNormal.Z);
    }

    /// <summary>
    /// The two shadow edges for light travelling along the facet with unit normal N in the direction
    /// s = cos θ·u + sin θ·(N × u), where u is <see cref="ReferenceTravelDirection"/> and θ is
    /// <paramref name="rotation"/> (so s turns anticlockwise seen from outside the facet, looking down −N).
    /// The edges are the semi-axes of the ellipse cut from the indicatrix by the plane through N
    /// perpendicular to s, spanned by N and t = N × s (DOMAIN.md §3). Computed exactly: the 2×2
    /// restriction of A = diag(1/n_x², 1/n_y², 1/n_z²) to that plane, [[NᵀAN, NᵀAt], [NᵀAt, tᵀAt]], has
    /// eigenvalues λ = m ± √(d² + r²) (m the mean and d the half difference of the diagonal, r the
    /// off-diagonal term), and each semi-axis is n = 1/√λ. Any finite rotation is accepted (period 180°).
    /// </summary>
    /// <exception cref="QuantityOutOfRangeException"><paramref name="facetNormal"/> is <c>default</c>.</exception>
    public IndicatrixSection Section(Direction facetNormal, Angle rotation)
    {
        Direction u = ReferenceTravelDirection(facetNormal);
        Direction v = Direction.Cross(facetNormal, u);
        double cos = Math.Cos(rotation.Radians), sin = Math.Sin(rotation.Radians);
        var travel = new Direction(cos * u.X + sin * v.X, cos * u.Y + sin * v.Y, cos * u.Z + sin * v.Z);
        Direction t = Direction.Cross(facetNormal, travel);
        double p = InverseSquareForm(facetNormal, facetNormal);
        double q = InverseSquareForm(t, t);
        double r = InverseSquareForm(facetNormal, t);
        double mean = (p + q) / 2;
        double spread = double.Hypot((p - q) / 2, r);
        var high = new RefractiveIndex(1 / Math.Sqrt(mean - spread));
        var low = new RefractiveIndex(1 / Math.Sqrt(mean + spread));
        return new IndicatrixSection(rotation, travel, low, high);
    }

    /// <summary>aᵀ·diag(1/n_x², 1/n_y², 1/n_z²)·b.</summary>
    private double InverseSquareForm(Direction a, Direction b) =>
        a.X * b.X / Square(_alongX.Value) + a.Y * b.Y / Square(_alongY.Value) + a.Z * b.Z / Square(_alongZ.Value);

    private double CosSquaredVz()
    {
        double a = Square(Alpha.Value), b = Square(Beta.Value), g = Square(Gamma.Value);
        return a * (g - b) / (b * (g - a));
    }

    private double OpticAxialAngleUncertainty(double c)
    {
        double alpha = Alpha.Value, beta = Beta.Value, gamma = Gamma.Value;
        double a = alpha * alpha, b = beta * beta, g = gamma * gamma;
        double dcdAlpha = 2 * alpha * g * (g - b) / (b * Square(g - a));
        double dcdBeta = 2 * beta * -a * g / (b * b * (g - a));
        double dcdGamma = 2 * gamma * a * (b - a) / (b * Square(g - a));
        double sigmaC = Math.Sqrt(Square(dcdAlpha * Alpha.StandardUncertainty) + Square(dcdBeta * Beta.StandardUncertainty)
                                  + Square(dcdGamma * Gamma.StandardUncertainty));
        if (sigmaC == 0) return 0;
        double undetermined = Math.PI / Math.Sqrt(12);
        double firstOrder = sigmaC / Math.Sqrt(c * (1 - c));
        return firstOrder < undetermined ? firstOrder : undetermined;
    }

    private static double Square(double x) => x * x;
}
