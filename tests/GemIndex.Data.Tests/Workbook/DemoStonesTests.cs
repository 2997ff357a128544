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
