namespace GemIndex.Bench.Independent;

/// <summary>
/// Says whether the readings of a stone could have come from a species, knowing the true property table: every
/// number within the species' published ranges widened by the reading model's error, every hard categorical reading
/// (polariscope, pleochroism seen, probes) among those the species can give. Colour, UV, dispersion by eye and
/// absorption lines are soft evidence with spurious and missed outcomes and are not used. A stone is "separated by
/// the evidence" when its own species is consistent with its readings and no species of another catalogue group is
/// (docs/benchmark.md, "Separable stones").
/// </summary>
internal static class SeparabilityOracle
{
    /// <summary>Facet reading: σ up to 0.001, rounding 0.0005, and two edges' worth of margin.</summary>
    public const double IndexTolerance = 0.004;

    /// <summary>Spot reading: ±0.005 scatter plus rounding to 0.01, with margin.</summary>
    public const double SpotTolerance = 0.012;

    /// <summary>Direct SG: σ 0.01 rounded to 0.01, three σ and rounding.</summary>
    public const double DirectGravityTolerance = 0.035;

    /// <summary>Heavy liquids: the liquid's own density is known to about ±0.01.</summary>
    public const double LiquidTolerance = 0.01;

    /// <summary>The catalogue groups other than the stone's own whose species could have given these readings.</summary>
    public static IReadOnlyList<string> Confusers(SimulatedStone stone, IReadOnlyList<SpeciesProperties> table)
    {
        string own = CatalogueSpeciesNames.GroupOf(stone.Species.Name);
        return [.. table.Where(s => CatalogueSpeciesNames.GroupOf(s.Name) != own && Consistent(s, stone.Readings))
            .Select(s => CatalogueSpeciesNames.GroupOf(s.Name)).Distinct()];
    }

    public static bool Consistent(SpeciesProperties s, BenchReadings r) =>
        RefractometerConsistent(s, r) && GravityConsistent(s, r) && CategoricalConsistent(s, r);

    private static bool RefractometerConsistent(SpeciesProperties s, BenchReadings r)
    {
        if (r.RefractometerMethod is null) return true;
        var p = s.Indices;
        double lowest = p.Lowest.Low, highest = p.HighestMaximum;
        // The highest the lowest edge of a series can stay (β, or ω of a negative stone) and the lowest the highest can.
        double lowCeiling = p.Model switch
        {
            OpticModel.Biaxial => p.Lowest.High + p.BetaFraction.High * p.Birefringence.High,
            OpticModel.Uniaxial when !p.Positive => p.Lowest.High + p.Birefringence.High,
            _ => p.Lowest.High,
        };
        double highFloor = p.Model switch
        {
            OpticModel.Biaxial => p.Lowest.Low + p.BetaFraction.Low * p.Birefringence.Low,
            OpticModel.Uniaxial when !p.Positive => p.Lowest.Low + p.Birefringence.Low,
            _ => p.Lowest.Low,
        };
        if (r.Spot is { } spot)
        {
            // An aggregate whose every stone blinks is read at one end of its span: near the lowest principal index or
            // near the highest (IndependentStoneSimulator.BlinkSpan); any other is read anywhere inside it.
            if (s.Form != StoneForm.Aggregate || p.Birefringence.Low < IndependentStoneSimulator.BlinkSpan)
                return spot >= lowest - SpotTolerance && spot <= highest + SpotTolerance;
            bool lowEnd = spot >= lowest - SpotTolerance && spot <= p.Lowest.High + SpotTolerance;
            bool highEnd = spot >= p.Lowest.Low + p.Birefringence.Low - SpotTolerance && spot <= highest + SpotTolerance;
            return lowEnd || highEnd;
        }
        // A spot over the limit: the spot can land anywhere up to the highest principal index; a facet only beyond β or ω.
        if (r.Steps.Count == 0 && r.RefractometerMethod == "spot") return !r.OverLimit || highest >= r.LiquidLimit - 0.02;
        if (r.Steps.Count == 0) return !r.OverLimit || lowCeiling >= r.LiquidLimit - 0.02;
        double minLow = r.Steps.Min(x => x.Low);
        double maxHigh = r.Steps.Max(x => x.High ?? x.Low);
        bool highMayBeHidden = highest >= r.LiquidLimit - 0.02;
        if (minLow < lowest - IndexTolerance || minLow > lowCeiling + IndexTolerance) return false;
        if (maxHigh > highest + IndexTolerance) return false;
        if (!highMayBeHidden && maxHigh < highFloor - IndexTolerance) return false;
        if (maxHigh - minLow > p.Birefringence.High + 2 * IndexTolerance) return false;
        bool twoEdges = r.Steps.Any(x => x.High is { } h && h - x.Low > 2 * IndexTolerance);
        bool crystal = s.Form == StoneForm.Crystal;
        if ((p.Model == OpticModel.Isotropic || !crystal) && twoEdges) return false;
        bool oneEdgeOnly = r.Steps.All(x => x.High is null);
        if (p.Model != OpticModel.Isotropic && crystal && p.Birefringence.Low > 2 * IndexTolerance && oneEdgeOnly && r.Steps.Count >= 3 && !highMayBeHidden) return false;
        return true;
    }

    private static bool GravityConsistent(SpeciesProperties s, BenchReadings r)
    {
        var sg = s.SpecificGravity;
        if (r.SpecificGravity is { } direct && !sg.Contains(direct, DirectGravityTolerance)) return false;
        if (r.Weighing is { } w)
        {
            double measured = w.AirCarats / (w.AirCarats - w.WaterCarats) * WaterDensity.RelativeToFourDegrees(w.WaterCelsius ?? 20);
            // First-order error of two weighings of σ 0.002 ct each, three σ, plus 0.01 for the temperature assumed.
            double sigma = measured * measured * Math.Sqrt(2) * 0.002 / w.AirCarats;
            if (!sg.Contains(measured, 3 * sigma + 0.01)) return false;
        }
        foreach (var h in r.HeavyLiquids)
        {
            bool fits = h.Result switch
            {
                "floats" => sg.Low < h.Density + LiquidTolerance,
                "sinks" => sg.High > h.Density - LiquidTolerance,
                _ => sg.Contains(h.Density, 2 * LiquidTolerance),
            };
            if (!fits) return false;
        }
        return true;
    }

    private static bool CategoricalConsistent(SpeciesProperties s, BenchReadings r)
    {
        bool isotropic = s.Indices.Model == OpticModel.Isotropic && s.Form != StoneForm.Aggregate;
        bool anisotropicCrystal = s.Indices.Model != OpticModel.Isotropic && s.Form == StoneForm.Crystal;
        bool polariscopeFits = r.Polariscope switch
        {
            null => true,
            "singly_refractive" or "anomalous" => isotropic,
            "doubly_refractive" => anisotropicCrystal,
            _ => s.Form == StoneForm.Aggregate,
        };
        bool pleochroismFits = r.Pleochroism switch
        {
            "dichroic" => anisotropicCrystal,
            "trichroic" => anisotropicCrystal && s.Indices.Model == OpticModel.Biaxial,
            _ => true,
        };
        bool thermalFits = r.ThermalProbe is null || (r.ThermalProbe == "positive") == s.ThermalPositive;
        bool electricalFits = r.Electrical is null || (r.Electrical == "conductive") == s.Conductive;
        return polariscopeFits && pleochroismFits && thermalFits && electricalFits;
    }
}
