namespace GemIndex.Data.Workbook;

/// <summary>One line of the workbook's stone list.</summary>
public sealed record StoneSummary(long Id, string Reference, string Colour, double? WeightCarats, DateTimeOffset Modified);
