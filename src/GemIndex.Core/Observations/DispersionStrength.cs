namespace GemIndex.Core.Observations;

/// <summary>
/// Dispersion ("fire") as judged by eye, with the nG − nB bands the tool uses to link the words to
/// numbers (common practice: quartz 0.013 reads weak, diamond 0.044 strong, synthetic rutile 0.33 very strong).
/// </summary>
public enum DispersionStrength
{
    /// <summary>No fire seen: nG − nB below about 0.010.</summary>
    None,

    /// <summary>Weak: about 0.010–0.020 (quartz, beryl, corundum).</summary>
    Weak,

    /// <summary>Moderate: about 0.020–0.035 (zircon, demantoid's lower end, peridot's upper end).</summary>
    Moderate,

    /// <summary>Strong: about 0.035–0.070 (diamond, cubic zirconia, GGG).</summary>
    Strong,

    /// <summary>Very strong: above about 0.070 (synthetic rutile, strontium titanate, moissanite).</summary>
    VeryStrong,
}
