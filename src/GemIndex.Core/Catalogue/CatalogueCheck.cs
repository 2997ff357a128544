using System.Globalization;
using GemIndex.Core.Observations;
using GemIndex.Core.Optics.Indicatrix;

namespace GemIndex.Core.Catalogue;

/// <summary>
/// Consistency rules every catalogue entry must meet before the ranking may trust it: physical ranges,
/// birefringence that agrees with the index ranges, an optic sign that agrees with the indices, an optic
/// character that agrees with the crystal system, unique names, a named source and at least one polariscope
/// reaction. The rules are common practice in mineral optics (uniaxial positive when ε &gt; ω; biaxial
/// positive when γ − β &gt; β − α); the numeric bounds are our own sanity limits, wide enough for any gem
/// material. Pure: the same list always gives the same findings, in entry order.
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

    /// <summary>Every finding for a whole catalogue: each entry's own rules, then names used more than once (case-insensitive).</summary>
    /// <param name="materials">The entries, in catalogue order.</param>
    public static IReadOnlyList<CatalogueFinding> Check(IReadOnlyList<Material> materials)
    {
        ArgumentNullException.ThrowIfNull(materials);
        var findings = new List<CatalogueFinding>();
        foreach (Material m in materials) findings.AddRange(CheckEntry(m));
        var seen = new Dictionary<string, string>(StringComparer.OrdinalIgnoreCase);
        foreach (Material m in materials)
        {
            if (seen.TryGetValue(m.Name, out string? first))
                findings.Add(new(m.Name, "name", $"the name is already used by entry '{first}' (names are compared ignoring case)"));
            else seen[m.Name] = m.Name;
        }
        return findings;
    }

    /// <summary>The findings for one entry on its own (every rule except duplicate names).</summary>
    /// <param name="material">The entry.</param>
    public static IReadOnlyList<CatalogueFinding> CheckEntry(Material material)
    {
        ArgumentNullException.ThrowIfNull(material);
        var f = new List<CatalogueFinding>();
        void Add(string field, string problem) => f.Add(new(material.Name, field, problem));
        CheckText(material, Add);
        CheckRanges(material, Add);
        CheckBirefringence(material, Add);
        CheckSign(material, Add);
        CheckCharacter(material, Add);
        if (material.Polariscope.Count == 0) Add("polariscope", "no polariscope reaction is given; list at least one");
        return f;
    }

    private static void CheckText(Material m, Action<string, string> add)
    {
        if (string.IsNullOrWhiteSpace(m.Name)) add("name", "the name is empty");
        if (string.IsNullOrWhiteSpace(m.Species)) add("species", "the species is empty");
        else if (m.Species != m.Species.ToLowerInvariant()) add("species", $"'{m.Species}' must be lower-case");
        if (string.IsNullOrWhiteSpace(m.Provenance)) add("provenance", "no source is named for the numbers");
    }

    private static void CheckRanges(Material m, Action<string, string> add)
    {
        foreach ((string name, PropertyRange range) in m.Indices.Named())
            CheckInside(add, FieldOf(name), range, IndexLowerBound, IndexUpperBound, "refractive index");
        CheckInside(add, "sg", m.SpecificGravity, SpecificGravityLowerBound, SpecificGravityUpperBound, "specific gravity");
        if (m.Birefringence is { Minimum: < 0 } b) add("birefringence", $"{b} is negative; birefringence is 0 or more");
        if (m.Hardness is { } h && !(h.Minimum >= 1 && h.Maximum <= 10)) add("hardness", $"{h} is outside the Mohs scale 1 to 10");
        if (m.Dispersion is { } d && !(d >= 0 && d < 1)) add("dispersion", $"{Format(d)} is outside 0 to below 1");
        foreach (double nm in m.AbsorptionLinesNanometres.Where(nm => !(nm >= 300 && nm <= 1000)))
            add("absorption_nm", $"{Format(nm)} nm is outside the 300 to 1000 nm a hand spectroscope shows");
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
            bool positive = gamma.Centre - beta.Centre > beta.Centre - alpha.Centre;
            if (positive != (m.Sign == OpticSign.Positive))
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

    private static string FieldOf(string indexSymbol) => indexSymbol switch
    {
        "ω" => "omega", "ε" => "epsilon", "α" => "alpha", "β" => "beta", "γ" => "gamma", _ => "n",
    };

    private static string Word<T>(T value) where T : struct, Enum => value.ToString().ToLowerInvariant();

    private static string Format(double v) => v.ToString("0.####", CultureInfo.InvariantCulture);
}
