using System.Globalization;
using GemIndex.Cli.CommandLine;
using GemIndex.Core.Catalogue;

namespace GemIndex.Cli.TextUi.CatalogueBrowser;

/// <summary>The catalogue list filtered by a search over name, species, variety and colours, or by an index or SG typed as a number.</summary>
internal sealed class CatalogueBrowserModel(IReadOnlyList<Material> materials)
{
    private readonly IReadOnlyList<Material> catalogue = materials;

    /// <summary>How far a typed number may lie outside an entry's index (±0.01) or SG (±0.05) range and still match: common practice tolerances.</summary>
    public const double IndexTolerance = 0.01, SgTolerance = 0.05;

    public IReadOnlyList<Material> Shown { get; private set; } = materials;

    public void Search(string text)
    {
        string q = text.Trim();
        Shown = q.Length == 0 ? catalogue
            : double.TryParse(q, NumberStyles.Float, CultureInfo.InvariantCulture, out double x) && double.IsFinite(x)
                ? [.. catalogue.Where(m => x < 2.5 ? Near(m.Indices.Lowest, m.Indices.Highest, x) : Near(m.SpecificGravity, m.SpecificGravity, x, SgTolerance))]
                : [.. catalogue.Where(m => Matches(m, q))];
    }

    private static bool Near(PropertyRange low, PropertyRange high, double x, double tolerance = IndexTolerance) =>
        x >= low.Minimum - tolerance && x <= high.Maximum + tolerance;

    private static bool Matches(Material m, string q) =>
        new[] { m.Name, m.Species, m.Variety, m.Family }.Concat(m.Colours).Any(s => s.Contains(q, StringComparison.OrdinalIgnoreCase));

    public string Line(Material m) =>
        $"{ResultsClip(m.Name, 26),-26} {m.Indices.Lowest.Minimum.ToString("0.000", CultureInfo.InvariantCulture)}-{m.Indices.Highest.Maximum.ToString("0.000", CultureInfo.InvariantCulture)} SG {m.SpecificGravity.ToString("0.00")}";

    public static string Details(Material m)
    {
        using var w = new StringWriter(CultureInfo.InvariantCulture);
        MaterialText.WriteDetails(w, m);
        return w.ToString();
    }

    private static string ResultsClip(string s, int width) => Results.ResultText.Clip(s, width);
}
