namespace GemIndex.Core.Catalogue;

/// <summary>A rule that restricts trade in a material (a CITES listing), in a few words, with the work it summarises.</summary>
/// <param name="Text">What restricts the trade ("the hawksbill … Appendix I: international commercial trade is banned").</param>
/// <param name="Citation">The listing or document the text summarises.</param>
public sealed record TradeRule(string Text, string Citation);
