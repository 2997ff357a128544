namespace GemIndex.Bench.Independent;

/// <summary>What the refractometer can see of a species: one index, two (uniaxial) or three (biaxial), or none (opaque or aggregate read by spot only).</summary>
internal enum OpticModel
{
    Isotropic,
    Uniaxial,
    Biaxial,
}
