using System.Drawing;
using System.Globalization;
using System.Text;
using Terminal.Gui.App;
using Terminal.Gui.ViewBase;
using Terminal.Gui.Views;

namespace GemIndex.Cli.TextUi.Plot;

/// <summary>The two shadow edges against rotation: 'l' marks the low edge, 'h' the high edge.</summary>
internal sealed class EdgePlotView : Dialog
{
    public EdgePlotView(EdgePlotModel model)
    {
        Title = "Shadow edges against rotation (Esc closes)";
        Width = Dim.Fill();
        Height = Dim.Fill();
        if (model.IsEmpty)
        {
            Add(new Label { Text = "No rotation steps yet: enter them on the RI page (F3)." });
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
        Line(model.High, 'h');
        Add(Graph, new Label { Y = Pos.AnchorEnd(1), Text = "l = low edge   h = high edge   (index against rotation)" });
    }

    public GraphView? Graph { get; }

    private void Line(IReadOnlyList<(double Rotation, double Index)> points, char mark)
    {
        if (points.Count == 0) return;
        List<PointF> p = [.. points.Select(x => new PointF((float)x.Rotation, (float)x.Index))];
        if (p.Count > 1) Graph!.Annotations.Add(new PathAnnotation { Points = p, LineRune = new Rune('.'), BeforeSeries = true });
        Graph!.Series.Add(new ScatterSeries { Points = p, Fill = new GraphCellToRender(new Rune(mark)) });
    }

    private void Scale(EdgePlotModel model)
    {
        int columns = Math.Max(10, Graph!.Viewport.Width - (int)Graph.MarginLeft - 2);
        int rows = Math.Max(4, Graph.Viewport.Height - (int)Graph.MarginBottom - 1);
        float step = (float)model.IndexStep(rows);
        Graph.CellSize = new PointF((float)(model.RightEdge - model.LeftEdge) / columns, step);
        Graph.AxisY.Increment = step;
        float bottom = (float)model.AlignedBottom(step);
        Graph.AxisY.Minimum = bottom;
        Graph.ScrollOffset = new PointF((float)model.LeftEdge, bottom);
    }

    public static void Show(IApplication app, EdgePlotModel model)
    {
        using var view = new EdgePlotView(model);
        app.Run(view);
    }
}
