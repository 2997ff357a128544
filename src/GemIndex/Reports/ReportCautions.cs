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

    /// <summary>All of them, in the order printed.</summary>
    public static IReadOnlyList<string> All { get; } = [Liquids, Ultraviolet, Scope, Laboratory];
}
