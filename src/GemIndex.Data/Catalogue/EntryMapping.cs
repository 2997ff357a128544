using GemIndex.Core.Catalogue;
using GemIndex.Core.Observations;
using GemIndex.Core.Optics.Indicatrix;
using GemIndex.Core.Quantities;

namespace GemIndex.Data.Catalogue;

/// <summary>
/// Turns an entry's identity and its (inherited and own) fields into a Core <see cref="Material"/>, reporting every
/// field that cannot be read (unknown word, a range that is not [min, max], indices that do not fit the optic
/// character, a required field missing) by its source-file field name. Consistency between fields is the
/// <see cref="CatalogueCheck"/>'s job.
/// </summary>
internal static class EntryMapping
{
    /// <summary>
    /// A variety (or user row) over the fields it inherits: the merged fields, the stated ones listed, each value's
    /// source from the variety where it states the field and from the inherited side otherwise. A variety "like" a
    /// sibling inherits the sibling's merged fields; <paramref name="inheritedStated"/> (the sibling's stated fields)
    /// then joins the entry's stated fields, so they name every field that does not come from the species.
    /// </summary>
    public static Material? Flatten(EntryIdentity id, EntryFieldsDocument? inherited, Func<string, ValueSource?> inheritedSource,
        EntryFieldsDocument own, Func<string, ValueSource?> ownSource, Action<string, string> error,
        IReadOnlyCollection<string>? inheritedStated = null)
    {
        EntryFieldsDocument merged = inherited is null ? own : own.Over(inherited);
        string[] ownStated = inherited is null ? [] : [.. own.Stated()];
        var sources = new Dictionary<string, ValueSource>();
        foreach (string field in merged.Stated())
            if ((inherited is null || ownStated.Contains(field) ? ownSource(field) : inheritedSource(field)) is { } source) sources[field] = source;
        string[] stated = inheritedStated is null ? ownStated
            : [.. merged.Stated().Where(f => ownStated.Contains(f) || inheritedStated.Contains(f))];
        return ToMaterial(id, merged, sources, stated, error);
    }

    public static Material? ToMaterial(EntryIdentity id, EntryFieldsDocument e, IReadOnlyDictionary<string, ValueSource> sources,
        IReadOnlyList<string> stated, Action<string, string> error)
    {
        bool failed = false;
        void Fail(string field, string problem) { failed = true; error(field, problem); }

        OpticCharacter character = Word<OpticCharacter>("optic_character", id.OpticCharacter, Fail);
        OpticalIndices? indices = failed ? null : Indices(e, character, Fail); // which indices are needed depends on the character
        bool opaque = e.Opaque ?? false;
        if (e.Sg is null) Fail("sg", "required: the specific gravity range [min, max]");
        if (e.Forms is null or { Length: 0 }) Fail("forms", $"required: one or more of {CatalogueWords.Expected<MaterialForm>().Replace("none, ", "", StringComparison.Ordinal)}");
        if (e.Colours is null or { Length: 0 }) Fail("colours", "required: one or more plain lower-case colour words");
        if (e.Polariscope is null && !opaque) Fail("polariscope", "required unless the entry is opaque: a list of reactions");
        var material = new Material
        {
            Name = id.Name, Species = id.Species, Variety = id.Variety, Family = id.Family,
            Origin = Word<OriginClass>("origin", id.Origin, Fail),
            CrystalSystem = Word<CrystalSystem>("crystal_system", id.CrystalSystem, Fail),
            Indices = indices ?? OpticalIndices.SingleIndex(default), // replaced by null below when anything failed
            Sign = e.OpticSign is null ? OpticSign.None : Word<OpticSign>("optic_sign", e.OpticSign, Fail),
            Birefringence = Range("birefringence", e.Birefringence, Fail),
            SpecificGravity = Range("sg", e.Sg, Fail) ?? default,
            SpecificGravityUsual = Range("sg_usual", e.SgUsual, Fail),
            Dispersion = e.Dispersion,
            Hardness = Range("hardness", e.Hardness, Fail),
            Pleochroism = e.Pleochroism is null ? PleochroismStrength.None : Word<PleochroismStrength>("pleochroism", e.Pleochroism, Fail),
            Polariscope = Words<PolariscopeReaction>("polariscope", e.Polariscope ?? [], Fail),
            ThermalProbe = e.ThermalProbe is null ? ThermalProbeResult.Negative : Word<ThermalProbeResult>("thermal_probe", e.ThermalProbe, Fail),
            Electrical = e.Electrical is null ? ElectricalResult.Insulating : Word<ElectricalResult>("electrical", e.Electrical, Fail),
            UvLong = Words<FluorescenceStrength>("uv_long", e.UvLong ?? [], Fail),
            UvShort = Words<FluorescenceStrength>("uv_short", e.UvShort ?? [], Fail),
            AbsorptionLines = [.. (e.Absorption ?? []).Select(a => new AbsorptionLine(a.Nm, Word<LineStrength>("absorption", a.Strength, Fail)))],
            Colours = e.Colours ?? [],
            Frequency = Word<BenchFrequency>("share", id.Share, Fail),
            SpeciesFrequency = Word<BenchFrequency>("frequency", id.Frequency, Fail),
            Forms = Forms(e.Forms ?? [], Fail),
            IsOpaque = opaque,
            DoNotImmerse = e.DoNotImmerse ?? false,
            Notes = e.Notes ?? "",
            Sources = sources,
            StatedFields = stated,
        };
        if (material.Colours.Any(c => string.IsNullOrWhiteSpace(c) || c != c.ToLowerInvariant()))
            Fail("colours", $"colours must be non-empty lower-case words; got [{string.Join(", ", material.Colours)}]");
        return failed || indices is null ? null : material;
    }

    private static MaterialForm Forms(string[] words, Action<string, string> fail)
    {
        MaterialForm forms = MaterialForm.None;
        foreach (string w in words)
        {
            if (w != "none" && CatalogueWords.TryParse(w, out MaterialForm f)) forms |= f;
            else fail("forms", $"'{w}' is not one of crystal, aggregate, amorphous");
        }
        return forms;
    }

    private static OpticalIndices? Indices(EntryFieldsDocument e, OpticCharacter character, Action<string, string> fail)
    {
        string[] needed = character switch
        {
            OpticCharacter.Uniaxial => ["omega", "epsilon"],
            OpticCharacter.Biaxial => ["alpha", "beta", "gamma"],
            _ => ["n"],
        };
        var given = new Dictionary<string, double[]?>
        {
            ["n"] = e.N, ["omega"] = e.Omega, ["epsilon"] = e.Epsilon, ["alpha"] = e.Alpha, ["beta"] = e.Beta, ["gamma"] = e.Gamma,
        };
        bool ok = true;
        foreach (string field in CatalogueFields.Indices)
        {
            if (needed.Contains(field) && given[field] is null) { fail(field, $"required for {Article(character)} material"); ok = false; }
            if (!needed.Contains(field) && given[field] is not null)
            {
                fail(field, $"not allowed for {Article(character)} material, which uses {string.Join(", ", needed)}");
                ok = false;
            }
        }
        if (!ok) return null;
        PropertyRange?[] r = [.. needed.Select(f => Range(f, given[f], fail))];
        if (r.Any(x => x is null)) return null;
        return character switch
        {
            OpticCharacter.Uniaxial => OpticalIndices.Uniaxial(r[0]!.Value, r[1]!.Value),
            OpticCharacter.Biaxial => OpticalIndices.Biaxial(r[0]!.Value, r[1]!.Value, r[2]!.Value),
            _ => OpticalIndices.SingleIndex(r[0]!.Value, character),
        };
    }

    private static string Article(OpticCharacter character)
    {
        string word = CatalogueWords.Of(character);
        return (word[0] is 'a' or 'i' ? "an " : "a ") + word; // "a uniaxial", "an isotropic"
    }

    public static PropertyRange? Range(string field, double[]? pair, Action<string, string> fail)
    {
        if (pair is null) return null;
        if (pair.Length != 2) { fail(field, $"expected [min, max] (two numbers), got {pair.Length}"); return null; }
        try
        {
            return new PropertyRange(pair[0], pair[1], field);
        }
        catch (QuantityOutOfRangeException ex)
        {
            fail(field, ex.Message);
            return null;
        }
    }

    public static T Word<T>(string field, string? word, Action<string, string> fail) where T : struct, Enum
    {
        if (CatalogueWords.TryParse(word, out T value)) return value;
        fail(field, $"'{word}' is not one of {CatalogueWords.Expected<T>()}");
        return default;
    }

    private static T[] Words<T>(string field, string[] words, Action<string, string> fail) where T : struct, Enum =>
        [.. words.Select(w => Word<T>(field, w, fail))];
}
