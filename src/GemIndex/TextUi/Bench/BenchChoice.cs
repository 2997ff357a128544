namespace GemIndex.Cli.TextUi.Bench;

/// <summary>
/// An answer picked with one keystroke: each option has a batch word and the key that chooses it
/// (the key is shown in brackets: "[s]ingly refractive").
/// </summary>
internal sealed record BenchChoice(string Field, string Label, IReadOnlyList<(char Key, string Word, string Shown)> Options)
{
    public static IReadOnlyList<BenchChoice> All { get; } =
    [
        new(BenchFields.OverLimit, "Over limit", [('y', "yes", "yes")]),
        new(BenchFields.Polariscope, "Polariscope", [('s', "singly_refractive", "singly refractive"), ('d', "doubly_refractive", "doubly refractive"), ('a', "aggregate", "aggregate"), ('n', "anomalous", "anomalous (strain)")]),
        new(BenchFields.Pleochroism, "Pleochroism", [('n', "none", "none"), ('d', "dichroic", "dichroic"), ('t', "trichroic", "trichroic")]),
        new(BenchFields.Dispersion, "Fire (eye)", [('n', "none", "none"), ('w', "weak", "weak"), ('m', "moderate", "moderate"), ('s', "strong", "strong"), ('v', "very_strong", "very strong")]),
        new(BenchFields.ThermalProbe, "Thermal", [('p', "positive", "positive (diamond-like)"), ('n', "negative", "negative")]),
        new(BenchFields.Electrical, "Electrical", [('c', "conductive", "conductive"), ('i', "insulating", "insulating")]),
        new(BenchFields.UvLong, "UV long", Fluorescence),
        new(BenchFields.UvShort, "UV short", Fluorescence),
    ];

    private static (char, string, string)[] Fluorescence => [('i', "inert", "inert"), ('w', "weak", "weak"), ('m', "moderate", "moderate"), ('s', "strong", "strong")];

    public static BenchChoice For(string field) => All.Single(c => c.Field == field);

    /// <summary>The word chosen by a key, or null when the key chooses nothing here.</summary>
    public string? WordFor(char key) =>
        Options.Where(o => o.Key == char.ToLowerInvariant(key)).Select(o => o.Word).FirstOrDefault();

    /// <summary>How a chosen word is shown; "-" when nothing is chosen.</summary>
    public string Show(string? word) =>
        word is null ? "-" : Options.Where(o => o.Word == word).Select(o => o.Shown).FirstOrDefault() ?? word;

    /// <summary>The keys as a hint: "s/d/a/n".</summary>
    public string KeyHint => string.Join("/", Options.Select(o => o.Key));
}
