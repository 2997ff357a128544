using System.Security.Cryptography;
using GemIndex.Core.Catalogue;
using GemIndex.Core.Optics;
using GemIndex.Data.ColourVarieties;
using GemIndex.Data.Magnification;
using GemIndex.Data.MineralGroups;
using GemIndex.Data.TradeRules;

namespace GemIndex.Data.Catalogue;

/// <summary>
/// The catalogue that ships inside GemIndex.Data: its family files and schema are embedded resources, and on
/// first use they are built into a SQLite file in the cache folder, named by a hash of those sources, so an
/// edited catalogue (or schema) rebuilds itself and an old cache file is simply never opened again.
/// </summary>
public static class ShippedCatalogue
{
    private const string MaterialsPrefix = "GemIndex.Catalogue.materials.";

    /// <summary>The embedded family files, in ordinal file-name order.</summary>
    public static IReadOnlyList<FamilySource> Sources { get; } = LoadSources();

    /// <summary>The embedded reference-db/sources.json: the references every family file may name.</summary>
    public static string SharedReferences { get; } = System.Text.Encoding.UTF8.GetString(CatalogueSchema.EmbeddedBytes("GemIndex.Catalogue.sources.json"));

    /// <summary>The first 16 hex digits of the SHA-256 of the embedded schema, sources.json and family files (names and bytes).</summary>
    public static string ContentHash { get; } = HashOf(Sources);

    private static readonly Lazy<FamilyCatalogue> Read = new(() => FamilyFileReader.ReadCatalogue(Sources));

    /// <summary>The embedded family files read (once): species and references included, for checks and inheriting user rows.</summary>
    /// <exception cref="CatalogueFormatException">An embedded family file cannot be read.</exception>
    public static FamilyCatalogue Families => Read.Value;

    /// <summary>The built file's path inside a cache folder.</summary>
    public static string PathIn(string cacheDirectory) => Path.Combine(cacheDirectory, $"catalogue-{ContentHash}.db");

    /// <summary>Builds the catalogue into the cache folder unless a readable build of the same sources is there; returns its path.</summary>
    /// <exception cref="CatalogueFormatException">An embedded family file cannot be read.</exception>
    public static string EnsureBuilt(string cacheDirectory)
    {
        string path = PathIn(cacheDirectory);
        if (File.Exists(path))
        {
            try
            {
                using (CatalogueStore store = CatalogueStore.Open(path))
                    if (store.SchemaVersion == CatalogueSchema.Version) return path;
            }
            catch (Exception e) when (e is CatalogueStoreException or CatalogueSchemaVersionException)
            {
                // Our own cache from another version or damaged: rebuilt below, never patched.
            }
        }
        CatalogueBuilder.Write(Families.Materials, path, "shipped", ContentHash);
        return path;
    }

    /// <summary>Every shipped material with its magnification profile, trade rule and mineral group attached, building the cache file first if needed.</summary>
    public static IReadOnlyList<Material> Load(string cacheDirectory)
    {
        using CatalogueStore store = CatalogueStore.Open(EnsureBuilt(cacheDirectory));
        return WithRulesAndGroups(MagnificationTable.Embedded.Attach(store.LoadAll()));
    }

    /// <summary>
    /// Entries with their trade rule, mineral group and colour-named variety attached (trade-rules.json,
    /// mineral-groups.json, colour-varieties.json): the shipped entries here, the user's own in <see cref="MergedCatalogue"/>,
    /// by the same tables.
    /// </summary>
    internal static IReadOnlyList<Material> WithRulesAndGroups(IReadOnlyList<Material> materials) =>
        WithGlassRefractivity(ColourVarietyTable.Embedded.Attach(MineralGroupTable.Embedded.Attach(TradeRuleTable.Embedded.Attach(materials))));

    /// <summary>The catalogue's species of man-made glass, whose entries keep its specific refractivity.</summary>
    public const string ManMadeGlassSpecies = "glass";

    /// <summary>
    /// Every entry of the man-made glass species, shipped or the user's own, with the specific refractivity of man-made
    /// glass (<see cref="GladstoneDale.ManMadeGlass"/>): its SG is weighed given the index read (docs/ranking.md §2).
    /// </summary>
    internal static IReadOnlyList<Material> WithGlassRefractivity(IReadOnlyList<Material> materials) =>
        [.. materials.Select(m => m.Species == ManMadeGlassSpecies ? m with { SpecificRefractivity = GladstoneDale.ManMadeGlass } : m)];

    private static IReadOnlyList<FamilySource> LoadSources() =>
        [.. typeof(ShippedCatalogue).Assembly.GetManifestResourceNames()
            .Where(n => n.StartsWith(MaterialsPrefix, StringComparison.Ordinal))
            .Order(StringComparer.Ordinal)
            .Select(n => new FamilySource(n[MaterialsPrefix.Length..],
                System.Text.Encoding.UTF8.GetString(CatalogueSchema.EmbeddedBytes(n))))];

    /// <summary>The first 16 hex digits of the SHA-256 of the schema, sources.json and the given family files (names and text).</summary>
    public static string HashOf(IReadOnlyList<FamilySource> sources)
    {
        using var sha = IncrementalHash.CreateHash(HashAlgorithmName.SHA256);
        sha.AppendData(System.Text.Encoding.UTF8.GetBytes($"schema {CatalogueSchema.Version}\n{CatalogueSchema.Sql}\n{SharedReferences}\n"));
        foreach (FamilySource s in sources)
            sha.AppendData(System.Text.Encoding.UTF8.GetBytes($"{s.FileName}\n{s.Json.Length}\n{s.Json}\n"));
        return Convert.ToHexStringLower(sha.GetHashAndReset())[..16];
    }
}
