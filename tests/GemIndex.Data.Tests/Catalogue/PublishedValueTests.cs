using System.Globalization;
using GemIndex.Core.Catalogue;
using GemIndex.Data.Catalogue;

namespace GemIndex.Data.Tests.Catalogue;

/// <summary>The shipped catalogue's built values against every published-values-*.tsv next to this file: one case per row.</summary>
public sealed class PublishedValueTests(PublishedValueTests.BuiltCatalogue built) : IClassFixture<PublishedValueTests.BuiltCatalogue>
{
    /// <summary>The shipped catalogue built once into a temporary cache for all rows.</summary>
    public sealed class BuiltCatalogue : IDisposable
    {
        private readonly TempDirectory _cache = new();

        public BuiltCatalogue() => Materials = ShippedCatalogue.Load(_cache.Path);

        public IReadOnlyList<Material> Materials { get; }

        public void Dispose() => _cache.Dispose();
    }

    public static TheoryData<string, int, string, string, string, string, string> Rows()
    {
        var data = new TheoryData<string, int, string, string, string, string, string>();
        string folder = Path.Combine(AppContext.BaseDirectory, "Catalogue");
        foreach (string path in Directory.GetFiles(folder, "published-values-*.tsv").Order(StringComparer.Ordinal))
        {
            string[] lines = File.ReadAllLines(path);
            for (int i = 0; i < lines.Length; i++)
            {
                if (lines[i].Length == 0 || lines[i].StartsWith('#') || lines[i].StartsWith("entry\t", StringComparison.Ordinal)) continue;
                string[] c = lines[i].Split('\t');
                // A malformed row becomes a case that fails, naming its file and line, rather than vanishing.
                if (c.Length != 5) data.Add(Path.GetFileName(path), i + 1, lines[i], "(row)", "", "", $"{c.Length} columns; expected 5");
                else data.Add(Path.GetFileName(path), i + 1, c[0], c[1], c[2], c[3], c[4]);
            }
        }
        return data;
    }

    [Theory]
    [MemberData(nameof(Rows))]
    public void The_shipped_catalogue_holds_the_published_value(string file, int line, string entry, string field, string published, string tolerance, string source)
    {
        string where = $"{file} line {line}: {entry}, {field} {published} ± {tolerance} ({source})";
        Assert.True(field != "(row)", $"{where}: malformed row");
        Material? m = built.Materials.FirstOrDefault(x => x.Name == entry);
        Assert.True(m is not null, $"{where}: no shipped entry of that name");
        double value = double.Parse(published, CultureInfo.InvariantCulture), within = double.Parse(tolerance, CultureInfo.InvariantCulture);
        string name = field.EndsWith("_min", StringComparison.Ordinal) || field.EndsWith("_max", StringComparison.Ordinal) ? field[..^4] : field;
        if (field == "dispersion")
        {
            Assert.True(m.Dispersion is { } d && Math.Abs(d - value) <= within, $"{where}: the catalogue gives {m.Dispersion?.ToString(CultureInfo.InvariantCulture) ?? "none"}");
            return;
        }
        PropertyRange? range = CatalogueFields.Inheritable.Contains(name) ? MaterialFieldText.RangeOf(m, name) : null;
        Assert.True(range is not null, $"{where}: the entry has no {name} range (fields: X, X_min, X_max for a range, or dispersion)");
        PropertyRange r = range.Value;
        bool holds = field.EndsWith("_min", StringComparison.Ordinal) ? Math.Abs(r.Minimum - value) <= within
            : field.EndsWith("_max", StringComparison.Ordinal) ? Math.Abs(r.Maximum - value) <= within
            : value >= r.Minimum - within && value <= r.Maximum + within;
        Assert.True(holds, $"{where}: the catalogue gives {r.ToString("0.#####")}");
    }
}
