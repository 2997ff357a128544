using GemIndex.Core.Optics.Indicatrix;
using GemIndex.Core.Readings;

namespace GemIndex.Core.Identification;

/// <summary>
/// The rotation series as the front ends show it: the readings of the edges under each optic character (α, β, γ or ω,
/// ε, the birefringence and the sign), weighted by what the readings alone say of the character
/// (<see cref="OpticCharacterPosterior"/>), so that the indices shown never contradict the character's odds shown above
/// them. The constant-edge band of <see cref="RotationSeriesAnalysis"/> only chose which readings to name; here it no
/// longer decides. A summary, never a gate: the ranking weighs the raw readings.
/// </summary>
internal static class SeriesAsRead
{
    /// <summary>
    /// The analysis with its interpretations replaced by every character's reading that holds at least
    /// <see cref="BenchWarnings.Relevant"/> of the posterior (each weighted by its share; a biaxial reading's share is
    /// halved between its two places for β), likeliest first, and its character the likeliest reading's. A series that
    /// cannot show which edge moves keeps the analysis as it is; one constant edge keeps its reading, weighted by the
    /// posterior's "singly refractive".
    /// </summary>
    public static RotationSeriesResult Weighed(RotationSeriesResult analysed, IReadOnlyList<SeriesInterpretation>? everyCharacter, OpticCharacterPosterior odds)
    {
        // One constant edge has one reading, n; its share is the posterior's "singly refractive".
        if (analysed is { Character: OpticCharacter.Isotropic, Interpretations: [{ Character: OpticCharacter.Isotropic } single] })
            return analysed with { Interpretations = [single with { Weight = odds.Isotropic }] };
        if (everyCharacter is null || analysed.Character is not (OpticCharacter.Uniaxial or OpticCharacter.Biaxial)) return analysed;
        double Share(SeriesInterpretation i) => i.Character == OpticCharacter.Biaxial ? odds.Biaxial / 2
            : i.Sign == OpticSign.Positive ? odds.UniaxialPositive : odds.UniaxialNegative;
        var weighed = everyCharacter.Select(i => i with { Weight = Share(i) }).ToList();
        // A biaxial reading with β at α or γ (2V near 0°) gives the readings a uniaxial crystal of that sign gives: when
        // another biaxial reading stands apart, it is shown with that uniaxial reading, not as a biaxial one with β = α.
        (double Positive, double Negative) nearZero = (0, 0);
        if (weighed.Any(i => i.Character == OpticCharacter.Biaxial && !i.LooksUniaxial))
            foreach (var b in weighed.Where(i => i.LooksUniaxial).ToList())
            {
                int u = weighed.FindIndex(i => i.Character == OpticCharacter.Uniaxial && i.Sign == b.Sign);
                if (u < 0) continue;
                string prefix = weighed[u].Sign == OpticSign.Positive ? "uniaxial positive" : "uniaxial negative";
                string description = weighed[u].Description.StartsWith(prefix + ":", StringComparison.Ordinal)
                    ? prefix + " (or biaxial, 2V near 0°)" + weighed[u].Description[prefix.Length..] : weighed[u].Description;
                weighed[u] = weighed[u] with { Weight = weighed[u].Weight + b.Weight, Description = description };
                nearZero = b.Sign == OpticSign.Positive ? (nearZero.Positive + b.Weight, nearZero.Negative) : (nearZero.Positive, nearZero.Negative + b.Weight);
                weighed.Remove(b);
            }
        // Stable: on a tie the analysis' order (uniaxial positive, negative, biaxial) stands.
        var shown = weighed.Where(i => i.Weight >= BenchWarnings.Relevant).OrderByDescending(i => i.Weight).ToList();
        if (shown.Count == 0) shown = [weighed.MaxBy(i => i.Weight)!];
        // A biaxial reading with 2V near 0° is a uniaxial one to these readings: the character is then uniaxial whenever
        // the two together lead, and the uniaxial readings come first (the numbers stay the section model's).
        bool looksUniaxial = shown.Any(i => i.Character == OpticCharacter.Biaxial) && shown.Where(i => i.Character == OpticCharacter.Biaxial).All(i => i.LooksUniaxial)
            && shown.Any(i => i.Character == OpticCharacter.Uniaxial);
        if (looksUniaxial && odds.Uniaxial + odds.Biaxial > odds.Isotropic)
            shown = [.. shown.OrderByDescending(i => i.Character == OpticCharacter.Uniaxial).ThenByDescending(i => i.Weight)];
        return analysed with { Character = shown[0].Character, Interpretations = shown, BiaxialLooksUniaxial = looksUniaxial, NearZeroBiaxialShown = nearZero };
    }
}
