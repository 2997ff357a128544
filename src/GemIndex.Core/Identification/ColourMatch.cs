namespace GemIndex.Core.Identification;

/// <summary>How a colour seen compares with a material's usual colours.</summary>
public enum ColourMatch
{
    /// <summary>One of the usual colours.</summary>
    Same,

    /// <summary>Next to a usual colour on the colour wheel (red and pink, blue and violet…): a common naming slip.</summary>
    Neighbour,

    /// <summary>Neither.</summary>
    Different,
}
