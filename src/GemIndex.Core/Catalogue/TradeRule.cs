namespace GemIndex.Core.Catalogue;

/// <summary>
/// A rule that restricts trade in a material (a CITES listing, or national rules), in a few words, with the work it
/// summarises; shown as a caution, never weighed as evidence.
/// </summary>
/// <param name="Key">The rule's key: entries that share a rule (a species' varieties) share it.</param>
/// <param name="Text">What restricts the trade ("international commercial trade banned: … Appendix I").</param>
/// <param name="Citation">The listing or document the text summarises.</param>
public sealed record TradeRule(string Key, string Text, string Citation);
