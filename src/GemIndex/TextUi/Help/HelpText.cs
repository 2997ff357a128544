namespace GemIndex.Cli.TextUi.Help;

/// <summary>The help screen: every key, how to read the answer, then the cautions.</summary>
internal static class HelpText
{
    public static IReadOnlyList<(string Key, string Does)> Keys { get; } =
    [
        ("F1", "this help"),
        ("F2 F3 F4 F5", "stone sheet / refractometer / SG and liquids / other tests; each opens at its first reading"),
        ("Ctrl+L", "magnification (loupe or microscope): the features, grouped; opens on the first, with every feature listed"),
        ("F10", "the cursor to the answer and back to the field left (Esc also returns); arrows and PgUp/PgDn scroll it"),
        ("F9, Enter", "on a candidate: its detail: reasons with their numbers, and its catalogue entry"),
        ("F6", "edge plot (two shadow edges against rotation)"),
        ("Ctrl+R", "scales: lowest index, birefringence and SG as worked out from the readings (the edges' fitted extremes, which may lie a little past the readings when the steps fall between them; with their uncertainty) against the ranges of the best entry of each leading species, then the next entries, each under its rank in the answer"),
        ("F7", "catalogue browser (a name, an index, an SG, or an index and an SG: 1.544 2.65; one number from 1.30 to 2.5 finds indices first, then SGs)"),
        ("F8", "stones in the workbook (open; search by reference, colour, notes or answer; new, duplicate, delete; F3 there shows a stone's edit history, F4 sorts by change, reference, answer or weight)"),
        ("Ctrl+E", "export the stone's report (Markdown, HTML, JSON) to reports/ beside the workbook; each names the examiner typed once at the foot of F2 Stone (kept in the workbook)"),
        ("Ctrl+N", "new stone (opens at its reference)"),
        ("Ctrl+Q", "quit (everything is already saved)"),
        ("Ctrl+C", "in a field: copy the selected text (Shift+arrows select); it does not quit"),
        ("Tab, Shift+Tab", "next / previous field; a field reached by Tab has its text selected, so typing replaces it"),
        ("Ctrl+Z", "in a field: put back the value it held when the cursor came into it (a value replaced by mistake comes back); again: what was typed over it"),
        ("RI: Enter", "store the step being typed; the rotation moves on by the rotation step (set once on the page; 15° until set); past a half turn, which the edges repeat, it fills the widest gap and says 'fills gap' (type 180 over it for a check reading). Both edges may be typed in one go: 1.624 1.644 or 1.624/1.644 (the space or '/' moves on to the high edge's box)"),
        ("RI: step list", "on a step: Enter edits it (Esc leaves it as it was), Delete removes it; Ctrl+Z puts the step removed last back (Tab from the high edge reaches the list)"),
        ("Choices", "one key picks the answer: n none; w m s v weak, moderate, strong, very strong; i d a x singly refractive, doubly refractive, aggregate, anomalous; b t dichroic, trichroic; + - reacts, does not react; y yes; f c o faceted, cabochon, other cut. Space or Backspace clears; a digit goes on into the field right after the choice when that is an empty text field (it never replaces a value)"),
        ("Loupe: + - ?", "on the feature under the cursor: + seen, - looked for and not seen, ? not looked for (Delete too); ↑↓ PgUp PgDn move; Ctrl+Z puts back the mark changed last (again: the one before)"),
        ("Loupe: typing", "letters find features by name or description (several words: all must match); Backspace edits, Esc clears"),
        ("Mouse", "click a field or a tab; click a choice to cycle it"),
    ];

    /// <summary>How to read the answer and the rules a user meets on the pages.</summary>
    public static IReadOnlyList<string> Reading { get; } =
    [
        "The answer leads with the species and its total over the whole catalogue, then how it splits by origin (natural, synthetic, treated, composite, imitation, cultured). The candidates follow grouped by species, best first within each; Enter on one opens why.",
        "<1% and >99%: bench readings never make a material impossible or certain, so no probability short of that is shown as 0% or 100%.",
        "Species of one mineral group (the tourmalines, the garnets, the feldspars, spinel and its kin) that share the answer are given their group's total too (\"tourmaline group 99% in all\"): a bench test may hint which species, a laboratory's analysis settles it.",
        "Optic character, under readings used: what the rotation series says (uniaxial, biaxial or singly refractive, each with its chance), worked out from the edges as read, not from a fixed rule, and from the dichroscope's two or three colours when they were read (three colours come only from a biaxial crystal; the answer warns when they go against the leading material).",
        "Polariscope and dichroscope: leave them blank when no light passes through the stone. On a stone described as opaque (F2), 'stays dark', one colour and no fire are what any opaque stone shows and are not weighed; any other reaction is taken as a sign that light passed, which counts against the opaque materials, and is named in a warning.",
        "Cut (F2): a faceted stone shows no star and no cat's-eye (both glide over a domed top), so it counts them as looked for and not seen, and it weighs against a material met only as an aggregate (massive stones are cut as cabochons, beads and carvings); a cabochon or another cut says nothing on its own. The cutting style beside it is a description for the report.",
        "Transparency (F2): when the description starts with transparent, translucent or opaque it is a reading; it weighs no material, but an opaque stone is advised no polariscope, dichroscope or fire, and under the loupe only what shows on a surface.",
        "Colour: plain words, as you would say them (yellow, bluish green, blue-green). The last hue named is the colour; an -ish or -y word only tones it (bluish green is a green). A word the tool does not know is named in a warning and given no weight.",
        "SG: type it, or weigh the stone in air and in water. With both filled in neither is used until one is cleared; the SG page says both values and whether they agree.",
        "Reflectance (F5): a reflectance meter's reading in percent (1 to 30) on a well-polished facet, weighed as the index it gives by Fresnel's law (taken as ± 0.5 points, about ± 0.03 in the index near diamond's). Past the refractometer's limit it parts diamond (about 17.2 %), cubic zirconia (13.5 %) and synthetic moissanite (20.4 to 20.9 %); a poor polish reads low. Opaque, metallic materials are not weighed by it.",
        "Examiner: typed once at the foot of F2 Stone, kept in the workbook and named in every exported report; the export's confirmation says who.",
    ];

    public static IReadOnlyList<string> Cautions { get; } =
    [
        "Contact liquids for refractometers (and heavy liquids for SG) are toxic: use little, keep the room aired, wear gloves, never let them touch skin, wash off spills at once.",
        "Ultraviolet lamps harm eyes and skin: never look into the lamp, use the viewing cabinet or UV-blocking glasses.",
        "Do not immerse porous, soluble or fragile stones (opal, turquoise, pearl, amber and the like) in water or heavy liquids; the SG page warns when such a stone is among the likely materials.",
        "Trade in elephant ivory, tortoiseshell, black and golden coral, some red corals and conch shell is restricted by CITES, and mammoth ivory by some countries' rules: the answer names the rule when such a material is a candidate; check the rules where you buy, sell or ship.",
        "An identification here is an aid to your own judgement, not a certificate. Defer to local rules and licensed practice; refer valuable or doubtful stones to a qualified laboratory.",
    ];

    public static string Render()
    {
        int width = Keys.Max(k => k.Key.Length);
        return string.Join('\n', [
            "KEYS", .. Keys.Select(k => $"  {k.Key.PadRight(width)}  {k.Does}"), "",
            "READING THE ANSWER", .. Reading.Select(r => "  * " + r), "",
            "CAUTIONS", .. Cautions.Select(c => "  * " + c)]);
    }
}
