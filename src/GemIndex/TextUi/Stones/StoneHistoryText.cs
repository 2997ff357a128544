using System.Globalization;
using GemIndex.Cli.TextUi.Results;
using GemIndex.Data.Workbook;

namespace GemIndex.Cli.TextUi.Stones;

/// <summary>A stone's edit history as lines: when (UTC), which field, before → after (long values shortened).</summary>
internal static class StoneHistoryText
{
    public const int ValueWidth = 60;

    public static IReadOnlyList<string> Lines(string reference, IReadOnlyList<StoneEdit> edits) =>
    [
        $"History of '{reference}' ({edits.Count} entries, times in UTC)",
        "",
        .. edits.Select(e => $"{e.At.ToString("yyyy-MM-dd HH:mm:ss", CultureInfo.InvariantCulture)}  {e.Field}: {Shown(e.Before)} → {Shown(e.After)}"),
    ];

    private static string Shown(string value) => value.Length == 0 ? "(empty)" : "'" + ResultText.Clip(value, ValueWidth) + "'";
}
