using System.Globalization;
using GemIndex.Core.Catalogue;
using GemIndex.Data.Catalogue;

namespace GemIndex.Cli.CommandLine;

/// <summary>How catalogue entries read on a terminal: a table for lists, labelled lines for one entry.</summary>
internal static class MaterialText
{
    private const string IndexFormat = "0.000";

    /// <summary>A catalogue family in words ("sulfides-and-oxides", its file's name, as "sulfides and oxides").</summary>
    public static string FamilyWords(string family) => family.Replace('-', ' ');

    public static void WriteTable(TextWriter output, IReadOnlyList<Material> materials)
    {
        string[] header = ["name", "character", "RI at 589.3 nm", "birefringence", "SG", "origin", "source"];
        List<string[]> rows = [header, .. materials.Select(m => new[]
        {
            m.Name, Character(m), Indices(m), m.Birefringence?.ToString(IndexFormat) ?? "-",
            m.SpecificGravity.ToString("0.00"), Word(m.Origin), m.IsUserEntry ? "user" : FamilyWords(m.Family),
        })];
        int[] widths = [.. Enumerable.Range(0, header.Length).Select(c => rows.Max(r => r[c].Length))];
        foreach (string[] row in rows)
            output.WriteLine(string.Join("  ", row.Select((cell, c) => c == row.Length - 1 ? cell : cell.PadRight(widths[c]))).TrimEnd());
    }

    public static void WriteDetails(TextWriter output, Material m)
    {
        var lines = new List<(string Label, string Value)>
        {
            ("name", m.Name), ("species", m.Species), ("variety", m.Variety), ("family", FamilyWords(m.Family)), ("mineral group", m.MineralGroup ?? "none"),
            ("origin", Word(m.Origin)), ("crystal system", Word(m.CrystalSystem)), ("optic character", Character(m)),
        };
        lines.AddRange(m.Indices.Named().Select(x => ($"{x.Name} at 589.3 nm", x.Range.ToString(IndexFormat))));
        lines.Add(("birefringence", m.Birefringence?.ToString(IndexFormat) ?? "none (one index)"));
        lines.Add(("specific gravity", m.SpecificGravity.ToString("0.00")
            + (m.SpecificGravityUsual is { } usual ? $", usually {usual.ToString("0.00")} (the rest rare extremes)" : "")));
        lines.Add(("dispersion", m.Dispersion is { } d ? $"{d.ToString("0.000", CultureInfo.InvariantCulture)} (nG − nB, 430.8 and 686.7 nm)" : "not given"));
        lines.Add(("hardness", m.Hardness is { } h ? $"{h.ToString("0.#")} (Mohs)" : "not given"));
        lines.Add(("pleochroism", Word(m.Pleochroism)));
        lines.Add(("polariscope", string.Join(", ", m.Polariscope.Select(Word))));
        lines.Add(("thermal probe", Word(m.ThermalProbe)));
        lines.Add(("electrical", Word(m.Electrical)));
        lines.Add(("UV long (365 nm)", List(m.UvLong.Select(Word))));
        lines.Add(("UV short (254 nm)", List(m.UvShort.Select(Word))));
        lines.Add(("absorption", m.AbsorptionLines.Count == 0 ? "none given"
            : string.Join(", ", m.AbsorptionLines.Select(x => $"{x.Nanometres.ToString("0.#", CultureInfo.InvariantCulture)} nm {Word(x.Strength)}"))));
        lines.Add(("colours", string.Join(", ", m.Colours)
            + (m.NamedByColour ? " (the name holds only for these colours: a stone of another colour is not this entry)" : "")));
        lines.Add(("forms", string.Join(", ", CatalogueWords.OfForms(m.Forms))));
        lines.Add(("opaque", m.IsOpaque ? "yes: no polariscope, dichroscope or transmitted-light spectrum" : "no"));
        lines.Add(("species frequency", Word(m.SpeciesFrequency)));
        lines.Add(("share of species", Word(m.Frequency)));
        lines.Add(("do not immerse", m.DoNotImmerse ? "yes: never weigh in water" : "no"));
        lines.Add(("notes", m.Notes.Length == 0 ? "-" : m.Notes));
        if (m.TradeRule is { } rule) lines.Add(("trade", $"{rule.Text} (a summary, not legal advice; {rule.Citation})"));
        lines.Add(("entry", m.IsUserEntry ? "your own (user catalogue)" : "shipped catalogue"));
        if (m.StatedFields.Count > 0) lines.Add(("own fields", $"{string.Join(", ", m.StatedFields)} (the rest from species '{m.Species}')"));
        int width = lines.Max(l => l.Label.Length);
        foreach ((string label, string value) in lines) output.WriteLine($"{label.PadRight(width)}  {value}");
        WriteSources(output, m);
    }

    // Each value's source, grouped by reference: "from memory of standard handbook values (memory, from memory): sg, dispersion".
    private static void WriteSources(TextWriter output, Material m)
    {
        output.WriteLine("sources");
        foreach (IGrouping<ValueSource, string> g in m.Sources.GroupBy(s => s.Value, s => s.Key))
            output.WriteLine($"  {string.Join(", ", g)}: {g.Key.Citation} [{Label(g.Key)}]");
        string[] missing = [.. CatalogueFields.NumericOf(m).Where(f => !m.Sources.ContainsKey(f))];
        if (missing.Length > 0) output.WriteLine($"  {string.Join(", ", missing)}: no source named");
    }

    // The reference's key and its kind, the kind alone when the key only repeats it ("practice, common practice").
    private static string Label(ValueSource source) =>
        Word(source.Kind).Contains(source.Key, StringComparison.OrdinalIgnoreCase) ? Word(source.Kind) : $"{source.Key}, {Word(source.Kind)}";

    /// <summary>
    /// The optic character in the bench's words ("singly refractive (amorphous)", as the text UI says it) with the sign
    /// when one is fixed ("biaxial, either sign" where the catalogue lets it be either).
    /// </summary>
    public static string Character(Material m) => m.Sign switch
    {
        Core.Optics.Indicatrix.OpticSign.None => TextUi.Results.ResultText.Character(m.OpticCharacter),
        Core.Optics.Indicatrix.OpticSign.Either => $"{TextUi.Results.ResultText.Character(m.OpticCharacter)}, either sign",
        _ => $"{TextUi.Results.ResultText.Character(m.OpticCharacter)} {Word(m.Sign)}",
    };

    private static string Indices(Material m) =>
        string.Join(" ", m.Indices.Named().Select(x => $"{x.Name} {x.Range.ToString(IndexFormat)}"));

    private static string List(IEnumerable<string> words) => words.ToList() is { Count: > 0 } l ? string.Join(", ", l) : "not known";

    private static string Word<T>(T value) where T : struct, Enum => CatalogueWords.Of(value).Replace('_', ' ');
}
