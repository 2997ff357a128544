using System.Globalization;
using GemIndex.Core.Observations;
using GemIndex.Core.Optics.Indicatrix;

namespace GemIndex.Core.Catalogue;

/// <summary>
/// Consistency rules every catalogue entry must meet before the ranking may trust it: physical ranges,
/// birefringence that agrees with the index ranges, β within α..γ, an optic sign that agrees with the indices,
/// an optic character that agrees with the crystal system, a dispersion in plausible proportion to the index,
/// no polariscope or pleochroism reaction on an opaque entry, a source for every number, a variety that states
/// only what differs from its species (or, written "like" a sibling variety, from that sibling, and differs from it in
/// origin or in a stated field) and stays inside its species' ranges, and unique names. The sign rules are
/// common practice in mineral optics (uniaxial positive when ε &gt; ω; biaxial positive when γ − β &gt; β − α);
/// the numeric bounds are our own sanity limits, wide enough for any gem material; the dispersion constants are
/// explained where they are declared and in reference-db/README.md ("Check rules"). Pure: the same list always
/// gives the same findings, in entry order.
/// </summary>
public static class CatalogueCheck
{
    /// <summary>Refractive indices must lie strictly above this (vacuum).</summary>
    public const double IndexLowerBound = 1.0;

    /// <summary>Refractive indices must lie strictly below this (our sanity bound, above any gem material).</summary>
    public const double IndexUpperBound = 3.5;

    /// <summary>Specific gravities must lie strictly above this (our sanity bound, below any gem material).</summary>
    public const double SpecificGravityLowerBound = 0.5;

    /// <summary>Specific gravities must lie strictly below this (our sanity bound, above any gem material).</summary>
    public const double SpecificGravityUpperBound = 25;

    /// <summary>
    /// The least dispersive power (nG − nB)/(n − 1) an ordinary optical material shows: the G–B to C–F ratio
    /// <see cref="GeeBeeToCeeEffRatio"/> over the highest Abbe number a bench meets, about 95 for calcium fluoride
    /// (from memory), taken as 120 because the trade's figures for weakly dispersive minerals are rough (enstatite's
    /// 0.010 at n 1.66 implies about 110). A C–F value given where nG − nB is meant still falls below this for
    /// low-dispersion materials (fluorite's C–F value 0.0045 at n 1.434 gives 0.010).
    /// </summary>
    public const double LeastDispersivePower = GeeBeeToCeeEffRatio / 120;

    /// <summary>
    /// The greatest dispersive power (nG − nB)/(n − 1): the ratio over the lowest Abbe number, about 9 to 10 for rutile
    /// (from memory), taken as 7 because near an absorption edge the blue end disperses faster than the ratio says.
    /// </summary>
    public const double GreatestDispersivePower = GeeBeeToCeeEffRatio / 7;

    /// <summary>
    /// nG − nB over nF − nC for ordinary optical materials: 1.70 for fused silica (Malitson 1965, J. Opt. Soc. Am. 55,
    /// 1205, Sellmeier evaluated at 430.8/686.7 and 486.1/656.3 nm), 1.70 for sapphire's ordinary ray and 1.73 for
    /// diamond (Sellmeier coefficients from memory, DOMAIN.md §7). A C–F value is about 1/1.7 of the G–B value.
    /// </summary>
    public const double GeeBeeToCeeEffRatio = 1.70;

    /// <summary>
    /// Two entries of one species whose dispersions differ by this factor or more: the lower is likely a C–F value
    /// (a factor of about 1.7). 1.4 lies above the spread between real varieties (synthetic rutile 0.33 against
    /// natural 0.28 is 1.18) and below 1.7 less the rounding of figures quoted to three decimals (a judgement).
    /// </summary>
    public const double DispersionSpreadWithinSpecies = 1.4;

    /// <summary>Half a unit in the third decimal: the rounding of catalogue dispersions, allowed in the band check.</summary>
    public const double DispersionRounding = 0.0005;

    /// <summary>
    /// Every finding for a whole catalogue: each entry's own rules, each variety against its species' own values
    /// (when <paramref name="species"/> is given), dispersions within one species, then names used more than once.
    /// </summary>
    /// <param name="materials">The entries, in catalogue order.</param>
    /// <param name="species">The species' own values by species name (a material built from the species fields alone).</param>
    /// <param name="likes">
    /// The entries written "like" a sibling variety, by entry name: each is checked against its sibling
    /// (<see cref="CheckAgainstSibling"/>) instead of against its species.
    /// </param>
    public static IReadOnlyList<CatalogueFinding> Check(IReadOnlyList<Material> materials, IReadOnlyDictionary<string, Material>? species = null,
        IReadOnlyDictionary<string, Likeness>? likes = null)
    {
        ArgumentNullException.ThrowIfNull(materials);
        var findings = new List<CatalogueFinding>();
        foreach (Material m in materials)
        {
            findings.AddRange(CheckEntry(m));
            Material? own = species is not null && species.TryGetValue(m.Species, out Material? s) ? s : null;
            if (likes is not null && likes.TryGetValue(m.Name, out Likeness? like)) findings.AddRange(CheckAgainstSibling(m, like, own));
            else if (own is not null) findings.AddRange(CheckAgainstSpecies(m, own));
        }
        findings.AddRange(CheckDispersionWithinSpecies(materials));
        var seen = new Dictionary<string, string>(StringComparer.OrdinalIgnoreCase);
        foreach (Material m in materials)
        {
            if (seen.TryGetValue(m.Name, out string? first))
                findings.Add(new(m.Name, "name", $"the name is already used by entry '{first}' (names are compared ignoring case)", FileOf(m)));
            else seen[m.Name] = m.Name;
        }
        return findings;
    }

    /// <summary>The findings for one entry on its own (every rule that needs no other entry).</summary>
    /// <param name="material">The entry.</param>
    public static IReadOnlyList<CatalogueFinding> CheckEntry(Material material)
    {
        ArgumentNullException.ThrowIfNull(material);
        var f = new List<CatalogueFinding>();
        void Add(string field, string problem) => f.Add(new(material.Name, field, problem, FileOf(material)));
        CheckText(material, Add);
        CheckRanges(material, Add);
        CheckBirefringence(material, Add);
        CheckSign(material, Add);
        CheckCharacter(material, Add);
        CheckDispersionBand(material, Add);
        CheckOpaque(material, Add);
        CheckSources(material, Add);
        return f;
    }

    /// <summary>
    /// A variety against its species: every field it states must differ from the species' value, and a stated range
    /// must lie inside the species' range.
    /// </summary>
    /// <param name="variety">The flattened variety (its <see cref="Material.StatedFields"/> say what it states itself).</param>
    /// <param name="species">The species' own values.</param>
    public static IReadOnlyList<CatalogueFinding> CheckAgainstSpecies(Material variety, Material species)
    {
        ArgumentNullException.ThrowIfNull(variety);
        ArgumentNullException.ThrowIfNull(species);
        var f = new List<CatalogueFinding>();
        foreach (string field in variety.StatedFields)
        {
            string own = MaterialFieldText.Of(variety, field), inherited = MaterialFieldText.Of(species, field);
            if (own == inherited)
                f.Add(new(variety.Name, field, $"repeats its species' value {own}; state only what differs from species '{species.Name}'", FileOf(variety)));
            else if (OutsideSpecies(variety, field, species) is { } problem) f.Add(new(variety.Name, field, problem, FileOf(variety)));
        }
        return f;
    }

    /// <summary>
    /// A variety written "like" a sibling of its species (reference-db/README.md, "Varieties like a sibling"): it takes
    /// the sibling's values for every field it does not state, so what it states must differ from the sibling's value
    /// (else it is a copy of the sibling's number), a stated range must lie inside its species' range, and it must differ
    /// from the sibling in origin or in at least one stated field other than its notes (else it is the sibling again
    /// under another name, and it would take a share of the prior for nothing).
    /// </summary>
    /// <param name="variety">The flattened variety.</param>
    /// <param name="like">Its sibling's flattened entry and the fields the variety states itself.</param>
    /// <param name="species">The species' own values, for the range rule; null to skip it.</param>
    public static IReadOnlyList<CatalogueFinding> CheckAgainstSibling(Material variety, Likeness like, Material? species)
    {
        ArgumentNullException.ThrowIfNull(variety);
        ArgumentNullException.ThrowIfNull(like);
        var f = new List<CatalogueFinding>();
        Material sibling = like.Sibling;
        foreach (string field in like.OwnFields)
        {
            string own = MaterialFieldText.Of(variety, field), theirs = MaterialFieldText.Of(sibling, field);
            if (own == theirs)
                f.Add(new(variety.Name, field, $"repeats the value {own} of '{sibling.Name}', which it is like; state only what differs from it", FileOf(variety)));
            else if (species is not null && OutsideSpecies(variety, field, species) is { } problem) f.Add(new(variety.Name, field, problem, FileOf(variety)));
        }
        if (variety.Origin == sibling.Origin
            && !like.OwnFields.Any(x => x != "notes" && MaterialFieldText.Of(variety, x) != MaterialFieldText.Of(sibling, x)))
            f.Add(new(variety.Name, "like", $"differs from '{sibling.Name}', which it is like, neither in origin ({variety.Origin.ToString().ToLowerInvariant()}) " +
                "nor in any stated field but its notes: it is the same entry under another name", FileOf(variety)));
        return f;
    }

    // An assembled stone's index is its top's and its SG the assembly's: outside the species' own ranges by nature. A
    // treated or synthetic stone may carry a layer unlike the mineral (a chromium-diffused skin, a synthetic overgrowth)
    // that the bench reads: outside the species' range only where a published source, or a judgement whose reference
    // states its reasoning from published works, says so.
    private static string? OutsideSpecies(Material variety, string field, Material species) =>
        variety.Origin != OriginClass.Composite
            && !(variety.Origin is OriginClass.Treated or OriginClass.Synthetic
                && variety.Sources.TryGetValue(field, out var source) && source.Kind is SourceKind.Published or SourceKind.Judgement)
            // A usual part is held to the species' whole SG range: the species' own usual part may be narrower than the variety's.
            && MaterialFieldText.RangeOf(variety, field) is { } r && MaterialFieldText.RangeOf(species, field == "sg_usual" ? "sg" : field) is { } whole
            && (r.Minimum < whole.Minimum || r.Maximum > whole.Maximum)
            ? $"{r.ToString("0.####")} lies outside its species' range {whole.ToString("0.####")}"
            : null;

    /// <summary>
    /// A variety written "like" a sibling variety of its species: the sibling's flattened entry and the fields (as the
    /// family files name them) the variety states itself; it takes every other field from the sibling.
    /// </summary>
    /// <param name="Sibling">The sibling's flattened entry.</param>
    /// <param name="OwnFields">The fields the variety states itself.</param>
    public sealed record Likeness(Material Sibling, IReadOnlyList<string> OwnFields);

    private static IEnumerable<CatalogueFinding> CheckDispersionWithinSpecies(IReadOnlyList<Material> materials)
    {
        foreach (IGrouping<string, Material> group in materials.Where(m => m.Dispersion > 0).GroupBy(m => m.Species))
        {
            // A man-made material met as a continuum of compositions (glass from soda-lime to dense lead, plastics by
            // polymer) disperses as its composition does: only the per-entry band applies to it. Elsewhere entries are
            // compared where their indices overlap, since other indices mean another composition.
            if (group.All(m => m.Origin == OriginClass.Imitation)) continue;
            foreach (Material m in group)
            {
                Material? most = group.Where(o => Overlap(o, m)).MaxBy(o => o.Dispersion!.Value);
                if (most is null || most.Dispersion!.Value / m.Dispersion!.Value < DispersionSpreadWithinSpecies) continue;
                yield return new(m.Name, "dispersion",
                    $"{Format(m.Dispersion!.Value)} is {Format(most.Dispersion!.Value / m.Dispersion.Value)} times below " +
                    $"'{most.Name}' ({Format(most.Dispersion.Value)}) of the same species; a C–F value (nF − nC) is about " +
                    $"1/{Format(GeeBeeToCeeEffRatio)} of nG − nB, which the field holds", FileOf(m));
            }
        }
    }

    private static bool Overlap(Material a, Material b) =>
        a.Indices.Lowest.Minimum <= b.Indices.Highest.Maximum && b.Indices.Lowest.Minimum <= a.Indices.Highest.Maximum;

    private static void CheckText(Material m, Action<string, string> add)
    {
        if (string.IsNullOrWhiteSpace(m.Name)) add("name", "the name is empty");
        if (string.IsNullOrWhiteSpace(m.Species)) add("species", "the species is empty");
        else if (m.Species != m.Species.ToLowerInvariant()) add("species", $"'{m.Species}' must be lower-case");
    }

    private static void CheckSources(Material m, Action<string, string> add)
    {
        foreach (string field in CatalogueFields.NumericOf(m).Where(f => !m.Sources.ContainsKey(f)))
            add(field, "no source is named for this number; name a reference in \"sources\"");
    }

    private static void CheckOpaque(Material m, Action<string, string> add)
    {
        if (!m.IsOpaque)
        {
            if (m.Polariscope.Count == 0) add("polariscope", "no polariscope reaction is given; list at least one (or mark the entry opaque)");
            return;
        }
        if (m.Polariscope.Count > 0)
            add("polariscope", $"[{string.Join(", ", m.Polariscope.Select(Word))}] is given for an opaque entry, which no polariscope can test; give []");
        if (m.Pleochroism != PleochroismStrength.None)
            add("pleochroism", $"{Word(m.Pleochroism)} is given for an opaque entry, which no dichroscope can test; give none");
    }

    private static void CheckDispersionBand(Material m, Action<string, string> add)
    {
        if (m.Dispersion is not { } d || !(d >= 0 && d < 1)) return; // outside 0..1 is the range check's finding
        double lowest = m.Indices.Lowest.Minimum - 1, highest = m.Indices.Highest.Maximum - 1;
        if (!(lowest > 0)) return; // an index at or below 1 is the range check's finding
        double least = LeastDispersivePower * highest, most = GreatestDispersivePower * lowest;
        if (d + DispersionRounding < least)
            add("dispersion", $"{Format(d)} is below {Format(least)}, the least nG − nB an ordinary material of index " +
                $"{Format(highest + 1)} shows (dispersive power {Format(LeastDispersivePower)}); is it a C–F value (nF − nC)?");
        else if (d - DispersionRounding > most)
            add("dispersion", $"{Format(d)} is above {Format(most)}, the most nG − nB a material of index {Format(lowest + 1)} " +
                $"shows (dispersive power {Format(GreatestDispersivePower)})");
    }

    private static string FileOf(Material m) => m.IsUserEntry ? "user catalogue" : m.Family.Length > 0 ? $"{m.Family}.json" : "";

    private static void CheckRanges(Material m, Action<string, string> add)
    {
        foreach ((string name, PropertyRange range) in m.Indices.Named())
            CheckInside(add, CatalogueFields.IndexField(name), range, IndexLowerBound, IndexUpperBound, "refractive index");
        CheckInside(add, "sg", m.SpecificGravity, SpecificGravityLowerBound, SpecificGravityUpperBound, "specific gravity");
        if (m.SpecificGravityUsual is { } usual && !(usual.Minimum >= m.SpecificGravity.Minimum && usual.Maximum <= m.SpecificGravity.Maximum))
            add("sg_usual", $"{usual} lies outside the SG range {m.SpecificGravity}; the usual part is within the whole range");
        if (m.Birefringence is { Minimum: < 0 } b) add("birefringence", $"{b} is negative; birefringence is 0 or more");
        if (m.Hardness is { } h && !(h.Minimum >= 1 && h.Maximum <= 10)) add("hardness", $"{h} is outside the Mohs scale 1 to 10");
        if (m.Dispersion is { } d && !(d >= 0 && d < 1)) add("dispersion", $"{Format(d)} is outside 0 to below 1");
        foreach (double nm in m.AbsorptionLinesNanometres.Where(nm => !(nm >= 300 && nm <= 1000)))
            add("absorption", $"{Format(nm)} nm is outside the 300 to 1000 nm a hand spectroscope shows");
    }

    private static void CheckInside(Action<string, string> add, string field, PropertyRange r, double low, double high, string quantity)
    {
        if (!(r.Minimum <= r.Maximum)) add(field, $"[{Format(r.Minimum)}, {Format(r.Maximum)}] is not ordered min ≤ max");
        if (!(r.Minimum > low && r.Maximum < high))
            add(field, $"{quantity} {r} is outside the physical range {Format(low)} to {Format(high)} (both excluded)");
    }

    private static void CheckBirefringence(Material m, Action<string, string> add)
    {
        bool doubleIndex = m.OpticCharacter is OpticCharacter.Uniaxial or OpticCharacter.Biaxial;
        if (!doubleIndex)
        {
            if (m.Birefringence is { } b) add("birefringence", $"{b} is given for a {Word(m.OpticCharacter)} material, which has one index");
            return;
        }
        if (m.Birefringence is not { } given) { add("birefringence", $"missing for a {Word(m.OpticCharacter)} material"); return; }
        PropertyRange low = m.Indices.Lowest, high = m.Indices.Highest;
        double least = Math.Max(0, high.Minimum - low.Maximum), most = high.Maximum - low.Minimum;
        if (given.Maximum < least - 1e-9 || given.Minimum > most + 1e-9)
            add("birefringence", $"{given.ToString("0.####")} does not overlap {Format(least)}–{Format(most)}, " +
                "the differences the index ranges allow");
    }

    private static void CheckSign(Material m, Action<string, string> add)
    {
        OpticalIndices i = m.Indices;
        switch (m.OpticCharacter)
        {
            case OpticCharacter.Uniaxial or OpticCharacter.Biaxial when m.Sign == OpticSign.None:
                add("optic_sign", $"a {Word(m.OpticCharacter)} material needs a sign (positive, negative or either)");
                break;
            case OpticCharacter.Uniaxial when m.Sign is OpticSign.Positive or OpticSign.Negative:
                bool positive = i.Epsilon!.Value.Centre > i.Omega!.Value.Centre;
                if (positive != (m.Sign == OpticSign.Positive))
                    add("optic_sign", $"{Word(m.Sign)} disagrees with ε {i.Epsilon} and ω {i.Omega} (positive exactly when ε > ω)");
                break;
            case OpticCharacter.Biaxial:
                CheckBiaxial(m, add);
                break;
            case OpticCharacter.Isotropic or OpticCharacter.Amorphous or OpticCharacter.Aggregate when m.Sign != OpticSign.None:
                add("optic_sign", $"{Word(m.Sign)} is given for a {Word(m.OpticCharacter)} material, which has no sign");
                break;
        }
    }

    private static void CheckBiaxial(Material m, Action<string, string> add)
    {
        PropertyRange alpha = m.Indices.Alpha!.Value, beta = m.Indices.Beta!.Value, gamma = m.Indices.Gamma!.Value;
        if (!(beta.Minimum >= alpha.Minimum && beta.Maximum <= gamma.Maximum))
            add("beta", $"β {beta} lies outside [α min {Format(alpha.Minimum)}, γ max {Format(gamma.Maximum)}]");
        if (m.Sign is OpticSign.Positive or OpticSign.Negative)
        {
            // The ranges' centres stand for a typical stone. Where γ − β and β − α differ there by less than β's own
            // half-width (2V near 90°, as in andalusite), the ranges do not decide the sign and the source's word stands.
            double margin = (gamma.Centre - beta.Centre) - (beta.Centre - alpha.Centre);
            bool positive = margin > 0;
            if (Math.Abs(margin) > beta.Width / 2 && positive != (m.Sign == OpticSign.Positive))
                add("optic_sign", $"{Word(m.Sign)} disagrees with α {alpha}, β {beta}, γ {gamma} (positive exactly when γ − β > β − α)");
        }
    }

    private static void CheckCharacter(Material m, Action<string, string> add)
    {
        if (m.OpticCharacter == OpticCharacter.Aggregate) return; // an aggregate of any crystal system reads as one index
        OpticCharacter expected = m.CrystalSystem switch
        {
            CrystalSystem.Cubic => OpticCharacter.Isotropic,
            CrystalSystem.Tetragonal or CrystalSystem.Hexagonal or CrystalSystem.Trigonal => OpticCharacter.Uniaxial,
            CrystalSystem.Orthorhombic or CrystalSystem.Monoclinic or CrystalSystem.Triclinic => OpticCharacter.Biaxial,
            _ => OpticCharacter.Amorphous,
        };
        if (m.OpticCharacter != expected)
            add("optic_character", $"{Word(m.OpticCharacter)} does not fit the {Word(m.CrystalSystem)} crystal system, " +
                $"which is {Word(expected)} (or an aggregate)");
        if (m.CrystalSystem == CrystalSystem.Cubic && m.Polariscope.Contains(PolariscopeReaction.DoublyRefractive))
            add("polariscope", "a cubic material cannot be doubly refractive; strain shows as anomalous");
    }

    private static string Word<T>(T value) where T : struct, Enum => value.ToString().ToLowerInvariant();

    private static string Format(double v) => v.ToString("0.####", CultureInfo.InvariantCulture);
}
