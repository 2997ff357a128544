namespace GemIndex.Cli.TextUi.Bench;

/// <summary>
/// An answer picked with one keystroke: each option has a batch word and the key that chooses it
/// (the key is shown in brackets: "[s]ingly refractive").
/// </summary>
internal sealed record BenchChoice(string Field, string Label, IReadOnlyList<(char Key, string Word, string Shown)> Options)
{
    /// <remarks>
    /// One meaning per key across every choice: n is always "none", w/m/s/v always a strength, + and − a test that
    /// reacts or does not; so a letter typed on the wrong row never records the opposite answer.
    /// </remarks>
    public static IReadOnlyList<BenchChoice> All { get; } =
    [
        new(BenchFields.OverLimit, "Over limit", [('y', "yes", "yes")]),
        new(BenchFields.Cut, "Cut", [('f', "faceted", "faceted"), ('c', "cabochon", "cabochon (domed)"), ('o', "other", "other (bead, carving…)")]),
        new(BenchFields.Polariscope, "Polariscope", [('i', "singly_refractive", "singly refractive"), ('d', "doubly_refractive", "doubly refractive"), ('a', "aggregate", "aggregate"), ('x', "anomalous", "anomalous (strain)")]),
        new(BenchFields.Pleochroism, "Pleochroism", [('n', "none", "none"), ('b', "dichroic", "dichroic"), ('t', "trichroic", "trichroic")]),
        new(BenchFields.Dispersion, "Fire (eye)", [('n', "none", "none"), ('w', "weak", "weak"), ('m', "moderate", "moderate"), ('s', "strong", "strong"), ('v', "very_strong", "very strong")]),
        new(BenchFields.ThermalProbe, "Thermal probe", [('+', "positive", "positive"), ('-', "negative", "negative")]),
        new(BenchFields.Electrical, "Conductivity", [('+', "conductive", "conductive"), ('-', "insulating", "insulating")]),
        new(BenchFields.UvLong, "UV long wave", Fluorescence),
        new(BenchFields.UvShort, "UV short wave", Fluorescence),
    ];

    private static (char, string, string)[] Fluorescence => [('n', "inert", "none (inert)"), ('w', "weak", "weak"), ('m', "moderate", "moderate"), ('s', "strong", "strong")];

    public static BenchChoice For(string field) => All.Single(c => c.Field == field);

    /// <summary>The word chosen by a key, or null when the key chooses nothing here.</summary>
    public string? WordFor(char key) =>
        Options.Where(o => o.Key == char.ToLowerInvariant(key)).Select(o => o.Word).FirstOrDefault();

    /// <summary>How a chosen word is shown; "-" when nothing is chosen.</summary>
    public string Show(string? word) =>
        word is null ? "-" : Options.Where(o => o.Word == word).Select(o => o.Shown).FirstOrDefault() ?? word;

    /// <summary>The keys as a hint: "i/d/a/x".</summary>
    public string KeyHint => string.Join("/", Options.Select(o => o.Key));

    /// <summary>Every key with its answer, for the key line while the choice has the cursor.</summary>
    public string KeyWords => string.Join("  ", Options.Select(o => $"{o.Key} {o.Shown}")) + "  Space clears";
}
