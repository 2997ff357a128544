using GemIndex.Core.Quantities;

namespace GemIndex.Core.Tests.Optics;

/// <summary>Checks that a call is refused with a <see cref="QuantityOutOfRangeException"/> whose message names the quantity and the range.</summary>
public static class OutOfRangeAssert
{
    /// <summary>
    /// Asserts <paramref name="call"/> throws exactly <see cref="QuantityOutOfRangeException"/> and its message contains
    /// <paramref name="quantity"/> and <paramref name="range"/>.
    /// </summary>
    public static QuantityOutOfRangeException Throws(Action call, string quantity, string range)
    {
        var e = Assert.Throws<QuantityOutOfRangeException>(call);
        Assert.Contains(quantity, e.Message, StringComparison.Ordinal);
        Assert.Contains(range, e.Message, StringComparison.Ordinal);
        return e;
    }
}
