using System.Globalization;
using GemIndex.Data.Workbook;

namespace GemIndex.Cli.TextUi.Stones;

/// <summary>The workbook's stones as a searchable list of lines.</summary>
internal sealed class StoneListModel(Func<string, IReadOnlyList<StoneSummary>> list)
{

    public IReadOnlyList<StoneSummary> Shown { get; private set; } = list("");

    public string Query { get; private set; } = "";

    public void Search(string text) => Shown = list(Query = text);

    public void Refresh() => Shown = list(Query);

    /// <summary>The columns' names over the list, in the columns of <see cref="Line"/>.</summary>
    public static readonly string Heading = $"{"Reference",-24} {"Colour",-24} {"Weight",9} Changed (UTC)";

    /// <summary>One stone: reference, colour, weight, last change (UTC, as the workbook stores it and the history shows it).</summary>
    public static string Line(StoneSummary s) =>
        $"{Results.ResultText.Clip(s.Reference.Length == 0 ? "(no reference)" : s.Reference, 24),-24} {Results.ResultText.Clip(s.Colour, 24),-24} {(s.WeightCarats is { } w ? w.ToString("0.00", CultureInfo.InvariantCulture) + " ct" : ""),9} {s.Modified.ToUniversalTime().ToString("yyyy-MM-dd HH:mm", CultureInfo.InvariantCulture)}";
}
