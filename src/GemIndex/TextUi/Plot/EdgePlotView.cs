using GemIndex.Cli.TextUi.Main;
using System.Drawing;
using System.Globalization;
using System.Text;
using Terminal.Gui.App;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace GemIndex.Cli.TextUi.Plot;

/// <summary>The two shadow edges against rotation: 'l' marks the low edge, 'h' the high edge, 'x' a step where they meet.</summary>
internal sealed class EdgePlotView : FullScreenDialog
{
    public EdgePlotView(EdgePlotModel model)
    {
        Title = "Shadow edges against rotation (Esc closes)";
        if (model.IsEmpty)
        {
            Add(new PlainLabel { Text = "No rotation steps yet: enter them on the RI page (F3)." });
            return;
        }
        Graph = new GraphView { Width = Dim.Fill(), Height = Dim.Fill(1), MarginLeft = 7, MarginBottom = 2 };
        Graph.ViewportChanged += (_, _) => Scale(model);
        Graph.AxisX.Increment = 30;
        Graph.AxisX.ShowLabelsEvery = 1;
        Graph.AxisX.Minimum = (float)model.LeftEdge;
        Graph.AxisX.Text = "rotation °";
        Graph.AxisY.Minimum = (float)model.Bottom;
        Graph.AxisY.ShowLabelsEvery = 2;
        Graph.AxisY.LabelGetter = v => v.Value.ToString("0.000", CultureInfo.InvariantCulture);
        Graph.ScrollOffset = new PointF((float)model.LeftEdge, (float)model.Bottom);
        Line(model.Low, 'l');
        // The high edge's line stops at a step that did not read it; there a '^' on the liquid's dashed limit says it
        // rose above the liquid (it is not drawn flat across, as if read).
        foreach (var run in model.HighRuns) Line(run, 'h');
        if (model.LiquidLimit is { } limit)
        {
            Graph.Annotations.Add(new PathAnnotation
            {
                Points = [new PointF((float)model.LeftEdge, (float)limit), new PointF((float)model.RightEdge, (float)limit)], LineRune = new Rune('-'), BeforeSeries = true,
            });
            Graph.Series.Add(new ScatterSeries { Points = [.. model.HighUnseen.Select(r => new PointF((float)r, (float)limit))], Fill = new GraphCellToRender(new Rune('^')) });
        }
        // Where the edges meet, one mark for both (the high edge's 'h' hid the low edge's 'l').
        if (model.Meeting.Count > 0)
            Graph.Series.Add(new ScatterSeries { Points = [.. model.Meeting.Select(x => new PointF((float)x.Rotation, (float)x.Index))], Fill = new GraphCellToRender(new Rune('x')) });
        Add(Graph, new PlainLabel
        {
            Y = Pos.AnchorEnd(1),
            Text = model.LiquidLimit is { } at
                ? $"l low  h high  x both  ^ high above the liquid  - liquid {at.ToString("0.000", CultureInfo.InvariantCulture)}"
                : "l = low edge   h = high edge   x = both   (index against rotation)",
        });
    }

    public GraphView? Graph { get; }

    private void Line(IReadOnlyList<(double Rotation, double Index)> points, char mark)
    {
        if (points.Count == 0) return;
        List<PointF> p = [.. points.Select(x => new PointF((float)x.Rotation, (float)x.Index))];
        if (p.Count > 1) Graph!.Annotations.Add(new PathAnnotation { Points = p, LineRune = new Rune('.'), BeforeSeries = true });
        Graph!.Series.Add(new ScatterSeries { Points = p, Fill = new GraphCellToRender(new Rune(mark)) });
    }

    /// <summary>
    /// Fits the window to the view. Terminal.Gui finds a point's cell by truncating (y − offset) / cell size in floats,
    /// so a reading on a multiple of the step can land one cell low; the view is therefore scrolled half a cell below
    /// the aligned bottom (every reading falls in the middle of its cell), and the axes' minimums keep the ticks and
    /// labels on the cells' middles too. The arithmetic stays in doubles until it reaches the view.
    /// </summary>
    private void Scale(EdgePlotModel model)
    {
        int columns = Math.Max(10, Graph!.Viewport.Width - (int)Graph.MarginLeft - 2);
        int rows = Math.Max(4, Graph.Viewport.Height - (int)Graph.MarginBottom - 1);
        double step = model.IndexStep(rows);
        double bottom = model.AlignedBottom(step);
        double degreesPerColumn = (model.RightEdge - model.LeftEdge) / columns;
        Graph.CellSize = new PointF((float)degreesPerColumn, (float)step);
        Graph.AxisY.Increment = (float)step;
        Graph.AxisY.Minimum = (float)bottom;
        Graph.AxisX.Minimum = (float)model.LeftEdge;
        Graph.ScrollOffset = new PointF((float)(model.LeftEdge - degreesPerColumn / 2), (float)(bottom - step / 2));
    }

    public static void Show(IApplication app, EdgePlotModel model)
    {
        using var view = new EdgePlotView(model);
        app.Run(view);
    }
}
