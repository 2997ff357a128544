namespace GemIndex.Core.Magnification;

/// <summary>
/// What was looked for under magnification: features seen and features looked for but not seen. A feature in
/// neither set was not looked for, which is no evidence at all.
/// </summary>
public sealed record MagnificationObservation
{
    /// <summary>Creates an observation; a feature cannot be both seen and not seen.</summary>
    /// <exception cref="ArgumentException">A feature is in both sets (the message names it).</exception>
    public MagnificationObservation(IEnumerable<MagnificationFeature> present, IEnumerable<MagnificationFeature> absent)
    {
        Present = present.ToHashSet();
        Absent = absent.ToHashSet();
        var both = Present.Intersect(Absent).ToList();
        if (both.Count > 0)
            throw new ArgumentException(
                $"'{MagnificationVocabulary.Of(both[0]).Word}' is given both as seen and as looked for but not seen");
    }

    /// <summary>Features seen.</summary>
    public IReadOnlySet<MagnificationFeature> Present { get; }

    /// <summary>Features looked for and not seen.</summary>
    public IReadOnlySet<MagnificationFeature> Absent { get; }

    /// <summary>The stone is faceted: the star and the cat's-eye among <see cref="Absent"/> are not seen because no facet can show them.</summary>
    public bool Faceted { get; init; }

    /// <summary>
    /// The features among <see cref="Absent"/> that only the faceted cut put there (not typed as looked for): they weigh in
    /// the likelihood, but a look nobody took is no test of how typical the stone is, so they stay out of the fit.
    /// </summary>
    public IReadOnlySet<MagnificationFeature> ImpliedByCut { get; init; } = new HashSet<MagnificationFeature>();

    /// <summary>True when something was looked for by hand (a feature beyond what the cut implies).</summary>
    public bool AnyLooked => Present.Count > 0 || Absent.Any(f => !ImpliedByCut.Contains(f));

    /// <summary>True when the observation is only what a faceted cut says (no star, no cat's-eye), nothing looked at.</summary>
    public bool OnlyWhatTheCutSays => Faceted && Present.Count == 0 && Absent.All(MagnificationVocabulary.DomedPhenomena.Contains);

    /// <summary>True when nothing was looked for.</summary>
    public bool IsEmpty => Present.Count == 0 && Absent.Count == 0;
}
