namespace GemIndex.Cli.Reports;

/// <summary>One interpretation of the rotation series, as a report shows it (indices at the reading's wavelength).</summary>
/// <param name="Character">isotropic, uniaxial, biaxial, … or "undetermined".</param>
/// <param name="Sign">positive, negative, either or none.</param>
/// <param name="Weight">Its weight among the series' interpretations, 0–1.</param>
/// <param name="Lowest">Lowest principal index.</param>
/// <param name="Highest">Highest principal index.</param>
/// <param name="Beta">β, for a biaxial interpretation.</param>
/// <param name="Birefringence">Birefringence read from the series.</param>
/// <param name="BirefringenceUncertainty">Its standard uncertainty.</param>
/// <param name="Description">The interpretation in words, from Core.</param>
internal sealed record ReportInterpretation(string Character, string Sign, double Weight, double Lowest, double Highest, double? Beta,
    double Birefringence, double BirefringenceUncertainty, string Description, double? AboveLiquidLimit = null)
{
    /// <summary>The character word of a reading the series leaves open (it has no sign to give).</summary>
    public const string Undetermined = "undetermined";

    /// <summary>True when the series leaves this reading's optic character open.</summary>
    public bool IsUndetermined => Character == Undetermined;
}
