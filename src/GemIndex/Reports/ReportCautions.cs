namespace GemIndex.Cli.Reports;

/// <summary>The safety and scope cautions printed on every report, whatever its format.</summary>
internal static class ReportCautions
{
    public const string Liquids =
        "Contact liquids and heavy liquids are toxic: avoid skin contact, work with ventilation, and follow the safety data sheet and local rules.";

    public const string Ultraviolet =
        "Ultraviolet lamps harm eyes and skin: never look into the lamp, and shield the lamp and your skin while testing.";

    public const string Scope =
        "An identification from bench tests is an aid, not a certificate: many synthetics and treatments cannot be separated by these tests.";

    public const string Laboratory =
        "Refer valuable stones to a qualified gem-testing laboratory, and defer to local regulations and licensed practice.";

    /// <summary>The contact liquid's caution in a few words, for the refractometer page.</summary>
    public const string ContactLiquidShort = "! Contact liquid is toxic: avoid skin contact and fumes; follow its safety data sheet and local rules.";

    /// <summary>The same for the heavy liquids, on the SG page.</summary>
    public const string HeavyLiquidShort = "! Heavy liquids are toxic: avoid skin contact and fumes; follow their safety data sheets and local rules.";

    /// <summary>The contact liquid's caution in one row of the narrowest form (36 characters), kept while entries are refused.</summary>
    public const string ContactLiquidLine = "! Contact liquid is toxic: see F1.";

    /// <summary>The heavy liquids' caution in one row, kept beside a do-not-immerse caution.</summary>
    public const string HeavyLiquidLine = "! Heavy liquids are toxic: see F1.";

    /// <summary>The UV lamp's caution in one row, kept while entries are refused.</summary>
    public const string UltravioletLine = "! UV: never look into the lamp.";

    /// <summary>Beside advice to take the SG, which may be done with heavy liquids.</summary>
    public const string SpecificGravityShort = "! If by heavy liquids: they are toxic; avoid skin contact and fumes; follow their safety data sheets and local rules.";

    /// <summary>The ultraviolet caution in a few words, for the page where the lamp's results are typed.</summary>
    public const string UltravioletShort = "! UV lamp: never look into it; shield your eyes and skin while testing.";

    /// <summary>
    /// The caution to give beside advice to take a test (the next test), or null: the contact liquid for the
    /// refractometer, the heavy liquids', the UV lamps'. Taking the advice is where the hazard is met.
    /// </summary>
    public static string? ForTest(string wire) => GemIndex.Core.Bench.BenchTestWords.FromWire(wire) switch
    {
        GemIndex.Core.Bench.BenchTest.Refractometer => ContactLiquidShort,
        GemIndex.Core.Bench.BenchTest.HeavyLiquids => HeavyLiquidShort,
        // The advisor's SG is weighing in water or heavy liquids alike: the caution for the toxic way.
        GemIndex.Core.Bench.BenchTest.SpecificGravity => SpecificGravityShort,
        GemIndex.Core.Bench.BenchTest.UvLong or GemIndex.Core.Bench.BenchTest.UvShort => UltravioletShort,
        _ => null,
    };

    /// <summary>
    /// The cautions for the tests the warnings advise (<see cref="GemIndex.Core.Identification.IdentificationResult.WarningTests"/>),
    /// each once, leaving out the next test's, which is said beside it: taking the advice is where the hazard is met.
    /// </summary>
    public static IReadOnlyList<string> ForWarnings(IEnumerable<string> advisedTests, string? nextTest) =>
        [.. advisedTests.Select(ForTest).OfType<string>().Where(c => nextTest is null || c != ForTest(nextTest)).Distinct()];

    /// <summary>All of them, in the order printed.</summary>
    public static IReadOnlyList<string> All { get; } = [Liquids, Ultraviolet, Scope, Laboratory];
}
