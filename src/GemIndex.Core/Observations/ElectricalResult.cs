namespace GemIndex.Core.Observations;

/// <summary>The reading of an electrical conductivity tester.</summary>
public enum ElectricalResult
{
    /// <summary>Conducts (most synthetic moissanite, natural and boron-doped blue diamond, hematite, pyrite).</summary>
    Conductive,

    /// <summary>Does not conduct.</summary>
    Insulating,
}
