namespace GemIndex.Core.Magnification;

/// <summary>The published works the magnification vocabulary and its probabilities cite (each one read).</summary>
public static class MagnificationSources
{
    /// <summary>
    /// Growth tubes: beryl and tourmaline develop hollow tubes with even sides running straight a long way, most cut away
    /// in fashioning; seen, the stone is most likely a beryl, a tourmaline or possibly a spodumene.
    /// </summary>
    public const string GemSocietyInclusions =
        "International Gem Society (n.d.) Identifying inclusions of specific gems: beryl and tourmaline (gemsociety.org/article/identifying-inclusions-of-specific-gems)";

    /// <summary>Curved growth lines and gas bubbles of flame-fusion corundum.</summary>
    public const string HughesKoivula2005 =
        "Hughes R.W., Koivula J.I. (2005) Verneuil synthetic corundum: dangerous curves (Lotus Gemology / ruby-sapphire.com)";

    /// <summary>Curved lines (flame fusion), hound's-tooth growth (hydrothermal), wispy veils (flux); nail-head spicules.</summary>
    public const string ChoudharyGolecha2007 =
        "Choudhary G., Golecha C. (2007) A study of nail-head spicule inclusions in natural gemstones. Gems & Gemology 43(3), 228-235";

    /// <summary>Zigzag growth of hydrothermal synthetics; hexagonal platinum platelets and flux residue of flux synthetics.</summary>
    public const string SunDeGhionno2014 =
        "Sun Z., DeGhionno D. (2014) Flux-grown synthetic ruby with hydrothermal synthetic seed crystal. Gems & Gemology 50(2), Lab Notes";

    /// <summary>Platinum platelet and flux fingerprints in a flux-grown synthetic sapphire.</summary>
    public const string GiaLabNotes2019FluxSapphire =
        "Gems & Gemology (2019) Summer, Lab Notes: Exsolved particles with natural appearance within flux-grown pink synthetic sapphire";

    /// <summary>
    /// Lead-glass filled ruby: low-relief fractures, blue and orange flashes, flattened gas bubbles (after McClure et
    /// al. 2006); and the typical inclusions of natural ruby: rutile silk, particulate clouds, twinning, planar zoning.
    /// </summary>
    public const string GiaLabNotes2014BurmeseRubies =
        "Gems & Gemology (2014) Winter, Lab Notes: Lead-glass-filled Burmese rubies (citing McClure et al. 2006, Gems & Gemology 42(1), 22-34)";

    /// <summary>Flash effect and flattened gas bubbles in a lead-glass filled laboratory-grown ruby.</summary>
    public const string Zandi2021 =
        "Zandi F. (2021) Lead glass-filled laboratory-grown ruby. Gems & Gemology 57(1), Lab Notes";

    /// <summary>Flash effect of oil- and resin-filled fissures in emerald: blue in brightfield, orange in darkfield.</summary>
    public const string GaajEmeraldFilling =
        "Gemmological Association of All Japan, research report: Detection of filling material in natural emerald (grjapan.ddo.jp)";

    /// <summary>Shallow diffusion colour seen immersed in diffused light; Plato lines of a flame-fusion synthetic.</summary>
    public const string GiaGemNews2015DiffusionStar =
        "Gems & Gemology (2015) Summer, Gem News International: Synthetic sapphire with diffusion-induced color and star";

    /// <summary>Gas bubbles in the glass part of a garnet-topped doublet.</summary>
    public const string GiaMicroWorld2023Doublet =
        "Gems & Gemology (2023) Fall, Micro-World: A red herring in a red garnet";

    /// <summary>The lustre of a doublet's two parts, and its join near the girdle.</summary>
    public const string Wade1918 =
        "Wade F.B. (1918) A Text-Book of Precious Stones for Jewelers and the Gem-Loving Public, Lesson on doublets";

    /// <summary>Metallic inclusions (often making the stone magnetic), colour zoning and graining of synthetic diamond.</summary>
    public const string Shigley1995 =
        "Shigley J.E., Fritsch E., Reinitz I., Moses T.M. (1995) A chart for the separation of natural and synthetic diamonds. Gems & Gemology 31(4), 256-264";

    /// <summary>The Schreger pattern of elephant and mammoth ivory; bone's Haversian canals seen with a 10x lens.</summary>
    public const string EspinozaMann1999 =
        "Espinoza E.O., Mann M.-J., Identification guide for ivory and ivory substitutes, U.S. National Fish and Wildlife Forensics Laboratory (reprinted 1999)";

    /// <summary>Nacre laid in thin overlapping layers whose edges form serrated outlines on the surface of pearls and mother-of-pearl.</summary>
    public const string KunzStevenson1908 =
        "Kunz G.F., Stevenson C.H. (1908) The Book of the Pearl, the structure of pearls (overlapping laminae with serrated outlines)";

    /// <summary>Tortoiseshell's small spherical reddish particles, absent from its imitations.</summary>
    public const string NewmanTortoiseshell =
        "Newman H., An Illustrated Dictionary of Jewelry (Thames and Hudson), 'Tortoise shell'";

    /// <summary>Vegetable ivory's fibrous microscopic structure.</summary>
    public const string CameoVegetableIvory =
        "Museum of Fine Arts Boston, CAMEO, 'Vegetable ivory' (fibrous microscopic structure; citing Thornton 1981, The structure of ivory and ivory substitutes)";

    /// <summary>A fact of the trade with no single source.</summary>
    public const string CommonPractice = "common practice";
}
