using GemIndex.Core.Catalogue;

namespace GemIndex.Data.Catalogue;

/// <summary>A CSV row read into a material, with the line it came from.</summary>
public sealed record CatalogueCsvRow(int Line, Material Material);
