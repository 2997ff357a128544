namespace GemIndex.Bench.Independent;

/// <summary>
/// Simulates what a bench writes for a stone of a species in the independent property table (docs/benchmark.md,
/// "The simulator"). True values are drawn from the table's ranges along the species' composition series, a few
/// stones beyond them; the refractometer series comes from the indicatrix section of a random facet at each rotation
/// step; every other test has its own detection or misreading model and is skipped at random as a bench would.
/// Magnification comes from a <see cref="LoupeExaminer"/> with its own random stream, so the other readings of a seed
/// do not depend on it. Nothing here reads the catalogue or the engine's likelihood tables.
/// </summary>
internal sealed class IndependentStoneSimulator(Random random, LoupeExaminer? loupe = null, double beyondRangeShare = IndependentStoneSimulator.BeyondRangeShare,
    Random? doubling = null)
{
    /// <summary>
    /// Share of stones drawn beyond the published ranges (index, SG or both): 7 %, inside the brief's 5–10 % (the
    /// benchmark's <c>--beyond</c> option sets another share for a stress check).
    /// </summary>
    public const double BeyondRangeShare = 0.07;

    /// <summary>A categorical reading (polariscope, pleochroism, probes, UV, dispersion word) is misread 3 % of the time.</summary>
    public const double MisreadRate = 0.03;

    /// <summary>Edges closer than this are written as one (the eye's resolution, DOMAIN.md §6b).</summary>
    public const double MergedEdges = 0.0015;

    /// <summary>Spectroscope: a strong line is seen 90 % of the time, a faint one 30 %; a spurious line appears on 10 % of spectra; positions read with σ 2 nm.</summary>
    public const double StrongLineSeen = 0.9, FaintLineSeen = 0.3, SpuriousLine = 0.1, LineReadingNanometres = 2;

    /// <summary>
    /// A spot reading on an aggregate whose principal indices span at least this much (the carbonates: calcite, aragonite,
    /// malachite, pearl and shell) is read at one end of the span, the lowest or the highest principal index, never in
    /// between: the shadow edge jumps between the two as the polarizing filter is turned (the "birefringence blink",
    /// named for shell by globalgemology.com 'Abalone shell'); which end the bench writes is an even chance. Below it
    /// the spot is an average somewhere inside the span, as for turquoise and howlite, whose sources give one spot value
    /// inside their published range. The threshold and the even chance: common practice and judgement.
    /// </summary>
    public const double BlinkSpan = 0.1;

    /// <summary>Heavy liquids a bench keeps, densest first (studiopjj.blogspot.com, "Indicator stones").</summary>
    private static readonly double[] Liquids = [3.32, 3.05, 2.85, 2.67, 2.62, 2.57];

    private static readonly double[] Liquid = [1.78, 1.79, 1.80, 1.81];

    private static readonly string[] PolariscopeWords = ["singly_refractive", "doubly_refractive", "aggregate", "anomalous"];
    private static readonly string[] PleochroismWords = ["none", "dichroic", "trichroic"];
    private static readonly string[] StrengthWords = ["inert", "weak", "moderate", "strong"];
    private static readonly string[] DispersionWords = ["none", "weak", "moderate", "strong", "very_strong"];

    public SimulatedStone Simulate(SpeciesProperties species, string id)
    {
        bool beyond = random.NextDouble() < beyondRangeShare;
        int beyondWhat = beyond ? random.Next(3) : -1; // 0 index, 1 SG, 2 both
        double quantile = random.NextDouble();
        double drawn = Draw(species.Indices.Drawn, quantile, beyondWhat is 0 or 2, 0.01, out int indexSide);
        var principal = Principal(species.Indices, drawn);
        double sgQuantile = species.SgFollowsIndex switch
        {
            > 0 => Clamp01(quantile + Gauss(0.15)),
            < 0 => Clamp01(1 - quantile + Gauss(0.15)),
            _ => random.NextDouble(),
        };
        // An SG beyond the range of a species whose SG follows its index lies on the side its index points to (past the
        // index's own side when both are beyond): a glass of index 1.46 is never as dense as 4.75 (Gladstone–Dale), nor a
        // garnet low in the series heavier than its heaviest member. Drawn on a random side, such pairs were stones no
        // material makes.
        int? sgSide = species.SgFollowsIndex == 0 ? null
            : Math.Sign(species.SgFollowsIndex) * (beyondWhat == 2 ? indexSide : quantile >= 0.5 ? 1 : -1);
        double sg = Draw(species.SpecificGravity, sgQuantile, beyondWhat is 1 or 2, 0.05, out _, sgSide);
        string origin = Pick(species.Origins);
        string hue = Pick(species.Hues);
        // The loupe draws from its own stream, so asking it first leaves the other draws of the seed as they were; its
        // method of growth says whether the stone reads as the method's published figures rather than the species' row.
        var magnification = loupe?.Examine(species, origin, hue);
        if (MethodProperties.For(species.Name, magnification?.Habit.Method) is { } method)
            (principal, sg) = method.Apply(species, principal, sg);
        var readings = Readings(species, id, principal, sg, origin, hue);
        if (magnification is { Looked: true })
        {
            readings = readings with { FeaturesPresent = magnification.Present, FeaturesAbsent = magnification.Absent };
            // Doubling, from the true principal values, on its own stream (DoublingSighting).
            if (doubling is not null && DoublingSighting.Look(doubling, species, principal, magnification.Microscope, species.Opaque || hue == "black") is { } seen)
                readings = seen ? readings with { FeaturesPresent = [.. readings.FeaturesPresent ?? [], DoublingSighting.Word] }
                    : readings with { FeaturesAbsent = [.. readings.FeaturesAbsent ?? [], DoublingSighting.Word] };
        }
        return new SimulatedStone
        {
            Species = species, Origin = origin, Hue = hue, Principal = principal, SpecificGravity = sg, BeyondRange = beyond,
            Readings = readings, Line = BatchLineWriter.Write(readings), Magnification = magnification,
        };
    }

    /// <summary>A value at the quantile of the range, or beyond it by 5–30 % of its width (at least of a minimum span) on a random side.</summary>
    /// <remarks>
    /// The side is drawn even when <paramref name="side"/> fixes it (−1 low, +1 high), so the seed's later draws stay as they were.
    /// </remarks>
    private double Draw(IndexRange range, double quantile, bool beyond, double minimumSpan, out int sideTaken, int? side = null)
    {
        sideTaken = 0;
        if (!beyond) return range.Low + quantile * range.Width;
        double by = (0.05 + 0.25 * random.NextDouble()) * Math.Max(range.Width, minimumSpan);
        int randomSide = random.NextDouble() < 0.5 ? -1 : 1;
        sideTaken = side ?? randomSide;
        return sideTaken < 0 ? range.Low - by : range.High + by;
    }

    /// <summary>The principal values from the index drawn (<see cref="PrincipalValues.Drawn"/>) and a birefringence drawn here.</summary>
    private (double X, double Y, double Z) Principal(PrincipalValues p, double drawn)
    {
        var range = p.BirefringenceFor(drawn);
        double birefringence = range.Low + random.NextDouble() * range.Width;
        switch (p.Model)
        {
            case OpticModel.Uniaxial:
                double epsilon = p.Positive ? drawn + birefringence : drawn - birefringence;
                return (drawn, drawn, epsilon);
            case OpticModel.Biaxial:
                double fraction = p.BetaFraction.Low + random.NextDouble() * p.BetaFraction.Width;
                return (drawn, drawn + fraction * birefringence, drawn + birefringence);
            default:
                return (drawn, drawn, drawn);
        }
    }

    private BenchReadings Readings(SpeciesProperties s, string id, (double X, double Y, double Z) n, double sg, string origin, string hue)
    {
        bool colourless = hue == "colourless";
        bool anisotropic = s.Indices.Model != OpticModel.Isotropic && s.Form == StoneForm.Crystal;
        // The contact liquid: one of the usual 1.78–1.81 liquids; its own edge hides anything at or above it.
        double liquid = Liquid[random.Next(Liquid.Length)];
        var readings = new BenchReadings { Id = id, LiquidLimit = liquid };
        if (Chance(0.95)) readings = Refractometer(readings, s, n, liquid);
        readings = Gravity(readings, s, sg);
        return readings with
        {
            Polariscope = !s.Opaque && Chance(0.8) ? Misread(PolariscopeReaction(s), PolariscopeWords) : null,
            Pleochroism = !s.Opaque && !colourless && Chance(0.5) ? Misread(Pleochroism(s, anisotropic), PleochroismWords) : null,
            Dispersion = s.Dispersion is { } d && (colourless || d >= 0.03) && Chance(0.2) ? Misread(DispersionWord(d), DispersionWords) : null,
            ThermalProbe = Chance(colourless ? 0.6 : 0.2) ? Misread(s.ThermalPositive ? "positive" : "negative", ["positive", "negative"]) : null,
            Electrical = Chance(colourless && s.ThermalPositive ? 0.4 : 0.05) ? Misread(s.Conductive ? "conductive" : "insulating", ["conductive", "insulating"]) : null,
            UvLong = s.UvLong.Count > 0 && Chance(0.5) ? Misread(Pick(s.UvLong), StrengthWords) : null,
            UvShort = s.UvShort.Count > 0 && Chance(0.3) ? Misread(Pick(s.UvShort), StrengthWords) : null,
            AbsorptionNanometres = !colourless && !s.Opaque && Chance(0.4) ? Lines(s, hue, origin) : null,
            Colour = Chance(0.95) ? hue : null,
        };
    }

    private BenchReadings Refractometer(BenchReadings r, SpeciesProperties s, (double X, double Y, double Z) n, double liquid)
    {
        double low = Math.Min(n.X, Math.Min(n.Y, n.Z)), high = Math.Max(n.X, Math.Max(n.Y, n.Z));
        // Aggregates are read by spot; amorphous stones are often cabochons or beads, crystals now and then.
        bool spot = s.Form == StoneForm.Aggregate || Chance(s.Form == StoneForm.Amorphous ? 0.5 : 0.15);
        if (spot)
        {
            double averaged = Blinks(s, low, high) ? (Chance(0.5) ? low : high) : low + random.NextDouble() * (high - low);
            if (averaged >= liquid) return r with { RefractometerMethod = "spot", OverLimit = true };
            double reading = Math.Round(averaged + (random.NextDouble() - 0.5) * 0.01, 2);
            return reading > liquid
                ? r with { RefractometerMethod = "spot", OverLimit = true }
                : r with { RefractometerMethod = "spot", Spot = reading };
        }
        int count = random.Next(3) switch { 0 => 4, 1 => 6, _ => 8 };
        double start = random.NextDouble() * Math.PI;
        double sigma = 0.0005 + 0.0005 * random.NextDouble();
        var normal = RandomDirection();
        var u = IndicatrixSection.Unit(IndicatrixSection.Cross(normal, Math.Abs(normal.X) < 0.9 ? (1.0, 0.0, 0.0) : (0.0, 1.0, 0.0)));
        var v = IndicatrixSection.Cross(normal, u);
        var steps = new List<EdgeStep>();
        for (int k = 0; k < count; k++)
        {
            double phi = start + k * Math.PI / count;
            var direction = (Math.Cos(phi) * u.X + Math.Sin(phi) * v.X, Math.Cos(phi) * u.Y + Math.Sin(phi) * v.Y, Math.Cos(phi) * u.Z + Math.Sin(phi) * v.Z);
            var (lowEdge, highEdge) = IndicatrixSection.Edges(n.X, n.Y, n.Z, normal, direction);
            double rotation = k * 180.0 / count;
            if (highEdge - lowEdge < MergedEdges)
            {
                double merged = (lowEdge + highEdge) / 2;
                if (merged < liquid) steps.Add(new(rotation, Read(merged, sigma), null));
                continue;
            }
            if (lowEdge >= liquid) continue; // both edges hidden by the liquid's own edge
            double lowRead = Read(lowEdge, sigma);
            if (highEdge >= liquid) { steps.Add(new(rotation, lowRead, null)); continue; }
            double highRead = Read(highEdge, sigma);
            // The bench writes the lower of the two edges it sees as the low one; equal readings are one edge.
            steps.Add(highRead == lowRead ? new(rotation, lowRead, null) : new(rotation, Math.Min(lowRead, highRead), Math.Max(lowRead, highRead)));
        }
        return steps.Count == 0
            ? r with { RefractometerMethod = "facet", OverLimit = true }
            : r with { RefractometerMethod = "facet", Steps = steps };
    }

    /// <summary>True when a spot on the stone is read at either end of its span (<see cref="BlinkSpan"/>).</summary>
    public static bool Blinks(SpeciesProperties s, double low, double high) => s.Form == StoneForm.Aggregate && high - low >= BlinkSpan;

    private double Read(double index, double sigma) => Math.Round(index + Gauss(sigma), 3);

    private BenchReadings Gravity(BenchReadings r, SpeciesProperties s, double sg)
    {
        if (s.Porous) return r; // porous and organic stones are not immersed (common practice)
        double mode = random.NextDouble();
        if (mode < 0.45) return r with { SpecificGravity = Math.Round(sg + Gauss(0.01), 2) };
        if (mode < 0.70)
        {
            double air = Math.Exp(Math.Log(0.3) + random.NextDouble() * Math.Log(8 / 0.3)); // 0.3–8 ct, log-uniform
            double celsius = 16 + 12 * random.NextDouble();
            double water = air - air * WaterDensity.RelativeToFourDegrees(celsius) / sg;
            // Balance 0.001 ct; the wire's surface tension and small bubbles add about 0.002 ct (common practice).
            var weighing = new HydrostaticWeights(Math.Round(air + Gauss(0.001), 3), Math.Round(water + Gauss(0.002), 3), Chance(0.7) ? Math.Round(celsius, 1) : null);
            // A stone lighter than water (a plastic drawn below its range) floats: nothing to weigh in water (after the draws, so the seed's stream is kept).
            return weighing.WaterCarats > 0 ? r with { Weighing = weighing } : r;
        }
        if (mode < 0.85)
        {
            var tests = new List<HeavyLiquidTest>();
            foreach (double density in Liquids)
            {
                string result = Math.Abs(sg - density) < 0.01 ? "suspends" : sg > density ? "sinks" : "floats";
                tests.Add(new(density, result));
                if (result != "floats") break;
            }
            return r with { HeavyLiquids = tests };
        }
        return r;
    }

    private string PolariscopeReaction(SpeciesProperties s) => s.Form switch
    {
        StoneForm.Aggregate => "aggregate",
        _ when s.Indices.Model == OpticModel.Isotropic => Chance(s.Strained) ? "anomalous" : "singly_refractive",
        _ => "doubly_refractive",
    };

    private string Pleochroism(SpeciesProperties s, bool anisotropic)
    {
        if (!anisotropic) return "none";
        double seen = s.Pleochroism switch
        {
            PleochroismHabit.Weak => 0.4,
            PleochroismHabit.Moderate => 0.7,
            PleochroismHabit.Strong => 0.9,
            _ => 0,
        };
        if (!Chance(seen)) return "none";
        return s.Indices.Model == OpticModel.Biaxial && s.Pleochroism == PleochroismHabit.Strong && Chance(0.4) ? "trichroic" : "dichroic";
    }

    /// <summary>Fire by eye from nG − nB: below 0.015 weak, below 0.025 moderate, below 0.045 strong, above very strong (judgement).</summary>
    private static string DispersionWord(double d) => d switch
    {
        < 0.015 => "weak",
        < 0.025 => "moderate",
        < 0.045 => "strong",
        _ => "very_strong",
    };

    private List<double> Lines(SpeciesProperties s, string hue, string origin)
    {
        var seen = new List<double>();
        foreach (var line in s.Lines)
        {
            if (line.Hue is { } h && h != hue) continue;
            if (line.NaturalOnly && origin != "natural") continue;
            if (Chance(line.Strong ? StrongLineSeen : FaintLineSeen)) seen.Add(Math.Round(line.Nanometres + Gauss(LineReadingNanometres)));
        }
        if (Chance(SpuriousLine)) seen.Add(Math.Round(420 + 260 * random.NextDouble()));
        seen.Sort();
        return seen;
    }

    private string Misread(string word, string[] words) =>
        Chance(MisreadRate) ? words.Where(w => w != word).ElementAt(random.Next(words.Length - 1)) : word;

    private (double X, double Y, double Z) RandomDirection()
    {
        // Uniform on the sphere: z uniform in [−1, 1], azimuth uniform.
        double z = 2 * random.NextDouble() - 1, azimuth = 2 * Math.PI * random.NextDouble(), r = Math.Sqrt(1 - z * z);
        return (r * Math.Cos(azimuth), r * Math.Sin(azimuth), z);
    }

    private string Pick(IReadOnlyList<Weighted> outcomes)
    {
        double x = random.NextDouble() * outcomes.Sum(o => o.Weight);
        foreach (var o in outcomes)
            if ((x -= o.Weight) <= 0) return o.Word;
        return outcomes[^1].Word;
    }

    private bool Chance(double probability) => random.NextDouble() < probability;

    private static double Clamp01(double x) => Math.Clamp(x, 0, 1);

    private double Gauss(double sigma)
    {
        double u1 = 1 - random.NextDouble(), u2 = random.NextDouble();
        return sigma * Math.Sqrt(-2 * Math.Log(u1)) * Math.Cos(2 * Math.PI * u2);
    }
}
