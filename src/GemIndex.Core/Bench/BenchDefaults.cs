using GemIndex.Core.Identification;
using GemIndex.Core.Quantities;

namespace GemIndex.Core.Bench;

/// <summary>
/// What is assumed when a reading leaves something out, and the uncertainty given to readings that carry none:
/// the one place these bench conventions live (every front end reads a stone through <see cref="BenchReader"/>).
/// </summary>
public static class BenchDefaults
{
    /// <summary>The contact liquid when none is stated (common practice: 1.78–1.81, the usual 1.79).</summary>
    public const double LiquidLimit = RefractometerObservation.DefaultLiquidLimit;

    /// <summary>
    /// How far above the liquid's index an edge may be read before it is refused: the last division of the scale
    /// is read to about ±0.005 (common practice). The same slack as <see cref="RefractometerObservation"/> applies.
    /// </summary>
    public const double EdgeSlackAboveLiquid = 0.005;

    /// <summary>Standard uncertainty of one facet reading (common practice: ±0.001 on a good facet).</summary>
    public const double FacetPrecision = RefractometerObservation.DefaultFacetPrecision;

    /// <summary>Standard uncertainty of a spot reading (about ±0.01 as a 90 % bound, common practice).</summary>
    public const double SpotPrecision = RefractometerObservation.DefaultSpotPrecision;

    /// <summary>No calibration offset unless one is given.</summary>
    public const double CalibrationOffset = 0;

    /// <summary>Sodium D light, nm, when no wavelength is stated.</summary>
    public const double LightNanometres = RefractometerObservation.SodiumLightNanometres;

    /// <summary>Water temperature assumed when a hydrostatic weighing gives none (a room at 20 °C).</summary>
    public const double WaterCelsius = 20;

    /// <summary>
    /// Standard uncertainty of one weighing in carats: a 0.001 ct balance, with the surface tension on the wire and
    /// air bubbles that a bench weighing in water carries (common practice: SG to ±0.01 on stones over about 1 ct).
    /// </summary>
    public const double WeighingUncertaintyCarats = 0.002;

    /// <summary>A bench weighing in carats with the uncertainty every weighing carries (<see cref="WeighingUncertaintyCarats"/>).</summary>
    /// <exception cref="QuantityOutOfRangeException">The weight is not a mass (see <see cref="Mass.FromCarats"/>).</exception>
    public static Mass Weighed(double carats) => Mass.FromCarats(carats, WeighingUncertaintyCarats);

    /// <summary>Standard uncertainty assumed for an SG given as a plain number (common practice: ±0.01–0.02).</summary>
    public const double DirectSpecificGravityUncertainty = 0.01;

    /// <summary>The most rotation steps one series may hold (the rotation-series analysis reads up to 1000).</summary>
    public const int MostSteps = 1000;

    /// <summary>Candidates shown by default.</summary>
    public const int Candidates = 10;

    /// <summary>
    /// Candidates whose reasons the command line, the batch and the result document give: the leading three (the text
    /// UI works out every listed candidate's reasons, since any can be opened).
    /// </summary>
    public const int ExplainedCandidates = 3;

    /// <summary>The most candidates any front end shows (the range every option's help states).</summary>
    public const int MostCandidates = 50;

    /// <summary>
    /// The rule for a denser liquid: with no liquid stated the usual one is assumed, and an edge read above it
    /// (beyond <see cref="EdgeSlackAboveLiquid"/>) is an error asking for the liquid actually used, never a guess.
    /// </summary>
    public static double LiquidLimitOrDefault(double? stated) => stated ?? LiquidLimit;

    /// <summary>The longest colour description read ("greenish yellow with brown zones" is 32).</summary>
    public const int LongestColour = 40;

}
