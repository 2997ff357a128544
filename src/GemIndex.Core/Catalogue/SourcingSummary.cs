namespace GemIndex.Core.Catalogue;

/// <summary>
/// How much of a catalogue rests on published sources: entries whose every sourced number (indices, birefringence,
/// SG, dispersion) is published, and the numeric values by the kind of their source.
/// </summary>
/// <param name="Entries">Entries counted.</param>
/// <param name="SourcedEntries">Entries whose indices, birefringence, SG and dispersion all come from published works.</param>
/// <param name="PublishedValues">Numeric values from published works.</param>
/// <param name="MemoryValues">Numeric values from memory.</param>
/// <param name="PracticeValues">Numeric values given as common practice.</param>
/// <param name="JudgementValues">Numeric values inferred from published works, the reasoning stated.</param>
/// <param name="UnsourcedValues">Numeric values with no source at all (each is also a check finding).</param>
public sealed record SourcingSummary(int Entries, int SourcedEntries, int PublishedValues, int MemoryValues, int PracticeValues, int UnsourcedValues,
    int JudgementValues)
{
    /// <summary>All numeric values counted.</summary>
    public int Values => PublishedValues + MemoryValues + PracticeValues + JudgementValues + UnsourcedValues;

    /// <summary>SourcedEntries / Entries, 0 for an empty catalogue.</summary>
    public double SourcedEntryShare => Entries == 0 ? 0 : (double)SourcedEntries / Entries;

    /// <summary>Counts a catalogue's entries and numeric values (<see cref="CatalogueFields.Numeric"/>) by source.</summary>
    public static SourcingSummary Of(IReadOnlyList<Material> materials)
    {
        ArgumentNullException.ThrowIfNull(materials);
        int sourced = 0, published = 0, memory = 0, practice = 0, judgement = 0, none = 0;
        foreach (Material m in materials)
        {
            bool all = true;
            foreach (string field in CatalogueFields.NumericOf(m))
            {
                SourceKind? kind = m.Sources.TryGetValue(field, out ValueSource? s) ? s.Kind : null;
                switch (kind)
                {
                    case SourceKind.Published: published++; break;
                    case SourceKind.FromMemory: memory++; break;
                    case SourceKind.CommonPractice: practice++; break;
                    case SourceKind.Judgement: judgement++; break;
                    default: none++; break;
                }
                if (kind != SourceKind.Published && CatalogueFields.Sourced.Contains(field)) all = false;
            }
            if (all) sourced++;
        }
        return new(materials.Count, sourced, published, memory, practice, none, judgement);
    }
}
