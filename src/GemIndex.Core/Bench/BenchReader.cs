using System.Globalization;
using GemIndex.Core.Gravity;
using GemIndex.Core.Identification;
using GemIndex.Core.Magnification;
using GemIndex.Core.Observations;
using GemIndex.Core.Optics.Refractometer;
using GemIndex.Core.Quantities;
using GemIndex.Core.Readings;

namespace GemIndex.Core.Bench;

/// <summary>
/// The one reader of a stone's readings: every value is checked through Core's own types, a bad field is reported
/// with its name, value, allowed range and a sentence, and left out, so that every error is found in one pass and
/// the rest of the sheet can still be used. Never throws for bad input. The defaults are <see cref="BenchDefaults"/>.
/// </summary>
public static class BenchReader
{
    private static readonly HashSet<string> Known = [.. BenchField.All];

    /// <summary>Reads the readings into a sheet and the list of every field's error.</summary>
    public static BenchReading Read(BenchReadings readings)
    {
        var pass = new Pass(readings);
        return pass.Read();
    }

    private sealed class Pass(BenchReadings r)
    {
        private readonly List<BenchFieldError> _errors = [];

        public BenchReading Read()
        {
            foreach (string field in r.Values.Keys.Where(k => !Known.Contains(k)))
                Error(field, r.Text(field), "the fields of a stone's readings", "is not a field of a stone's readings.");
            // The cut first: a faceted stone adds the star and the cat's-eye to what was looked for and not seen.
            StoneCut? cut = Word<StoneCut>(BenchField.Cut);
            MagnificationObservation? magnification = Magnification(cut);
            var sheet = new BenchSheet
            {
                Id = r.Text(BenchField.Id)?.Trim() ?? "",
                Refractometer = Refractometer(),
                SpecificGravity = Gravity(),
                HeavyLiquids = HeavyLiquids(),
                Polariscope = Word<PolariscopeReaction>(BenchField.Polariscope),
                Pleochroism = Word<PleochroismObservation>(BenchField.Pleochroism),
                Dispersion = Dispersion(),
                ThermalProbe = Word<ThermalProbeResult>(BenchField.ThermalProbe),
                Electrical = Word<ElectricalResult>(BenchField.Electrical),
                Reflectance = Number(BenchField.Reflectance) is { } percent ? Checked(BenchField.Reflectance, r.Text(BenchField.Reflectance)!, () => new ReflectanceReading(percent)) : null,
                UvLong = Word<FluorescenceStrength>(BenchField.UvLong),
                UvShort = Word<FluorescenceStrength>(BenchField.UvShort),
                AbsorptionLinesNanometres = Absorption(),
                Colour = Colour(),
                Cut = HasError(BenchField.Cut) ? null : cut,
                Transparency = Word<StoneTransparency>(BenchField.Transparency),
                Magnification = magnification,
            };
            return new BenchReading { Sheet = sheet, Errors = [.. _errors.OrderBy(e => Order(e.Field)).ThenBy(e => e.Field, StringComparer.Ordinal)] };
        }

        private static int Order(string field)
        {
            if (field.StartsWith(BenchField.Readings, StringComparison.Ordinal)) return BenchField.All.Count / 2;
            int i = BenchField.All.ToList().IndexOf(field);
            return i < 0 ? BenchField.All.Count : i;
        }

        private RefractometerObservation? Refractometer()
        {
            double? liquidGiven = Number(BenchField.LiquidLimit);
            // A liquid limit the observation refuses (outside 1.5–2.2) leaves the default in use: the steps are held to
            // that, each at its own row (they were left unchecked, and one above the default then refused the whole
            // series at no step).
            double liquid = liquidGiven is >= 1.5 and <= 2.2 ? liquidGiven.Value : BenchDefaults.LiquidLimit;
            var steps = Steps(liquid, checkAboveLiquid: true);
            double? spot = Number(BenchField.Spot);
            bool? over = YesNo(BenchField.OverLimit);
            double? light = Number(BenchField.LightNm), precision = Number(BenchField.Precision), offset = Number(BenchField.CalibrationOffset);
            RefractometerMethod? method = r.Text(BenchField.Method) is null ? null : Word<RefractometerMethod>(BenchField.Method);
            bool anyReading = steps.Count > 0 || spot is not null || over == true;
            bool anyGiven = r.Steps.Count > 0 || r.Text(BenchField.Spot) is not null || over == true;
            // The instrument's settings with no reading yet (the liquid typed before the first edge, as at the bench): kept,
            // checked for their ranges below, and not an error; they apply once a reading comes.
            if (!anyGiven && new[] { BenchField.Method, BenchField.LiquidLimit, BenchField.LightNm, BenchField.Precision, BenchField.CalibrationOffset }
                    .All(f => r.Text(f) is null))
                return null;
            // A spot reading is one number; rotation steps are facet readings. Read as edges, a "spot" step would be scored
            // as a crystal's constant edge, not as a spot reading's blur between a material's extreme indices.
            if (method == RefractometerMethod.Spot && r.Steps.Count > 0)
                Error(BenchField.Method, r.Text(BenchField.Method) ?? "", "facet with rotation steps, or spot with one spot reading",
                    "is spot, but rotation steps are given: a spot reading goes in the spot field as one number; steps are read on a facet.");
            if (over == true && r.Text(BenchField.Spot) is not null)
                Error(BenchField.OverLimit, "yes", "over the limit, or a spot reading, not both",
                    $"says no edge was seen, but a spot reading {BenchText.Shown(r.Text(BenchField.Spot))} is given too.");
            // "Over the limit" with steps is the trade's "high edge OTL": the steps give only their low edges, and a step
            // without a high edge is already read as one hidden above the liquid. A high edge read contradicts it.
            if (over == true && r.Steps.FindIndex(s => s.High.Trim().Length > 0) is int withHigh and >= 0)
                Error(BenchField.OverLimit, "yes", "over the limit only when the high edge was not seen",
                    $"says the high edge was not seen, but step {withHigh + 1} ({BenchField.Step(withHigh)}) gives one.");
            if (HasError(BenchField.OverLimit) || HasError(BenchField.Method)) return null;
            // Readings given but none readable: the instrument's settings are still checked, each at its field (a liquid
            // limit of 2.5 had waited for a good step to be refused).
            bool probe = !anyReading;
            var observation = new Dictionary<string, double?>
            {
                [BenchField.LightNm] = light, [BenchField.LiquidLimit] = liquidGiven, [BenchField.Precision] = precision,
                [BenchField.CalibrationOffset] = offset, [BenchField.Spot] = spot,
            };
            // Core checks each instrument setting; a refused one is reported at its field and left at its default.
            for (int attempt = 0; attempt <= observation.Count; attempt++)
            {
                try
                {
                    var m = method ?? (observation[BenchField.Spot] is not null && steps.Count == 0 ? RefractometerMethod.Spot : RefractometerMethod.Facet);
                    if (probe)
                    {
                        // Over the limit stands in for the unreadable readings: only the settings are checked.
                        _ = new RefractometerObservation(m, [], null, true, observation[BenchField.LightNm] ?? BenchDefaults.LightNanometres,
                            BenchDefaults.LiquidLimitOrDefault(observation[BenchField.LiquidLimit]), observation[BenchField.Precision],
                            observation[BenchField.CalibrationOffset] ?? BenchDefaults.CalibrationOffset);
                        return null;
                    }
                    return new RefractometerObservation(m, steps, observation[BenchField.Spot], over == true,
                        observation[BenchField.LightNm] ?? BenchDefaults.LightNanometres, BenchDefaults.LiquidLimitOrDefault(observation[BenchField.LiquidLimit]),
                        observation[BenchField.Precision], observation[BenchField.CalibrationOffset] ?? BenchDefaults.CalibrationOffset);
                }
                catch (QuantityOutOfRangeException e)
                {
                    string field = e.Quantity switch
                    {
                        "light" or "wavelength" => BenchField.LightNm,
                        "liquid limit" => BenchField.LiquidLimit,
                        "reading precision" => BenchField.Precision,
                        "calibration offset" => BenchField.CalibrationOffset,
                        "spot reading" => BenchField.Spot,
                        _ => BenchField.Readings,
                    };
                    Error(field, r.Text(field) ?? "", e.Allowed, e.Message);
                    if (field == BenchField.Readings || observation[field] is null) return null;
                    observation[field] = null;
                    if (!probe && steps.Count == 0 && observation[BenchField.Spot] is null && over != true) return null;
                }
            }
            return null;
        }

        private List<ShadowEdgeStep> Steps(double liquid, bool checkAboveLiquid)
        {
            var steps = new List<ShadowEdgeStep>();
            if (r.Steps.Count > BenchDefaults.MostSteps)
            {
                Error(BenchField.Readings, r.Steps.Count.ToString(CultureInfo.InvariantCulture), $"1–{BenchDefaults.MostSteps} steps",
                    $"has {r.Steps.Count} rotation steps; allowed: 1–{BenchDefaults.MostSteps}.");
                return steps;
            }
            // No rotation given at all: the steps were read in order, evenly over a half turn (i·180°/n), the usual way.
            bool unrotated = r.Steps.All(s => s.Rotation.Trim().Length == 0);
            for (int i = 0; i < r.Steps.Count; i++)
            {
                EdgeStepText s = r.Steps[i];
                string field = BenchField.Step(i);
                double? rotation = unrotated ? i * 180.0 / r.Steps.Count : s.Rotation.Trim().Length == 0 ? 0 : Parse(field, "rotation", s.Rotation);
                // Every part is read, so that one pass names each bad one (a bad rotation hid a bad edge).
                double? edgeLimit = checkAboveLiquid ? liquid : null;
                double? low = Parse(field, "low", s.Low, edgeLimit);
                double? high = s.High.Trim().Length == 0 ? null : Parse(field, "high", s.High, edgeLimit);
                // Each edge against the scale first, so that an edge no refractometer shows is named as such, both when
                // both are (not "high below low" for a low edge typed above the liquid); an edge that is a number is
                // checked even when the other part of its step is not (a low edge of 180 beside a high edge not a number).
                var edges = new[] { ("low", low), ("high", high) }.Where(e => e.Item2 is not null).Select(e => (Part: e.Item1, Value: e.Item2!.Value)).ToList();
                // "low edge 1.8 and high edge 1.81 are", "low edge 2.5 is": the edges the predicate picks, or null.
                string? Named(Func<double, bool> off) => edges.Where(e => off(e.Value)).ToList() is { Count: > 0 } picked
                    ? string.Join(" and ", picked.Select(e => $"{e.Part} edge {e.Value.ToString("0.####", CultureInfo.InvariantCulture)}")) + (picked.Count > 1 ? " are" : " is")
                    : null;
                string limit = liquid.ToString("0.000", CultureInfo.InvariantCulture), bottom = RefractometerProfile.ScaleBottom.ToString("0.00", CultureInfo.InvariantCulture);
                if (checkAboveLiquid && Named(e => e > liquid + BenchDefaults.EdgeSlackAboveLiquid) is { } above)
                {
                    Error(field, BenchSyntax.Step(s), $"at most the liquid limit {limit}", $"{above} above the liquid limit {limit}, where no edge shows"
                        + (r.Text(BenchField.LiquidLimit) is null ? $" (a denser liquid? set {BenchField.LiquidLimit})." : "."));
                    continue;
                }
                if (Named(e => e < RefractometerProfile.ScaleBottom) is { } below)
                {
                    Error(field, BenchSyntax.Step(s), $"at least the scale's {bottom}", $"{below} below the scale's lowest index {bottom}, where no refractometer reads.");
                    continue;
                }
                if (rotation is null || low is null || s.High.Trim().Length > 0 && high is null) continue;
                ShadowEdgeStep step;
                try { step = new ShadowEdgeStep(rotation.Value, low.Value, high); }
                catch (QuantityOutOfRangeException e) { Error(field, BenchSyntax.Step(s), e.Allowed, e.Message); continue; }
                steps.Add(step);
            }
            return steps;
        }

        private SpecificGravity? Gravity()
        {
            string? direct = r.Text(BenchField.Sg), air = r.Text(BenchField.AirCt), water = r.Text(BenchField.WaterCt), celsius = r.Text(BenchField.WaterC);
            bool weighed = air is not null || water is not null;
            // A typed SG that is itself refused (not a number, out of range) is named with its own reason, and the
            // weighing stands on its own: the typed value cannot be meant, and nothing typed is lost.
            bool typedRefused = false;
            if (direct is not null && weighed)
            {
                int before = _errors.Count;
                SpecificGravity? typed = Number(BenchField.Sg) is { } s ? Checked(BenchField.Sg, direct, () => new SpecificGravity(s, BenchDefaults.DirectSpecificGravityUncertainty)) : null;
                typedRefused = typed is null && _errors.Count > before;
            }
            if (direct is not null && weighed && !typedRefused)
            {
                Error(BenchField.Sg, direct, "SG typed, or weights in air and water, not both",
                    $"is given directly ({BenchText.Shown(direct)}) and by weighing ({BenchField.AirCt}, {BenchField.WaterCt}); give one of them.");
                // Each value's own fault is still named, so that one pass shows everything to mend.
                foreach (string field in new[] { BenchField.AirCt, BenchField.WaterCt })
                    if (Number(field) is { } ct) Checked(field, r.Text(field)!, () => BenchDefaults.Weighed(ct));
                if (Number(BenchField.WaterC) is { } c) Checked(BenchField.WaterC, celsius!, () => WaterDensity.At(Temperature.FromCelsius(c)).Temperature);
                return null;
            }
            // The water's temperature noted before the stone is weighed (or beside a typed SG): kept and checked for its range,
            // not an error; it applies once a weighing comes.
            if (celsius is not null && !weighed && Number(BenchField.WaterC) is { } noted)
                Checked(BenchField.WaterC, celsius, () => WaterDensity.At(Temperature.FromCelsius(noted)).Temperature);
            if (direct is not null && !typedRefused)
                return Number(BenchField.Sg) is { } sg ? Checked(BenchField.Sg, direct, () => new SpecificGravity(sg, BenchDefaults.DirectSpecificGravityUncertainty)) : null;
            if (!weighed) return null;
            if (air is null) Error(BenchField.AirCt, "", "a weight in carats", "is missing: a hydrostatic weighing needs the weight in air as well as in water.");
            if (water is null) Error(BenchField.WaterCt, "", "a weight in carats", "is missing: a hydrostatic weighing needs the weight in water as well as in air.");
            double? airCt = Number(BenchField.AirCt), waterCt = Number(BenchField.WaterCt), waterC = Number(BenchField.WaterC);
            // Each weight is judged on its own field and in the bench's words ("weight in air", not "mass"): a weight in
            // air of 0 was reported on the weight in water.
            if (airCt is <= 0)
            {
                Error(BenchField.AirCt, air, "above 0 ct", $"weight in air is {BenchText.Shown(air)} ct; allowed: above 0 ct.");
                airCt = null;
            }
            if (waterCt is < 0)
            {
                Error(BenchField.WaterCt, water, "0 ct or more, below the weight in air",
                    $"weight in water is {BenchText.Shown(water)} ct; allowed: 0 ct or more, below the weight in air (a stone that sinks weighs less in water).");
                waterCt = null;
            }
            Mass? inAir = airCt is { } a ? Weighed(BenchField.AirCt, "weight in air", air!, a) : null;
            Mass? inWater = waterCt is { } w ? Weighed(BenchField.WaterCt, "weight in water", water!, w) : null;
            Temperature? temperature = celsius is not null && waterC is null ? null
                : Checked(BenchField.WaterC, celsius ?? "", () => WaterDensity.At(Temperature.FromCelsius(waterC ?? BenchDefaults.WaterCelsius)).Temperature);
            if (inAir is not { } m1 || inWater is not { } m2) return null;
            if (temperature is not { } t)
            {
                // The temperature is refused; the weights are still checked against each other (at the usual water
                // temperature), so that one pass names every fault.
                Checked(BenchField.WaterCt, water!, () => HydrostaticWeighing.SpecificGravityOf(m1, m2, Temperature.FromCelsius(BenchDefaults.WaterCelsius)));
                return null;
            }
            // Weights too small for the balance give an SG uncertainty beyond what an SG can carry: said as the stone's
            // weight being too small, on the weight in air, with what to do instead.
            try { return HydrostaticWeighing.SpecificGravityOf(m1, m2, t); }
            catch (QuantityOutOfRangeException e) when (e.Quantity == "specific gravity uncertainty")
            {
                Error(BenchField.AirCt, air, "a stone heavy enough for the balance",
                    $"weight in air {BenchText.Shown(air)} ct is too small to weigh hydrostatically on this balance (±{BenchDefaults.WeighingUncertaintyCarats.ToString("0.###", CultureInfo.InvariantCulture)} ct): the SG would be uncertain by more than ±5; use heavy liquids instead.");
                return null;
            }
            catch (QuantityOutOfRangeException e) { Error(BenchField.WaterCt, water, e.Allowed, e.Message); return null; }
        }

        /// <summary>A weighing as a mass, its refusal said as the weight it is ("weight in air is 600000 ct"), not as a "mass".</summary>
        private Mass? Weighed(string field, string name, string text, double carats)
        {
            try { return BenchDefaults.Weighed(carats); }
            catch (QuantityOutOfRangeException e) when (e.Quantity == "mass")
            {
                Error(field, text, e.Allowed, $"{name} is {BenchText.Shown(text)} ct; allowed: {e.Allowed}.");
                return null;
            }
        }

        /// <summary>"float", "sink" and "suspend" as a bench note writes them: the outcome words they mean.</summary>
        private static string PlainVerb(string result) => result.Trim().ToLowerInvariant() switch
        {
            "float" => "floats",
            "sink" => "sinks",
            "suspend" or "suspended" => "suspends",
            _ => result,
        };

        private List<HeavyLiquidResult> HeavyLiquids()
        {
            var results = new List<HeavyLiquidResult>();
            if (r.Text(BenchField.HeavyLiquids) is not { } text) return results;
            if (text.Trim().Length == 0) { Empty(BenchField.HeavyLiquids, "DENSITY RESULT entries, e.g. 3.32 floats; 2.89 sinks"); return results; }
            var entries = BenchSyntax.HeavyLiquidEntries(text);
            string allowed = $"DENSITY RESULT entries separated by semicolons; RESULT one of {BenchWords.Choices<HeavyLiquidOutcome>()}";
            for (int i = 0; i < entries.Count; i++)
            {
                string entry = entries[i];
                string which = entries.Count > 1 ? $"entry {i + 1} " : "";
                if (BenchSyntax.HeavyLiquid(entry) is not { } parts)
                { Error(BenchField.HeavyLiquids, entry, allowed, $"{which}'{BenchText.Shown(entry)}' is not a density and a result (e.g. 3.32 floats)."); continue; }
                if (!BenchNumber.TryParse(parts.Density, out double density, out string problem))
                { Error(BenchField.HeavyLiquids, entry, allowed, which + Sentence(problem, parts.Density)); continue; }
                if (BenchWords.Parse<HeavyLiquidOutcome>(PlainVerb(parts.Result)) is not { } outcome)
                { Error(BenchField.HeavyLiquids, entry, allowed, $"{which}'{BenchText.Shown(parts.Result)}' is not one of {BenchWords.Choices<HeavyLiquidOutcome>()}."); continue; }
                if (Checked(BenchField.HeavyLiquids, entry, () => HeavyLiquidResult.Of(density, outcome)) is { } result) results.Add(result);
            }
            return results;
        }

        private DispersionObservation? Dispersion()
        {
            string? word = r.Text(BenchField.Dispersion), nBText = r.Text(BenchField.IndexAtB), nGText = r.Text(BenchField.IndexAtG);
            bool measured = nBText is not null || nGText is not null;
            if (word is not null && measured)
            {
                Error(BenchField.Dispersion, word, "by eye, or measured (nB and nG), not both",
                    $"is given by eye ({BenchText.Shown(word)}) and measured ({BenchField.IndexAtB}, {BenchField.IndexAtG}); give one of them.");
                return null;
            }
            if (word is not null) return Word<DispersionStrength>(BenchField.Dispersion) is { } strength ? DispersionObservation.ByEye(strength) : null;
            if (!measured) return null;
            if (nBText is null) Error(BenchField.IndexAtB, "", "an index", "is missing: a measured dispersion needs the index at the B line as well as at the G line.");
            if (nGText is null) Error(BenchField.IndexAtG, "", "an index", "is missing: a measured dispersion needs the index at the G line as well as at the B line.");
            double? nB = Number(BenchField.IndexAtB), nG = Number(BenchField.IndexAtG);
            if (nB is not { } b || nG is not { } g) return null;
            try { return DispersionObservation.FromIndices(b, g); }
            catch (QuantityOutOfRangeException e) { Error(BenchField.IndexAtG, nGText!, e.Allowed, e.Message); return null; }
        }

        /// <summary>A band written by its edges, "520-540" or "520 – 540".</summary>
        private static readonly System.Text.RegularExpressions.Regex BandByItsEdges = new(@"^\s*(\d{3}(?:\.\d+)?)\s*[-–]\s*(\d{3}(?:\.\d+)?)\s*$");

        private List<double>? Absorption()
        {
            if (r.Text(BenchField.Absorption) is not { } text) return null;
            if (text.Trim().Length == 0) { Empty(BenchField.Absorption, "lines in nm (592 685 656) or none"); return null; }
            var lines = new List<double>();
            foreach (string part in BenchSyntax.Lines(text))
            {
                if (!BenchNumber.TryParse(part, out double nm, out string problem))
                {
                    // A band written by its edges ("520-540"): the reading takes a band by its middle, as a line.
                    var band = BandByItsEdges.Match(part);
                    string why = band.Success
                        ? $"'{BenchText.Shown(part.Trim())}' is a band: write its middle, {((double.Parse(band.Groups[1].Value, CultureInfo.InvariantCulture) + double.Parse(band.Groups[2].Value, CultureInfo.InvariantCulture)) / 2).ToString("0.#", CultureInfo.InvariantCulture)}, as a line"
                        : Sentence(problem, part).TrimEnd('.');
                    Error(BenchField.Absorption, part, "lines in nm, 380–780, or none", $"{why}; allowed: lines (or a band's middle) in nm, 380 to 780, or none.");
                    return null;
                }
                if (Checked(BenchField.Absorption, part, () => { QuantityOutOfRangeException.ThrowIfOutside("absorption line", nm, 380, 780, "nm"); return nm; }) is not { } checkedNm)
                    return null;
                lines.Add(checkedNm);
            }
            return lines;
        }

        private MagnificationObservation? Magnification(StoneCut? cut)
        {
            var present = Features(BenchField.FeaturesPresent);
            var absent = Features(BenchField.FeaturesAbsent);
            List<MagnificationFeature> implied = [];
            if (cut == StoneCut.Faceted)
            {
                // A faceted stone is a stone on which no star or cat's-eye can be seen: as if looked for and not seen. The
                // check reads the words that parsed even beside a bad one, so that both errors are found in one pass.
                if ((present ?? ParsedFeatures(BenchField.FeaturesPresent)).Intersect(MagnificationVocabulary.DomedPhenomena).ToList() is { Count: > 0 } seen)
                {
                    string words = string.Join(", ", seen.Select(f => MagnificationVocabulary.Of(f).Word));
                    Error(BenchField.Cut, "faceted", "cabochon or other with a star or cat's-eye seen",
                        $"'faceted' cannot show the {words} given in {BenchField.FeaturesPresent}: a star or cat's-eye glides over a domed top and never shows on facets; check which was meant.");
                }
                else if (!HasError(BenchField.FeaturesPresent) && !HasError(BenchField.FeaturesAbsent))
                {
                    implied = [.. MagnificationVocabulary.DomedPhenomena.Where(f => !(absent ?? []).Contains(f))];
                    absent = [.. absent ?? [], .. implied];
                }
            }
            if (present is null && absent is null) return null;
            bool faceted = cut == StoneCut.Faceted && !HasError(BenchField.Cut);
            var both = (present ?? []).Intersect(absent ?? []).ToList();
            if (both.Count > 0)
            {
                string words = string.Join(", ", both.Select(f => MagnificationVocabulary.Of(f).Word));
                Error(BenchField.FeaturesAbsent, words, "a feature as seen or as not seen, not both",
                    $"lists {words}, also given in {BenchField.FeaturesPresent}: a feature is either seen or looked for and not seen.");
                return null;
            }
            if (HasError(BenchField.FeaturesPresent) || HasError(BenchField.FeaturesAbsent)) return null;
            return new MagnificationObservation(present ?? [], absent ?? []) { Faceted = faceted, ImpliedByCut = implied.ToHashSet() };
        }

        /// <summary>The feature words of a field that name a feature, whatever the others are.</summary>
        private List<MagnificationFeature> ParsedFeatures(string field) =>
            [.. BenchSyntax.Features(r.Text(field) ?? "").Select(MagnificationVocabulary.Find).OfType<MagnificationFeature>()];

        private List<MagnificationFeature>? Features(string field)
        {
            if (r.Text(field) is not { } text) return null;
            string allowed = AllowedFeatures();
            if (text.Trim().Length == 0) { Empty(field, "feature words, e.g. curved_striae round_bubbles"); return null; }
            var features = new List<MagnificationFeature>();
            foreach (string word in BenchSyntax.Features(text))
            {
                if (MagnificationVocabulary.Find(word) is { } feature) { if (!features.Contains(feature)) features.Add(feature); }
                else
                {
                    IReadOnlyList<string> meant = Spelling.Near(word, MagnificationVocabulary.Words);
                    string guess = meant.Count > 0 ? $" did you mean {string.Join(" or ", meant)}?" : "";
                    Error(field, word, allowed, $"'{BenchText.Shown(word)}' is not a magnification feature;{guess} allowed: {allowed}.");
                }
            }
            return features;
        }

        /// <summary>The vocabulary's words, every one of them (the error is where the command line lists them).</summary>
        private static string AllowedFeatures() => string.Join(", ", MagnificationVocabulary.Words);

        private string? Colour()
        {
            if (r.Text(BenchField.Colour) is not { } text) return null;
            if (text.Trim().Length == 0) { Empty(BenchField.Colour, "a plain colour word"); return null; }
            // A colour is a word or two; an unknown word is the engine's to warn about, but no colour is this long or holds control characters.
            if (text.Length > BenchDefaults.LongestColour || text.Any(char.IsControl))
            {
                Error(BenchField.Colour, text, $"a plain colour word or two, up to {BenchDefaults.LongestColour} printable characters",
                    "is not a colour: too long or with control characters.");
                return null;
            }
            return text.Trim();
        }

        private bool? YesNo(string field)
        {
            if (r.Text(field) is not { } text) return null;
            switch (text.Trim().ToLowerInvariant())
            {
                case "yes" or "true": return true;
                case "no" or "false": return false;
                default:
                    Error(field, text, "yes | no", $"'{BenchText.Shown(text)}' is not yes or no.");
                    return null;
            }
        }

        private T? Word<T>(string field) where T : struct, Enum
        {
            if (r.Text(field) is not { } text) return null;
            if (text.Trim().Length == 0) { Empty(field, BenchWords.Choices<T>()); return null; }
            if (BenchWords.Parse<T>(text) is { } value) return value;
            Error(field, text, BenchWords.Choices<T>(), $"'{BenchText.Shown(text.Trim())}' is not one of {BenchWords.Choices<T>()}.");
            return null;
        }

        private double? Number(string field)
        {
            if (r.Text(field) is not { } text) return null;
            return Parse(field, "", BenchSyntax.NumberText(field, text));
        }

        private double? Parse(string field, string part, string text, double? liquidLimit = null)
        {
            if (BenchNumber.TryParse(text, out double value, out string problem)) return value;
            string prefix = part.Length > 0 ? part + ": " : "";
            string? range = AllowedRange(field, part, liquidLimit);
            Error(field, text, range is null ? "a number" : $"a number, {range}", prefix + Sentence(problem, text) + (range is null ? "" : $"; allowed: {range}."));
            return null;
        }

        /// <summary>
        /// The range a numeric field allows, for the message on text that is not a number: asked of the very check the
        /// field's value meets (with a value no field allows), so the range is stated in one place only.
        /// </summary>
        private static string? AllowedRange(string field, string part, double? liquidLimit = null)
        {
            const double Far = 1e300;
            // A step's edge is read on the same scale as a spot reading: the same range, to the liquid in use.
            if (part is "low" or "high" && liquidLimit is { } liquid)
                try { _ = new RefractometerObservation(RefractometerMethod.Spot, spot: Far, liquidLimit: liquid); }
                catch (QuantityOutOfRangeException e) { return e.Allowed; }
            Action? check = (field, part) switch
            {
                (BenchField.Sg, _) => () => _ = new SpecificGravity(Far, BenchDefaults.DirectSpecificGravityUncertainty),
                (BenchField.AirCt or BenchField.WaterCt, _) => () => _ = BenchDefaults.Weighed(Far),
                (BenchField.WaterC, _) => () => _ = WaterDensity.At(Temperature.FromCelsius(WaterDensity.MaximumCelsius + 1)),
                (BenchField.LiquidLimit, _) => () => _ = new RefractometerObservation(RefractometerMethod.Spot, spot: 1.5, liquidLimit: Far),
                (BenchField.LightNm, _) => () => _ = new RefractometerObservation(RefractometerMethod.Spot, spot: 1.5, lightNanometres: Far),
                (BenchField.Spot, _) => () => _ = new RefractometerObservation(RefractometerMethod.Spot, spot: Far),
                (BenchField.IndexAtB or BenchField.IndexAtG, _) => () => _ = DispersionObservation.FromIndices(Far, Far),
                (BenchField.Reflectance, _) => () => _ = new ReflectanceReading(Far),
                (_, "rotation") => () => _ = new ShadowEdgeStep(Far, 1.5, null),
                (_, "low") => () => _ = new ShadowEdgeStep(0, Far, null),
                (_, "high") => () => _ = new ShadowEdgeStep(0, 1.5, Far),
                _ => null,
            };
            try { check?.Invoke(); }
            catch (QuantityOutOfRangeException e) { return e.Allowed; }
            return null;
        }

        /// <summary>A number parser's sentence with the echoed text shortened.</summary>
        private static string Sentence(string problem, string text)
        {
            string trimmed = text.Trim();
            return trimmed.Length > 0 ? problem.Replace(trimmed, BenchText.Shown(trimmed), StringComparison.Ordinal) : problem;
        }

        private T? Checked<T>(string field, string text, Func<T> make) where T : struct
        {
            try { return make(); }
            catch (QuantityOutOfRangeException e) { Error(field, text, e.Allowed, e.Message); return null; }
        }

        private void Empty(string field, string allowed) => Error(field, "", allowed, $"is empty: give {allowed}, or leave the field out.");

        private bool HasError(string field) => _errors.Any(e => e.Field == field);

        private void Error(string field, string? value, string allowed, string sentence) =>
            _errors.Add(new BenchFieldError(field, BenchText.Shown(value), allowed, sentence));
    }
}
