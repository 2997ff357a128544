using GemIndex.Core.Catalogue;

namespace GemIndex.Core.Magnification;

/// <summary>
/// The likelihood of what was seen under magnification, given a material (docs/ranking.md, "Magnification"). A
/// feature the stone holds is seen with the feature's visibility; one it does not hold is "seen" only by mistaking
/// something else for it. Features not looked for carry no evidence; "looked for, not seen" is weak evidence,
/// weaker the less visible the feature is.
/// </summary>
public static class MagnificationEvidence
{
    /// <summary>The chance of reporting a feature that is not there (a look-alike, a misread): a judgement.</summary>
    public const double FalseSighting = 0.01;

    /// <summary>The probability of seeing the feature when looking for it, for a material with this profile.</summary>
    public static double ProbabilityOfSeeing(MagnificationProfile profile, MagnificationFeature feature)
    {
        double holds = profile.ProbabilityOf(feature);
        double visibility = MagnificationVocabulary.Of(feature).Visibility;
        return FalseSighting + (1 - FalseSighting) * holds * visibility;
    }

    /// <summary>The natural log of P(observation | material), each feature looked for taken as independent.</summary>
    public static double LogLikelihood(MagnificationObservation observation, MagnificationProfile profile)
    {
        double log = 0;
        foreach (var feature in observation.Present) log += Math.Log(ProbabilityOfSeeing(profile, feature));
        foreach (var feature in observation.Absent)
            log += Math.Log(observation.Faceted && MagnificationVocabulary.DomedPhenomena.Contains(feature)
                ? 1 - (1 - FalseSighting) * profile.ProbabilityOf(feature)   // the cut excludes it: no sighting to miss
                : 1 - ProbabilityOfSeeing(profile, feature));
        return log;
    }

    /// <summary>
    /// ln P(observation | not in the catalogue): the mean of the likelihoods under the natural and the imitation
    /// defaults, the two kinds an uncatalogued stone most often is (docs/ranking.md, "Magnification").
    /// </summary>
    public static double LogBroad(MagnificationObservation observation)
    {
        double natural = LogLikelihood(observation, MagnificationProfile.ForOrigin(OriginClass.Natural));
        double imitation = LogLikelihood(observation, MagnificationProfile.ForOrigin(OriginClass.Imitation));
        double top = Math.Max(natural, imitation);
        return top + Math.Log((Math.Exp(natural - top) + Math.Exp(imitation - top)) / 2);
    }

    /// <summary>
    /// The fit of the observation to the profile: its likelihood over that of the likeliest outcome of the same looks
    /// (each feature seen or not, whichever the profile expects), as the other reaction tests measure fit.
    /// </summary>
    public static double Fit(MagnificationObservation observation, MagnificationProfile profile)
    {
        // Only the looks taken by hand: the cut's implied absences are no look at the stone (MagnificationObservation.ImpliedByCut).
        var looked = observation.ImpliedByCut.Count == 0 ? observation
            : new MagnificationObservation(observation.Present, observation.Absent.Except(observation.ImpliedByCut));
        double best = 0;
        foreach (var feature in looked.Present.Concat(looked.Absent))
        {
            double p = ProbabilityOfSeeing(profile, feature);
            best += Math.Log(Math.Max(p, 1 - p));
        }
        return Math.Min(1, Math.Exp(LogLikelihood(looked, profile) - best));
    }

    /// <summary>
    /// The reason in words: "magnification: curved striae seen (expected in 90 %), needles and silk not seen (held by 10 %)".
    /// </summary>
    public static string Reason(MagnificationObservation observation, MagnificationProfile profile)
    {
        static string Percent(double p) => (100 * p).ToString("0", System.Globalization.CultureInfo.InvariantCulture) + " %";
        var parts = observation.Present.Order().Select(f => $"{MagnificationVocabulary.Of(f).Name} seen (held by {Percent(profile.ProbabilityOf(f))} of such stones)")
            .Concat(observation.Absent.Order().Select(f => observation.Faceted && MagnificationVocabulary.DomedPhenomena.Contains(f)
                ? $"no {MagnificationVocabulary.Of(f).Name} on a faceted stone (held by {Percent(profile.ProbabilityOf(f))} of such stones)"
                : $"{MagnificationVocabulary.Of(f).Name} not seen (held by {Percent(profile.ProbabilityOf(f))} of such stones)"));
        return "magnification: " + string.Join(", ", parts);
    }
}
