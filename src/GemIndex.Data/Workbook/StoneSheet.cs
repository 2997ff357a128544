using GemIndex.Data.Batch;

namespace GemIndex.Data.Workbook;

/// <summary>
/// One stone in the workbook: its description and its readings (in the batch format, so the same readings go
/// through the same checks whether typed in the text UI or read from a batch file).
/// </summary>
public sealed record StoneSheet
{
    /// <summary>Row id in the workbook; 0 before the stone is first saved.</summary>
    public long Id { get; init; }

    /// <summary>The user's reference for the stone ("lot 12 / 3").</summary>
    public string Reference { get; init; } = "";

    /// <summary>Weight in carats, if weighed.</summary>
    public double? WeightCarats { get; init; }

    /// <summary>Dimensions as typed ("8.1 x 6.0 x 4.2 mm").</summary>
    public string Dimensions { get; init; } = "";

    /// <summary>Shape ("oval", "cushion", "round").</summary>
    public string Shape { get; init; } = "";

    /// <summary>Cutting style ("mixed cut", "brilliant", "cabochon").</summary>
    public string CuttingStyle { get; init; } = "";

    /// <summary>Transparency as described ("transparent", "opaque, waxy lustre"); its first word is the reading (<see cref="TransparencyWord"/>).</summary>
    public string Transparency { get; init; } = "";

    /// <summary>Free notes.</summary>
    public string Notes { get; init; } = "";

    /// <summary>The readings; <see cref="StoneReadings.Id"/> mirrors <see cref="Reference"/>.</summary>
    public StoneReadings Readings { get; init; } = new();

    /// <summary>When the stone was first saved (UTC).</summary>
    public DateTimeOffset Created { get; init; }

    /// <summary>When the stone was last changed (UTC).</summary>
    public DateTimeOffset Modified { get; init; }

    /// <summary>
    /// The reading in a stone's transparency description: its first word when that is transparent, translucent or opaque,
    /// else none. The description stays as typed for the report; "semi-
    /// translucent" and the like say nothing the advice can use.
    /// </summary>
    public static string? TransparencyWord(string description)
    {
        // The leading letters: "Opaque." and "opaque/waxy" read as opaque.
        string first = new([.. description.Trim().TakeWhile(char.IsLetter)]);
        first = first.ToLowerInvariant();
        return first switch
        {
            "transparent" => "transparent",
            "translucent" => "translucent",
            "opaque" => "opaque",
            _ => null,
        };
    }
}
