using GemIndex.Data.Batch;
using GemIndex.Data.Workbook;

namespace GemIndex.Data.Tests.Workbook;

public class DemoStonesTests
{
    [Fact]
    public void Every_demo_stone_reads_and_converts_to_a_bench_sheet()
    {
        IReadOnlyList<StoneSheet> stones = DemoStones.Parse(DemoStones.Source());
        Assert.True(stones.Count >= 5);
        Assert.All(stones, s => Assert.StartsWith("estate lot A /", s.Reference));
        Assert.All(stones, s => StoneReadingsConverter.ToBenchSheet(s.Readings));   // throws on any bad field
    }

    [Fact]
    public void A_sheet_s_transparency_is_weighed_with_the_readings_when_it_is_one_of_the_trade_s_grades()
    {
        // The demo stones, like workbooks saved before transparency was weighed, hold it on the sheet only.
        IReadOnlyList<StoneSheet> stones = DemoStones.Parse(DemoStones.Source());
        Assert.All(stones.Where(s => s.Transparency.Length > 0), s => Assert.Equal(s.Transparency, s.Readings.Transparency));
        var cloudy = new StoneSheet { Reference = "x", Transparency = "cloudy", Readings = new StoneReadings { Id = "x" } };
        Assert.Null(cloudy.WithTransparencyInReadings().Readings.Transparency);   // not a grade: stays a description
        var typed = cloudy with { Readings = new StoneReadings { Id = "x", Transparency = "opaque" } };
        Assert.Equal("opaque", typed.WithTransparencyInReadings().Readings.Transparency);   // the readings' own word is kept
        using var dir = new TempDirectory();
        using var wb = StoneWorkbook.Open(dir.File("old.db"), new SteppingClock(), WorkbookOpening.CreateIfMissing);
        StoneSheet saved = wb.Create(new StoneSheet { Reference = "y", Transparency = "semi-translucent", Readings = new StoneReadings { Id = "y", Sg = 2.65 } });
        Assert.Equal("semi-translucent", wb.Get(saved.Id)!.Readings.Transparency);
    }

    [Fact]
    public void The_demo_fills_a_workbook()
    {
        using var dir = new TempDirectory();
        using var wb = StoneWorkbook.Open(dir.File("demo.db"), new SteppingClock(), WorkbookOpening.CreateIfMissing);
        int added = DemoStones.AddTo(wb);
        Assert.Equal(added, wb.List().Count);
        Assert.Single(wb.List("play of colour"));
    }

    [Fact]
    public void A_malformed_demo_line_names_its_line_and_field()
    {
        var e = Assert.Throws<BatchInputException>(() => DemoStones.Parse("{\"reference\": \"x\", \"readings\": {\"id\": \"x\"}}\n{\"reference\": \"y\", \"readings\": {\"id\": \"y\", \"sg\": \"heavy\"}}"));
        Assert.StartsWith("line 2: sg", e.Message);
    }
}
