using System.Text;
using System.Text.Json;
using GemIndex.Core.Bench;

namespace GemIndex.Data.Batch;

/// <summary>
/// Reads and writes one line of the batch format (JSON, one stone per line). Reading turns every value into the text
/// Core's <see cref="BenchReader"/> reads (a JSON number as written, a list of steps into steps, heavy liquids and
/// absorption lines into <see cref="BenchSyntax"/>), so a value of the wrong kind is reported by the reader with
/// every other bad field. A field the format does not know is not read and is named in <see cref="BatchLine.Unread"/>
/// (with the known field it was likely meant for), so a misspelt reading is never lost in silence. Errors name the
/// field by its path.
/// </summary>
public static class StoneReadingsJson
{
    /// <summary>The batch line's magnification object, {"present": [...], "absent": [...]}.</summary>
    private const string Magnification = "magnification";

    private static readonly JsonDocumentOptions Options = new() { AllowTrailingCommas = false, CommentHandling = JsonCommentHandling.Disallow, MaxDepth = 16 };

    /// <summary>Reads one line into readings and the errors of its form; never throws for bad input.</summary>
    public static BatchLine Read(string line)
    {
        var errors = new List<BenchFieldError>();
        JsonDocument doc;
        try { doc = JsonDocument.Parse(line, Options); }
        catch (JsonException e)
        {
            string problem = e.Message.Split(" Path: ")[0].Split(" LineNumber: ")[0].TrimEnd('.', ' ', '|');
            return new BatchLine(new BenchReadings(), [new BenchFieldError("$", "", "one JSON object", $"not valid JSON: {problem}.")]);
        }
        using (doc)
        {
            var root = doc.RootElement;
            if (root.ValueKind != JsonValueKind.Object)
                return new BatchLine(new BenchReadings(), [new BenchFieldError("$", "", "one JSON object", "each line must be one JSON object.")]);
            var reader = new LineReader(errors);
            BenchReadings readings = reader.Stone(root);
            return new BatchLine(readings, errors) { Unread = reader.Unread };
        }
    }

    /// <summary>Parses one line into typed readings (the workbook's stored form).</summary>
    /// <exception cref="BatchInputException">The line is not valid JSON, or a field has the wrong form (every such field named).</exception>
    public static StoneReadings Parse(string line)
    {
        BatchLine read = Read(line);
        if (read.Errors.Count > 0) throw new BatchInputException(read.Errors);
        return StoneReadingsConverter.FromReadings(read.Readings, lenient: false);
    }

    /// <summary>The names each object of the format holds, keyed by the object's path ("" for the line itself).</summary>
    private static readonly Dictionary<string, string[]> Names = new()
    {
        [""] = [.. BenchField.All.Select(f => f.Split('.')[0]).Append(BenchField.Refractometer).Append(Magnification).Distinct()],
        [BenchField.Refractometer] = Inside(BenchField.Refractometer, BenchField.Readings),
        [BenchField.Sg] = Inside(BenchField.Sg),
        [BenchField.Dispersion] = Inside(BenchField.Dispersion),
        [Magnification] = Inside(Magnification),
        [BenchField.Readings] = ["rotation_deg", "low", "high"],
        [BenchField.HeavyLiquids] = ["density", "result"],
    };

    private static string[] Inside(string parent, params string[] more) =>
        [.. BenchField.All.Concat(more).Where(f => f.StartsWith(parent + ".", StringComparison.Ordinal)).Select(f => f[(parent.Length + 1)..])];

    private sealed class LineReader(List<BenchFieldError> errors)
    {
        public List<UnreadField> Unread { get; } = [];

        /// <summary>Notes every field of an object the format does not know; <paramref name="kind"/> keys <see cref="Names"/>.</summary>
        private void NoteUnknown(JsonElement obj, string path, string kind)
        {
            string[] known = Names[kind];
            // A name given twice: JSON keeps the last silently ("sg": 2.65, "sg": 3.52 read as a diamond), so it is refused.
            foreach (var twice in obj.EnumerateObject().GroupBy(p => p.Name, StringComparer.Ordinal).Where(g => g.Count() > 1))
            {
                string name = SafeName(twice.First());
                errors.Add(new BenchFieldError(path.Length == 0 ? name : $"{path}.{name}", string.Join(", ", twice.Select(p => BenchText.Shown(p.Value.GetRawText()))),
                    "one value", $"is given {twice.Count()} times; give it once."));
            }
            foreach (var property in obj.EnumerateObject())
            {
                if (known.Contains(property.Name, StringComparer.Ordinal)) continue;
                string name = SafeName(property);
                Unread.Add(new UnreadField(path.Length == 0 ? name : $"{path}.{name}", Spelling.Near(name, known), known));
            }
        }

        private static string SafeName(JsonProperty property)
        {
            try { return BenchText.Shown(property.Name); }
            catch (InvalidOperationException) { return "(a name that is not valid text)"; }
        }

        public BenchReadings Stone(JsonElement root)
        {
            NoteUnknown(root, "", "");
            var r = new BenchReadings();
            if (!root.TryGetProperty(BenchField.Id, out var id) || id.ValueKind == JsonValueKind.Null)
                errors.Add(new BenchFieldError(BenchField.Id, "", "a string", "is required."));
            else if (id.ValueKind is JsonValueKind.String or JsonValueKind.Number) r = r.With(BenchField.Id, Text(id, BenchField.Id));
            else errors.Add(new BenchFieldError(BenchField.Id, BenchText.Shown(id.GetRawText()), "a string", "must be a string."));
            if (Child(root, "refractometer") is { } rf)
            {
                if (rf.ValueKind != JsonValueKind.Object) errors.Add(new BenchFieldError("refractometer", BenchText.Shown(rf.GetRawText()), "an object", "must be an object."));
                else r = Refractometer(rf, r);
            }
            if (Child(root, BenchField.Sg) is { } sg)
            {
                if (sg.ValueKind == JsonValueKind.Object)
                {
                    NoteUnknown(sg, BenchField.Sg, BenchField.Sg);
                    r = r.With(BenchField.AirCt, Num(sg, "air_ct", BenchField.AirCt)).With(BenchField.WaterCt, Num(sg, "water_ct", BenchField.WaterCt))
                        .With(BenchField.WaterC, Num(sg, "water_c", BenchField.WaterC));
                }
                else if (sg.ValueKind == JsonValueKind.Number) r = r.With(BenchField.Sg, sg.GetRawText());
                else errors.Add(new BenchFieldError(BenchField.Sg, BenchText.Shown(sg.GetRawText()), "a number or {\"air_ct\", \"water_ct\", \"water_c\"}",
                    $"must be a number or {{\"air_ct\", \"water_ct\", \"water_c\"}}, not {Kind(sg)}."));
            }
            if (Child(root, BenchField.HeavyLiquids) is { } liquids && List(liquids, BenchField.HeavyLiquids) is { } entries)
            {
                var texts = new List<string>();
                for (int i = 0; i < entries.Count; i++)
                {
                    string path = $"{BenchField.HeavyLiquids}[{i}]";
                    if (entries[i].ValueKind != JsonValueKind.Object)
                        errors.Add(new BenchFieldError(path, BenchText.Shown(entries[i].GetRawText()), "{\"density\", \"result\"}", "must be an object {\"density\", \"result\"}."));
                    else
                    {
                        NoteUnknown(entries[i], path, BenchField.HeavyLiquids);
                        texts.Add($"{Num(entries[i], "density", path + ".density") ?? ""} {Value(entries[i], "result", path + ".result") ?? ""}".Trim());
                    }
                }
                r = r.With(BenchField.HeavyLiquids, BenchSyntax.HeavyLiquids(texts));
            }
            foreach (string word in new[] { BenchField.Polariscope, BenchField.Pleochroism, BenchField.ThermalProbe, BenchField.Electrical, BenchField.UvLong, BenchField.UvShort, BenchField.Colour, BenchField.Cut, BenchField.Transparency })
                r = r.With(word, Value(root, word, word));
            r = r.With(BenchField.Reflectance, Num(root, BenchField.Reflectance, BenchField.Reflectance));
            if (Child(root, BenchField.Dispersion) is { } dispersion)
            {
                if (dispersion.ValueKind == JsonValueKind.Object)
                {
                    NoteUnknown(dispersion, BenchField.Dispersion, BenchField.Dispersion);
                    r = r.With(BenchField.IndexAtB, Num(dispersion, "nB", BenchField.IndexAtB)).With(BenchField.IndexAtG, Num(dispersion, "nG", BenchField.IndexAtG));
                }
                else r = r.With(BenchField.Dispersion, Word(dispersion, BenchField.Dispersion));
            }
            if (Child(root, BenchField.Absorption) is { } lines && List(lines, BenchField.Absorption) is { } nm)
                r = r.With(BenchField.Absorption, BenchSyntax.Lines(nm.Select((x, i) => Number(x, $"{BenchField.Absorption}[{i}]") ?? "").Where(x => x.Length > 0)));
            if (Child(root, Magnification) is { } magnification)
            {
                if (magnification.ValueKind != JsonValueKind.Object)
                    errors.Add(new BenchFieldError(Magnification, BenchText.Shown(magnification.GetRawText()), "{\"present\": [...], \"absent\": [...]}",
                        $"must be an object {{\"present\": [...], \"absent\": [...]}}, not {Kind(magnification)}."));
                else
                {
                    NoteUnknown(magnification, Magnification, Magnification);
                    r = r.With(BenchField.FeaturesPresent, Features(magnification, "present", BenchField.FeaturesPresent))
                        .With(BenchField.FeaturesAbsent, Features(magnification, "absent", BenchField.FeaturesAbsent));
                }
            }
            return r;
        }

        /// <summary>A list of feature words as one field's text (a word written with spaces joined by underscores); an empty list is not given.</summary>
        private string? Features(JsonElement parent, string name, string path)
        {
            if (Child(parent, name) is not { } e || List(e, path) is not { } items) return null;
            var words = new List<string>();
            for (int i = 0; i < items.Count; i++)
                if (Word(items[i], $"{path}[{i}]") is { } word && word.Trim().Length > 0)
                    words.Add(string.Join('_', word.Split(' ', StringSplitOptions.RemoveEmptyEntries)));
            return words.Count > 0 ? BenchSyntax.Features(words) : null;
        }

        private BenchReadings Refractometer(JsonElement rf, BenchReadings r)
        {
            NoteUnknown(rf, BenchField.Refractometer, BenchField.Refractometer);
            r = r.With(BenchField.Method, Value(rf, "method", BenchField.Method)).With(BenchField.LightNm, Num(rf, "light_nm", BenchField.LightNm))
                .With(BenchField.LiquidLimit, Num(rf, "liquid_limit", BenchField.LiquidLimit)).With(BenchField.Spot, Num(rf, "spot", BenchField.Spot))
                .With(BenchField.Precision, Num(rf, "precision", BenchField.Precision))
                .With(BenchField.CalibrationOffset, Num(rf, "calibration_offset", BenchField.CalibrationOffset));
            if (Child(rf, "over_limit") is { } over)
                r = r.With(BenchField.OverLimit, over.ValueKind switch { JsonValueKind.True => "yes", JsonValueKind.False => "no", _ => Bad(over, BenchField.OverLimit, "true or false") });
            if (Child(rf, "readings") is { } list && List(list, BenchField.Readings) is { } steps)
            {
                if (steps.Count > BenchDefaults.MostSteps)
                {
                    // Reported by the reader from the count alone; the steps themselves are not read.
                    return r with { Steps = [.. Enumerable.Repeat(new EdgeStepText("", "", ""), steps.Count)] };
                }
                for (int i = 0; i < steps.Count; i++)
                {
                    string path = BenchField.Step(i);
                    if (steps[i].ValueKind != JsonValueKind.Object)
                    {
                        errors.Add(new BenchFieldError(path, BenchText.Shown(steps[i].GetRawText()), "{\"rotation_deg\", \"low\", \"high\"}", "must be an object {\"rotation_deg\", \"low\", \"high\"}."));
                        continue;
                    }
                    NoteUnknown(steps[i], path, BenchField.Readings);
                    r = r.WithStep(new EdgeStepText(Num(steps[i], "rotation_deg", path + ".rotation_deg") ?? "",
                        Num(steps[i], "low", path + ".low") ?? "", Num(steps[i], "high", path + ".high") ?? ""));
                }
            }
            return r;
        }

        private static JsonElement? Child(JsonElement parent, string name) =>
            parent.TryGetProperty(name, out var e) && e.ValueKind != JsonValueKind.Null ? e : null;

        /// <summary>A word field: a JSON string, or an error naming the field.</summary>
        private string? Value(JsonElement parent, string name, string path) => Child(parent, name) is { } e ? Word(e, path) : null;

        /// <summary>A number field: a JSON number as written, or an error naming the field.</summary>
        private string? Num(JsonElement parent, string name, string path) => Child(parent, name) is { } e ? Number(e, path) : null;

        private string? Number(JsonElement e, string path)
        {
            if (e.ValueKind == JsonValueKind.Number) return e.GetRawText();
            errors.Add(new BenchFieldError(path, BenchText.Shown(e.GetRawText()), "a number", $"must be a number, not {Kind(e)}."));
            return null;
        }

        private string? Bad(JsonElement e, string path, string allowed)
        {
            errors.Add(new BenchFieldError(path, BenchText.Shown(e.GetRawText()), allowed, $"must be {allowed}, not {Kind(e)}."));
            return null;
        }

        private string? Word(JsonElement e, string path)
        {
            if (e.ValueKind == JsonValueKind.String) return Text(e, path);
            errors.Add(new BenchFieldError(path, BenchText.Shown(e.GetRawText()), "a string", $"must be a string, not {Kind(e)}."));
            return null;
        }

        private string Kind(JsonElement e) => e.ValueKind switch
        {
            JsonValueKind.String => $"the text \"{BenchText.Shown(SafeString(e))}\"",
            JsonValueKind.Object => "an object",
            JsonValueKind.Array => "a list",
            _ => BenchText.Shown(e.GetRawText()),
        };

        private static string SafeString(JsonElement e)
        {
            try { return e.GetString()!; }
            catch (InvalidOperationException) { return e.GetRawText(); }
        }

        private List<JsonElement>? List(JsonElement e, string path)
        {
            if (e.ValueKind == JsonValueKind.Array) return [.. e.EnumerateArray()];
            // The list's own shape, so that a line written as the command line takes it ("3.32 floats") is told what to write.
            string shape = path switch
            {
                BenchField.HeavyLiquids => "a list of {\"density\": 3.32, \"result\": \"floats\"} objects (result floats, sinks or suspends)",
                BenchField.Absorption => "a list of wavelengths in nm, e.g. [592, 505]",
                BenchField.Readings => "a list of {\"rotation_deg\": 0, \"low\": 1.544, \"high\": 1.553} objects",
                _ => "a list",
            };
            errors.Add(new BenchFieldError(path, BenchText.Shown(e.GetRawText()), shape, $"must be {shape}."));
            return null;
        }

        /// <summary>A value as text: a string as it is, a number as written, anything else as its JSON (which the reader refuses).</summary>
        private string Text(JsonElement e, string path)
        {
            if (e.ValueKind != JsonValueKind.String) return e.GetRawText();
            try { return e.GetString()!; }
            catch (InvalidOperationException)
            {
                errors.Add(new BenchFieldError(path, BenchText.Shown(e.GetRawText()), "text", "is not valid text (a lone UTF-16 surrogate escape)."));
                return "";
            }
        }
    }

    /// <summary>Writes readings as one line of the batch format (no line break).</summary>
    public static string Write(StoneReadings r)
    {
        using var stream = new MemoryStream();
        using (var w = new Utf8JsonWriter(stream))
        {
            w.WriteStartObject();
            w.WriteString(BenchField.Id, r.Id);
            if (r.Refractometer is { } rf)
            {
                w.WriteStartObject("refractometer");
                w.WriteString("method", rf.Method);
                if (rf.LightNm is { } l) w.WriteNumber("light_nm", l);
                if (rf.LiquidLimit is { } ll) w.WriteNumber("liquid_limit", ll);
                if (rf.Readings.Count > 0)
                {
                    w.WriteStartArray("readings");
                    foreach (var s in rf.Readings)
                    {
                        w.WriteStartObject();
                        w.WriteNumber("rotation_deg", s.RotationDeg);
                        w.WriteNumber("low", s.Low);
                        if (s.High is { } h) w.WriteNumber("high", h);
                        w.WriteEndObject();
                    }
                    w.WriteEndArray();
                }
                if (rf.Spot is { } spot) w.WriteNumber("spot", spot);
                if (rf.OverLimit) w.WriteBoolean("over_limit", true);
                if (rf.Precision is { } p) w.WriteNumber("precision", p);
                if (rf.CalibrationOffset is { } c) w.WriteNumber("calibration_offset", c);
                w.WriteEndObject();
            }
            if (r.Sg is { } sg) w.WriteNumber(BenchField.Sg, sg);
            else if (r.SgWeighing is { } wg)
            {
                w.WriteStartObject(BenchField.Sg);
                if (wg.AirCt is { } a) w.WriteNumber("air_ct", a);
                if (wg.WaterCt is { } wc) w.WriteNumber("water_ct", wc);
                if (wg.WaterC is { } t) w.WriteNumber("water_c", t);
                w.WriteEndObject();
            }
            if (r.HeavyLiquids.Count > 0)
            {
                w.WriteStartArray(BenchField.HeavyLiquids);
                foreach (var h in r.HeavyLiquids) { w.WriteStartObject(); w.WriteNumber("density", h.Density); w.WriteString("result", h.Result); w.WriteEndObject(); }
                w.WriteEndArray();
            }
            WriteWord(w, BenchField.Polariscope, r.Polariscope);
            WriteWord(w, BenchField.Pleochroism, r.Pleochroism);
            if (r.DispersionIndices is { } d) { w.WriteStartObject(BenchField.Dispersion); w.WriteNumber("nB", d.NB); w.WriteNumber("nG", d.NG); w.WriteEndObject(); }
            else WriteWord(w, BenchField.Dispersion, r.Dispersion);
            WriteWord(w, BenchField.ThermalProbe, r.ThermalProbe);
            WriteWord(w, BenchField.Electrical, r.Electrical);
            if (r.ReflectancePct is { } reflectance) w.WriteNumber(BenchField.Reflectance, reflectance);
            WriteWord(w, BenchField.UvLong, r.UvLong);
            WriteWord(w, BenchField.UvShort, r.UvShort);
            if (r.AbsorptionNm is { } lines)
            {
                w.WriteStartArray(BenchField.Absorption);
                foreach (double l in lines) w.WriteNumberValue(l);
                w.WriteEndArray();
            }
            WriteWord(w, BenchField.Colour, r.Colour);
            WriteWord(w, BenchField.Cut, r.Cut);
            WriteWord(w, BenchField.Transparency, r.Transparency);
            if (r.FeaturesPresent.Count > 0 || r.FeaturesAbsent.Count > 0)
            {
                w.WriteStartObject(Magnification);
                WriteWords(w, "present", r.FeaturesPresent);
                WriteWords(w, "absent", r.FeaturesAbsent);
                w.WriteEndObject();
            }
            w.WriteEndObject();
        }
        return Encoding.UTF8.GetString(stream.ToArray());
    }

    private static void WriteWords(Utf8JsonWriter w, string name, IReadOnlyList<string> words)
    {
        if (words.Count == 0) return;
        w.WriteStartArray(name);
        foreach (string word in words) w.WriteStringValue(word);
        w.WriteEndArray();
    }

    private static void WriteWord(Utf8JsonWriter w, string name, string? value)
    {
        if (value is not null) w.WriteString(name, value);
    }
}
