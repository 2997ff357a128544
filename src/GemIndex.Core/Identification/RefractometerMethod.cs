namespace GemIndex.Core.Identification;

/// <summary>How the refractometer was used.</summary>
public enum RefractometerMethod
{
    /// <summary>A flat polished facet, read in steps of rotation.</summary>
    Facet,

    /// <summary>A curved surface, read by the distant-vision (spot) method: one averaged reading, about ±0.01.</summary>
    Spot,
}
