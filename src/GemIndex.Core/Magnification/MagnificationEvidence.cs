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
        foreach (var feature in observation.Absent) log += Math.Log(1 - ProbabilityOfSeeing(profile, feature));
        return log;
    }
}
