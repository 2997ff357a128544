using System.Globalization;
using GemIndex.Cli.CommandLine;
using GemIndex.Core.Catalogue;

namespace GemIndex.Cli.TextUi.CatalogueBrowser;

/// <summary>
/// The catalogue list filtered by a search over name, species, variety and colours, or by numbers: one number is an
/// SG below the refractometer's scale (1.30) and from 2.5, and from 1.30 to 2.5 an index first, then an SG; two numbers
/// ("1.544 2.65") are an index and an SG. Number searches list the entries whose ranges hold every number (within the
/// tolerances), closest first.
/// </summary>
internal sealed class CatalogueBrowserModel(IReadOnlyList<Material> materials)
{
    private readonly IReadOnlyList<Material> catalogue = materials;

    /// <summary>How far a typed number may lie outside an entry's index (±0.01) or SG (±0.05) range and still match: common practice tolerances.</summary>
    public const double IndexTolerance = 0.01, SgTolerance = 0.05;

    /// <summary>A single number from the scale's bottom to this is read as an index first, then as an SG; above it, an SG.</summary>
    public const double HighestIndex = 2.5;

    public IReadOnlyList<Material> Shown { get; private set; } = materials;

    /// <summary>Why the search found nothing when the text itself is the fault (a decimal comma), or null.</summary>
    public string? Problem { get; private set; }

    public void Search(string text)
    {
        string q = text.Trim();
        Problem = null;
        if (q.Length == 0) { Shown = catalogue; return; }
        // "1,762" is an index with a decimal comma, not the numbers 1 and 762: said, not searched.
        if (System.Text.RegularExpressions.Regex.Match(q, @"\d,\d") is { Success: true })
        {
            Shown = [];
            Problem = $"'{q}': a dot is the decimal mark (1.762), not a comma";
            return;
        }
        if (Numbers(q) is { } numbers)
        {
            // Nearest first; among entries whose ranges hold every value, the commoner at a bench first, then the centred
            // (spinel, 1.712–1.736, had come after two screens of rarer entries for its textbook 1.718).
            IEnumerable<Material> Near(double? index, double? sg) =>
                catalogue.Select(m => (m, Distance: Distance(m, index, sg))).Where(p => p.Distance is not null)
                    .OrderBy(p => p.Distance!.Value.Outside).ThenBy(p => p.m.Frequency).ThenBy(p => p.Distance!.Value.Middle).Select(p => p.m);
            double x = numbers[0];
            // Two numbers are an index and an SG. One below the refractometer's scale (1.30) can only be an SG (amber's
            // 1.08); one from there to 2.5 is read as an index first, then as an SG (opal's 2.15 after the index 2.15).
            Shown = numbers.Count == 2 ? [.. Near(numbers[0], numbers[1])]
                : x < Core.Optics.Refractometer.RefractometerProfile.ScaleBottom || x >= HighestIndex ? [.. Near(null, x)]
                : [.. Near(x, null).Concat(Near(null, x)).Distinct()];
            return;
        }
        Shown = [.. catalogue.Where(m => Matches(m, q)).OrderBy(m => Closeness(m, q))];   // stable: the catalogue's order within each kind
    }

    /// <summary>How a word search matches an entry, best first: the species or the name itself, then the name, then the variety, family or a colour.</summary>
    private static int Closeness(Material m, string q) =>
        string.Equals(m.Species, q, StringComparison.OrdinalIgnoreCase) || string.Equals(m.Name, q, StringComparison.OrdinalIgnoreCase) ? 0
        : m.Name.Contains(q, StringComparison.OrdinalIgnoreCase) ? 1
        : 2;

    /// <summary>One or two numbers separated by spaces, or null when the search is words.</summary>
    private static IReadOnlyList<double>? Numbers(string q)
    {
        string[] parts = q.Split([' ', ',', ';'], StringSplitOptions.RemoveEmptyEntries);
        if (parts.Length is < 1 or > 2) return null;
        var numbers = new List<double>();
        foreach (string p in parts)
        {
            if (!double.TryParse(p, NumberStyles.Float, CultureInfo.InvariantCulture, out double x) || !double.IsFinite(x)) return null;
            numbers.Add(x);
        }
        return numbers;
    }

    /// <summary>
    /// How far the typed values are from an entry, in tolerances (0 inside a range; then the distance to the range's
    /// middle breaks ties), or null when a value lies beyond its tolerance.
    /// </summary>
    private static (double Outside, double Middle)? Distance(Material m, double? index, double? sg)
    {
        (double Outside, double Middle) total = (0, 0);
        if (index is { } n)
        {
            // Within the span of the entry's indices; closeness to the nearer of its lowest and highest index (an edge as read).
            if (Away(m.Indices.Lowest.Minimum, m.Indices.Highest.Maximum, n, IndexTolerance) is null) return null;
            var lowest = Parts(m.Indices.Lowest.Minimum, m.Indices.Lowest.Maximum, n, IndexTolerance);
            var highest = Parts(m.Indices.Highest.Minimum, m.Indices.Highest.Maximum, n, IndexTolerance);
            var nearer = lowest.Outside + lowest.Middle <= highest.Outside + highest.Middle ? lowest : highest;
            total = (total.Outside + nearer.Outside, total.Middle + nearer.Middle);
        }
        if (sg is { } g)
        {
            if (Away(m.SpecificGravity.Minimum, m.SpecificGravity.Maximum, g, SgTolerance) is null) return null;
            var parts = Parts(m.SpecificGravity.Minimum, m.SpecificGravity.Maximum, g, SgTolerance);
            total = (total.Outside + parts.Outside, total.Middle + parts.Middle);
        }
        return total;
    }

    /// <summary><see cref="Closeness"/> in its two parts: tolerances outside the range, and the tie-breaking hundredths from its middle.</summary>
    private static (double Outside, double Middle) Parts(double low, double high, double x, double tolerance) =>
        (Outside(low, high, x) / tolerance, Math.Abs(x - (low + high) / 2) / (tolerance * 100));

    private static double? Away(double low, double high, double x, double tolerance) =>
        Outside(low, high, x) > tolerance ? null : Closeness(low, high, x, tolerance);

    private static double Outside(double low, double high, double x) => x < low ? low - x : x > high ? x - high : 0;

    /// <summary>Tolerances outside the range, plus a hundredth of a tolerance per tolerance from its middle (ties go to the centred entry).</summary>
    private static double Closeness(double low, double high, double x, double tolerance) =>
        Parts(low, high, x, tolerance) is var (outside, middle) ? outside + middle : 0;

    // The origin's word too ("synthetic" finds laboratory-grown diamond and cubic zirconia, whose names do not say it).
    private static bool Matches(Material m, string q) =>
        new[] { m.Name, m.Species, m.Variety, m.Family, m.Origin.ToString() }.Concat(m.Colours).Any(s => s.Contains(q, StringComparison.OrdinalIgnoreCase));

    /// <summary>The width the names need: the longest shown, or what <paramref name="width"/> leaves beside the numbers.</summary>
    public int NameWidth(int width) => Math.Max(12, Math.Min(Shown.Count == 0 ? 12 : Shown.Max(m => m.Name.Length), width - NumbersWidth));

    /// <summary>" 1.544–1.553  SG 2.65–2.66" beside the name.</summary>
    private const int NumbersWidth = 28;

    public string Line(Material m, int nameWidth) =>
        $"{Results.ResultText.Clip(m.Name, nameWidth).PadRight(nameWidth)} {Range(new PropertyRange(m.Indices.Lowest.Minimum, m.Indices.Highest.Maximum), "0.000").PadRight(11)}  SG {Range(m.SpecificGravity, "0.00")}";

    /// <summary>A range at the given decimals; one number when both ends print the same ("copal 1.540", not "1.540–1.540").</summary>
    private static string Range(PropertyRange r, string format)
    {
        string low = r.Minimum.ToString(format, CultureInfo.InvariantCulture), high = r.Maximum.ToString(format, CultureInfo.InvariantCulture);
        return low == high ? low : $"{low}–{high}";
    }

    public static string Details(Material m)
    {
        using var w = new StringWriter(CultureInfo.InvariantCulture);
        MaterialText.WriteDetails(w, m);
        return w.ToString();
    }
}
