namespace GemIndex.Cli.TextUi.Bench;

/// <summary>What the examiner recorded for one magnification feature on the loupe page.</summary>
internal enum FeatureState
{
    /// <summary>Not looked for (the default): it says nothing about the stone.</summary>
    NotLookedFor,

    /// <summary>Seen: the feature goes into the field "magnification.present".</summary>
    Present,

    /// <summary>Looked for and not seen: the feature goes into "magnification.absent".</summary>
    Absent,
}
