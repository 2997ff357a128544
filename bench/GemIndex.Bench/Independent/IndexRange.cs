namespace GemIndex.Bench.Independent;

/// <summary>A closed interval [Low, High] of a property as published (an index, a birefringence, an SG, a fraction).</summary>
internal readonly record struct IndexRange(double Low, double High)
{
    /// <summary>A single published value.</summary>
    public static IndexRange At(double value) => new(value, value);

    public double Width => High - Low;

    public bool Contains(double x, double tolerance) => x >= Low - tolerance && x <= High + tolerance;
}
