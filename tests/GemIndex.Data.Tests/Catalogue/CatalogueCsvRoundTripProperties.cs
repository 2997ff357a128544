using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using GemIndex.Data.Catalogue;
using nietras.SeparatedValues;

namespace GemIndex.Data.Tests.Catalogue;

public class CatalogueCsvRoundTripProperties
{
    private static readonly FamilyCatalogue Shipped = FamilyFileReader.ReadCatalogue(Fixtures.FamilySources);

    // Text with the characters CSV must quote: commas, quotes, CR/LF line breaks, semicolons-free (';' separates lists).
    private static readonly Gen<string> Awkward =
        Gen.Choose(1, 12).SelectMany(length => Gen.ArrayOf(Gen.Elements('a', 'Z', ' ', ',', '"', '\n', '\r', 'é', 'ω', '1'), length))
            .Select(cs => "n" + new string(cs) + "x"); // a letter at each end: cells are trimmed of outer spaces

    [Property(MaxTest = 50)]
    public Property Rows_written_with_quoted_commas_and_line_breaks_read_back_unchanged() =>
        Prop.ForAll(Gen.Choose(1, 5).SelectMany(count => Gen.ArrayOf(Gen.Zip(Awkward, Awkward), count)).ToArbitrary(), ((string Name, string Notes)[] pairs) =>
        {
            var text = new StringWriter();
            using (SepWriter writer = Sep.New(',').Writer(o => o with { Escape = true }).To(text))
            {
                int i = 0;
                foreach ((string name, string notes) in pairs)
                {
                    using SepWriter.Row row = writer.NewRow();
                    row["name"].Set($"{i++} {name}");
                    row["variety"].Set("glass");
                    row["origin"].Set("imitation");
                    row["inherits"].Set("spinel");
                    row["share"].Set("rare");
                    row["notes"].Set(notes);
                }
            }
            var (rows, errors) = CatalogueCsvReader.Read(new StringReader(text.ToString()), Shipped);
            string[] expectedNames = [.. pairs.Select((p, i) => $"{i} {p.Name}")];
            return (errors.Count == 0
                    && rows.Select(r => r.Material.Name).SequenceEqual(expectedNames)
                    && rows.Select(r => r.Material.Notes).SequenceEqual(pairs.Select(p => p.Notes)))
                .Label($"errors: {string.Join("; ", errors)}");
        });
}
