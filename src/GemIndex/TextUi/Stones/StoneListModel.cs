using System.Globalization;
using GemIndex.Data.Workbook;

namespace GemIndex.Cli.TextUi.Stones;

/// <summary>
/// The workbook's stones as a searchable list of lines, each with its answer in a few words (worked out once per stone
/// and change, so a search does not rank them again).
/// </summary>
internal sealed class StoneListModel(Func<string, IReadOnlyList<StoneSummary>> list, Func<long, string>? answer = null)
{
    private readonly Dictionary<(long, DateTimeOffset), string> _answers = [];

    public IReadOnlyList<StoneSummary> Shown { get; private set; } = list("");

    public string Query { get; private set; } = "";

    public void Search(string text) => Shown = list(Query = text);

    public void Refresh() => Shown = list(Query);

    /// <summary>The columns' names over the list, in the columns of <see cref="Line"/>.</summary>
    public static readonly string Heading = $"{"Reference",-18} {"Colour",-14} {"Weight",9} {"Answer",-18} Changed (UTC)";

    /// <summary>One stone's line, with its answer.</summary>
    public string LineOf(StoneSummary s)
    {
        if (answer is null) return Line(s, "");
        if (!_answers.TryGetValue((s.Id, s.Modified), out string? text)) _answers[(s.Id, s.Modified)] = text = answer(s.Id);
        return Line(s, text);
    }

    /// <summary>One stone: reference, colour, weight, answer, day of the last change (UTC, as the workbook stores it; F3 shows the times).</summary>
    public static string Line(StoneSummary s, string answer) =>
        $"{Results.ResultText.Clip(s.Reference.Length == 0 ? "(no reference)" : s.Reference, 18),-18} {Results.ResultText.Clip(s.Colour, 14),-14} "
        + $"{(s.WeightCarats is { } w ? w.ToString("0.00", CultureInfo.InvariantCulture) + " ct" : ""),9} {Results.ResultText.Clip(answer, 18),-18} "
        + s.Modified.ToUniversalTime().ToString("yyyy-MM-dd", CultureInfo.InvariantCulture);
}
