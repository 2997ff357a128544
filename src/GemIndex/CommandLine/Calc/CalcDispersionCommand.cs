using System.CommandLine;
using GemIndex.Core.Optics;
using GemIndex.Core.Optics.Dispersion;
using GemIndex.Core.Quantities;
using static GemIndex.Cli.CommandLine.Calc.CalcFailure;
using static GemIndex.Cli.CommandLine.Calc.CalcText;

namespace GemIndex.Cli.CommandLine.Calc;

/// <summary>
/// <c>calc dispersion</c>: fit a Cauchy or Sellmeier model to indices at several wavelengths (coefficients,
/// residuals, nD, Abbe number, nG − nB); or convert a reading at another wavelength to 589.3 nm from nG − nB.
/// </summary>
internal static class CalcDispersionCommand
{
    internal sealed record CoefficientJson(string Name, double Value, string Unit);

    internal sealed record PointJson(double WavelengthNanometres, double Index, double Residual);

    internal sealed record DispersionResult(string Model, CoefficientJson[] Coefficients, PointJson[] Points,
        double RootMeanSquareResidual, double IndexAtSodiumD, double AbbeNumber, double GMinusB)
    {
        /// <summary>As many points as coefficients: the curve passes through each, and no residual checks the readings.</summary>
        public bool ThroughEveryPoint => Points.Length == Coefficients.Length;
    }

    internal sealed record ConversionResult(double Reading, double ReadAtNanometres, double GMinusB, double ConvertedIndex, double ConvertedToNanometres);

    public static Command Create()
    {
        var points = CalcOptions.Tuples("--point", "An index measured at a wavelength, NM:INDEX (repeat; enough points for the model)", ':', 2);
        var model = new Option<string>("--model") { Description = "Model to fit: cauchy or sellmeier", DefaultValueFactory = _ => "cauchy" };
        ChoiceOption.Restrict(model, "cauchy", "sellmeier");
        var terms = new Option<int>("--terms") { Description = "Terms: cauchy 2 or 3 (default 2), sellmeier 1–3 (default 1)" };
        terms.Validators.Add(r =>
        {
            if (r.Tokens.Count == 1 && int.TryParse(r.Tokens[0].Value, System.Globalization.NumberStyles.Integer, System.Globalization.CultureInfo.InvariantCulture, out int n) && n is < 1 or > 3)
                r.AddError($"--terms: {n} is not a number of terms; allowed: 1 to 3 (cauchy 2 or 3, sellmeier 1 to 3)");
        });
        var reading = CalcOptions.Number("--reading", "An index read at --wavelength (no unit): converts it to 589.3 nm");
        var wavelength = CalcOptions.Number("--wavelength", "Wavelength of --reading, in nm");
        var gMinusB = CalcOptions.Number("--g-minus-b", "The material's dispersion nG − nB (no unit), for the conversion");
        return CalcBuilder.Command("dispersion", "Fit a dispersion model to indices at several wavelengths, or convert a reading to 589.3 nm", [points, model, terms, reading, wavelength, gMinusB], pr =>
        {
            bool fit = pr.GetValue(points) is { Length: > 0 }, convert = pr.GetValue(reading) is not null;
            if (fit == convert) throw Input("give either --point pairs (to fit a model) or --reading (to convert it to 589.3 nm)");
            if (fit)
            {
                DispersionResult result = Fit(pr.GetValue(points)!, pr.GetValue(model)!, pr.GetResult(terms) is null ? null : pr.GetValue(terms));
                return CalcAnswer.Of(result, Write);
            }
            else
            {
                ConversionResult result = Convert(pr.GetValue(reading)!.Value, Required(pr, wavelength), Required(pr, gMinusB));
                return CalcAnswer.Of(result, (output, _) => output.WriteLine($"{Index(result.Reading)} {NoUnit} at {Nanometres(result.ReadAtNanometres)} → {Index(result.ConvertedIndex)} {NoUnit} " +
                    $"at {Nanometres(result.ConvertedToNanometres)} (Cauchy model of dispersion nG − nB {Index(result.GMinusB)})"));
            }
        });
    }

    private static double Required(ParseResult pr, Option<double?> option) =>
        pr.GetValue(option) ?? throw Input($"{option.Name} is needed with --reading");

    private static DispersionResult Fit(double[][] pairs, string modelName, int? terms)
    {
        DispersionPoint[] points = Named("--point", () => pairs.Select(p => new DispersionPoint(Wavelength.FromNanometres(p[0]), p[1])).ToArray());
        if (modelName == "cauchy")
        {
            DispersionFit<CauchyModel> cauchy = Named("--point, --terms", () => CauchyModel.Fit(points, terms ?? 2));
            CoefficientJson[] coefficients =
            [
                new("A", cauchy.Model.A, NoUnit), new("B", cauchy.Model.BSquareMicrometres, "µm²"),
                .. (terms == 3 ? [new CoefficientJson("C", cauchy.Model.CQuarticMicrometres, "µm⁴")] : Array.Empty<CoefficientJson>()),
            ];
            return Describe($"Cauchy, {terms ?? 2} terms", cauchy.Model, coefficients, points, cauchy.Residuals, cauchy.RootMeanSquareResidual);
        }
        DispersionFit<SellmeierModel> sellmeier = Named("--point, --terms", () => SellmeierModel.Fit(points, terms ?? 1));
        CoefficientJson[] terms2 = [.. sellmeier.Model.Terms.SelectMany((t, i) => new CoefficientJson[]
            { new($"B{i + 1}", t.Strength, NoUnit), new($"C{i + 1}", t.ResonanceSquareMicrometres, "µm²") })];
        return Describe($"Sellmeier, {terms ?? 1} term(s)", sellmeier.Model, terms2, points, sellmeier.Residuals, sellmeier.RootMeanSquareResidual);
    }

    private static DispersionResult Describe(string name, IDispersionModel model, CoefficientJson[] coefficients,
        DispersionPoint[] points, IReadOnlyList<double> residuals, double rms)
    {
        double indexD = Named("--point", () => model.IndexAt(ReferenceWavelengths.D));
        double abbe = Named("--point", () => AbbeNumber.Of(model));
        double gb = Named("--point", () => TradeDispersion.Of(model));
        PointJson[] rows = [.. points.Select((p, i) => new PointJson(p.Wavelength.Nanometres, p.Index, residuals[i]))];
        return new DispersionResult(name, coefficients, rows, rms, indexD, abbe, gb);
    }

    /// <summary>
    /// The reading moved to 589.3 nm along a Cauchy curve of the material's nG − nB. The shift depends on the curve's slope
    /// alone, not on its level, so the material's nD is not asked for (it had been required and then not used).
    /// </summary>
    private static ConversionResult Convert(double reading, double nanometres, double gMinusB)
    {
        var n = Named("--reading", () => new RefractiveIndex(reading));
        Wavelength readAt = Named("--wavelength", () => Wavelength.FromNanometres(nanometres));
        CauchyModel model = Named("--g-minus-b", () => CauchyModel.FromIndexAndDispersion(n, gMinusB));
        RefractiveIndex converted = Named("--reading, --wavelength", () => ReadingConversion.ToSodiumD(n, readAt, model));
        return new ConversionResult(n.Value, readAt.Nanometres, gMinusB, converted.Value, ReferenceWavelengths.D.Nanometres);
    }

    private static void Write(TextWriter output, DispersionResult r)
    {
        output.WriteLine($"model: {r.Model}");
        foreach (CoefficientJson c in r.Coefficients)
            output.WriteLine($"  {c.Name} = {Fixed(c.Value, "0.000000")} {c.Unit}");
        foreach (PointJson p in r.Points)
            output.WriteLine($"  {Nanometres(p.WavelengthNanometres)}: index {Index(p.Index)} {NoUnit}, residual {Fixed(p.Residual, "+0.000000;-0.000000;0.000000")} {NoUnit}");
        output.WriteLine(r.ThroughEveryPoint
            ? $"as many points as coefficients: the curve passes through each point, so no residual checks the readings"
            : $"rms residual {Fixed(r.RootMeanSquareResidual, "0.000000")} {NoUnit}");
        output.WriteLine($"nD (589.3 nm) {Index(r.IndexAtSodiumD)} {NoUnit}; Abbe number {Fixed(r.AbbeNumber, "0.0")} {NoUnit}; " +
            $"nG − nB (430.8 − 686.7 nm) {Index(r.GMinusB)} {NoUnit}");
    }
}
