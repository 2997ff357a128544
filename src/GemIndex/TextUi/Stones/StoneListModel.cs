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

    public static string Line(StoneSummary s) =>
        $"{Results.ResultText.Clip(s.Reference.Length == 0 ? "(no reference)" : s.Reference, 24),-24} {Results.ResultText.Clip(s.Colour, 16),-16} {(s.WeightCarats is { } w ? w.ToString("0.00", CultureInfo.InvariantCulture) + " ct" : ""),9} {s.Modified.ToString("yyyy-MM-dd HH:mm", CultureInfo.InvariantCulture)}";
}
