using FsCheck;
using FsCheck.Fluent;
using GemIndex.Core.Optics;
using GemIndex.Core.Quantities;

namespace GemIndex.Core.Tests.Optics.Indicatrix;

using GemIndex.Core.Optics.Indicatrix;

/// <summary>
/// Physically valid inputs for the indicatrix properties: indices of real gem materials (1.3–2.9, with
/// birefringences from 10⁻⁶ to 0.3), facet normals drawn uniformly on the sphere plus the axis-aligned
/// and diagonal special cases, and rotations over two full turns.
/// </summary>
internal static class IndicatrixGenerators
{
    private static Gen<double> IndexValue(double low, double high) =>
        Gen.Choose((int)(low * 1_000_000), (int)(high * 1_000_000)).Select(i => i / 1_000_000.0);

    private static Gen<double> Difference => Gen.Choose(1, 300_000).Select(i => i / 1_000_000.0);

    public static Gen<Indicatrix> Isotropic =>
        IndexValue(1.3, 2.9).Select(n => Indicatrix.Isotropic(new RefractiveIndex(n)));

    public static Gen<Indicatrix> UniaxialGen =>
        from omega in IndexValue(1.35, 2.6)
        from delta in Difference
        from positive in Gen.Elements(true, false)
        select Indicatrix.Uniaxial(new RefractiveIndex(omega), new RefractiveIndex(positive ? omega + delta : omega - delta));

    public static Gen<Indicatrix> BiaxialGen =>
        from alpha in IndexValue(1.3, 2.4)
        from toBeta in Difference
        from toGamma in Difference
        select Indicatrix.Biaxial(new RefractiveIndex(alpha), new RefractiveIndex(alpha + toBeta),
            new RefractiveIndex(alpha + toBeta + toGamma));

    public static Gen<Direction> FacetNormalGen => Gen.Frequency(
        (5, Gen.Choose(int.MinValue, int.MaxValue).Select(seed => Direction.RandomUniform(new Random(seed)))),
        (1, Gen.Elements(Direction.AlongX, Direction.AlongY, Direction.AlongZ, new Direction(1, 1, 0),
            new Direction(0, 1, 1), new Direction(1, 0, 1), new Direction(1, 1, 1), new Direction(-1, 0, 0))));

    public static Gen<Angle> RotationGen => Gen.Choose(0, 7_200_000).Select(i => Angle.FromDegrees(i / 10_000.0));

    public static Arbitrary<Indicatrix> Uniaxial => UniaxialGen.ToArbitrary();

    public static Arbitrary<Indicatrix> Biaxial => BiaxialGen.ToArbitrary();

    public static Arbitrary<Indicatrix> Any => Gen.OneOf(Isotropic, UniaxialGen, BiaxialGen).ToArbitrary();

    public static Arbitrary<Direction> FacetNormal => FacetNormalGen.ToArbitrary();

    public static Arbitrary<Angle> Rotation => RotationGen.ToArbitrary();
}
