namespace PathFinder.Diagrams;

/// <summary>Draws enthalpy-level diagrams for routes and closure diagrams for cycles as SVG.</summary>
/// <remarks>
/// Levels are horizontal lines at heights proportional to the cumulative value (the starting state at 0), placed in
/// columns from left to right; a vertical arrow joins successive levels and carries the step's label and value. A route
/// ends with a thick blue arrow from 0 to the final level labelled with the target's value ± uncertainty; a cycle ends
/// with a bracket between the final level and 0 showing the residual ± uncertainty and z, drawn dashed vermillion with a
/// "!" badge when |z| exceeds the threshold.
/// </remarks>
public static class LevelDiagramRenderer
{
    private const double StepSize = 11.5;
    private const double StateSize = 12.5;
    private const double LineGap = 15.0;
    private const double ArrowHead = 9.0;

    /// <summary>Draws the enthalpy-level diagram of a route.</summary>
    public static LevelDiagram RenderRoute(EnthalpyRoute route, LevelDiagramOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(route);
        options ??= new LevelDiagramOptions();
        var ladder = new Ladder(route.Title, route.StartState, route.Steps, route.Quantity, route.Unit, options);
        double total = route.TargetValue;
        string[] lines =
        [
            "target: " + route.TargetLabel,
            $"{route.Quantity} = {DiagramText.WithUncertainty(total, route.TargetUncertainty, options.Decimals)} {route.Unit}",
        ];
        ladder.DrawFinal(LevelArrowKind.Overall, lines, DiagramStyle.Blue, 2.6, null, badge: false, firstLineIsFormula: true);
        return ladder.Finish(null);
    }

    /// <summary>Draws the closure diagram of a cycle, marking the gap when it fails to close.</summary>
    public static LevelDiagram RenderCycle(CycleClosure cycle, LevelDiagramOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(cycle);
        options ??= new LevelDiagramOptions();
        var ladder = new Ladder(cycle.Title, cycle.StartState, cycle.Steps, cycle.Quantity, cycle.Unit, options);
        double z = cycle.EffectiveZ;
        bool closes = Math.Abs(z) <= options.ZThreshold;
        string zText = double.IsInfinity(z) ? "∞" : DiagramText.Signed(z, 1);
        string[] lines =
        [
            closes ? "closes within uncertainty" : "does not close",
            $"residual {DiagramText.WithUncertainty(cycle.Residual, cycle.ResidualUncertainty, options.Decimals)} {cycle.Unit}",
            $"z = {zText} (limit ±{DiagramText.Fixed(options.ZThreshold, 1)})",
        ];
        ladder.DrawFinal(LevelArrowKind.Gap, lines, closes ? DiagramStyle.Green : DiagramStyle.Vermillion, closes ? 2.0 : 2.6, closes ? null : "6 3", badge: !closes, firstLineIsFormula: false);
        return ladder.Finish(closes);
    }

    /// <summary>The shared ladder of levels and step arrows; the final column differs between route and cycle.</summary>
    private sealed class Ladder
    {
        private readonly SvgScene _scene = new();
        private readonly List<PlacedLevel> _levels = [];
        private readonly List<PlacedArrow> _arrows = [];
        private readonly string _title;
        private readonly LevelDiagramOptions _options;
        private readonly double _max;
        private readonly double _scale;
        private readonly double _zeroY;
        private readonly double _plotLeft;

        public Ladder(string title, string startState, IReadOnlyList<EnthalpyStep> steps, string quantity, string unit, LevelDiagramOptions options)
        {
            ArgumentNullException.ThrowIfNull(steps);
            _title = title;
            _options = options;
            var values = new List<double> { 0.0 };
            foreach (EnthalpyStep step in steps)
            {
                values.Add(values[^1] + step.Value);
            }

            var states = new List<string> { startState };
            states.AddRange(steps.Select(s => s.StateAfter));
            _max = values.Max();
            double min = values.Min();
            double span = _max - min;
            _scale = span > 1e-12 ? options.PlotHeight / span : 1.0;
            _zeroY = Y(0.0);

            // Energy axis with ticks.
            IReadOnlyList<double> ticks = AxisTicks.Nice(min, _max);
            double tickLabelWidth = ticks.Max(t => TextMetrics.Width(DiagramText.Tick(t), DiagramStyle.SmallSize));
            _plotLeft = 0.0;
            _scene.Line(new DiagramPoint(0.0, Y(_max) - 14.0), new DiagramPoint(0.0, Y(min) + 14.0), DiagramStyle.Ink, 1.2);
            foreach (double t in ticks)
            {
                _scene.Line(new DiagramPoint(-5.0, Y(t)), new DiagramPoint(0.0, Y(t)), DiagramStyle.Ink, 1.0);
                _scene.Text(-8.0, Y(t) + 4.0, DiagramText.Tick(t), DiagramStyle.SmallSize, TextAnchor.End, DiagramStyle.Ink);
            }

            _scene.Text(-tickLabelWidth - 20.0, (Y(_max) + Y(min)) / 2, $"{quantity} / ({unit})", DiagramStyle.LabelSize, TextAnchor.Middle, DiagramStyle.Ink, vertical: true);

            // Staircase: the arrow of step k stands at the left end of level k+1, and its two label lines sit inside
            // level k+1's column, above or below that level's own texts, so columns are no wider than their texts.
            double x = 24.0;
            double y = Y(0.0);
            double blockHeight = 2 * LineGap;
            string? pendingLabel = null;
            string? pendingValue = null;
            for (int k = 0; k < values.Count; k++)
            {
                IReadOnlyList<FormulaToken> state = FormulaMarkup.Tokenize(states[k]);
                double stepLabelWidth = pendingLabel is null ? 0.0
                    : 10.0 + Math.Max(TextMetrics.Width(pendingLabel, StepSize, bold: true), TextMetrics.Width(pendingValue!, StepSize)) + 14.0;
                double width = Math.Max(Math.Max(110.0, TextMetrics.FormulaWidth(state, StateSize) + 16.0), stepLabelWidth);
                double levelY = Y(values[k]);
                if (pendingLabel is not null)
                {
                    Arrow(x, y, levelY, DiagramStyle.Ink, 1.6, null);
                    double centre = (y + levelY) / 2;
                    centre = levelY < y
                        ? Math.Max(centre, levelY + 18.0 + (blockHeight / 2))
                        : Math.Min(centre, levelY - 22.0 - (blockHeight / 2));
                    double top = centre - (blockHeight / 2);
                    Halo(x + 9.0, top + 11.0, [new FormulaToken(pendingLabel, FormulaTextRole.Normal)], StepSize, TextAnchor.Start, DiagramStyle.Ink, true);
                    Halo(x + 9.0, top + 11.0 + LineGap, [new FormulaToken(pendingValue!, FormulaTextRole.Normal)], StepSize, TextAnchor.Start, DiagramStyle.Ink, false);
                    _arrows.Add(new PlacedArrow(LevelArrowKind.Step, new DiagramPoint(x, y), new DiagramPoint(x, levelY), pendingLabel + " " + pendingValue));
                }

                _levels.Add(new PlacedLevel(states[k], values[k], levelY, x, x + width));
                _scene.Line(new DiagramPoint(x, levelY), new DiagramPoint(x + width, levelY), DiagramStyle.Ink, 2.6, cap: "butt");
                Halo(x + (width / 2), levelY - 6.0, state, StateSize, TextAnchor.Middle, DiagramStyle.Ink, false);
                Halo(x + width - 2.0, levelY + 13.0, [new FormulaToken(DiagramText.Signed(values[k], options.Decimals), FormulaTextRole.Normal)], 10.0, TextAnchor.End, DiagramStyle.Muted, false);
                x += width;
                y = levelY;
                if (k == steps.Count)
                {
                    break;
                }

                EnthalpyStep step = steps[k];
                pendingLabel = step.Label;
                pendingValue = (step.Uncertainty is { } u ? DiagramText.WithUncertainty(step.Value, u, options.Decimals) : DiagramText.Signed(step.Value, options.Decimals))
                    + " " + unit;
                _scene.Line(new DiagramPoint(x, y), new DiagramPoint(x + 18.0, y), DiagramStyle.Faint, 1.0, "2 2");
                x += 18.0;
            }
        }

        public void DrawFinal(LevelArrowKind kind, IReadOnlyList<string> lines, string colour, double width, string? dash, bool badge, bool firstLineIsFormula)
        {
            PlacedLevel last = _levels[^1];
            double arrowX = last.Right + 26.0;
            _scene.Line(new DiagramPoint(last.Right, last.Y), new DiagramPoint(arrowX + 8.0, last.Y), DiagramStyle.Faint, 1.0, "2 2");

            // The zero reference runs under everything, from the axis to the final arrow.
            _scene.Line(new DiagramPoint(_plotLeft, _zeroY), new DiagramPoint(arrowX + 8.0, _zeroY), DiagramStyle.Faint, 1.0, "6 4");
            _scene.SendLastToBack();
            if (kind == LevelArrowKind.Overall)
            {
                Arrow(arrowX, _zeroY, last.Y, colour, width, dash);
            }
            else
            {
                // A gap is a two-headed bracket with end ticks, so even a tiny gap stays visible.
                _scene.Line(new DiagramPoint(arrowX - 10.0, _zeroY), new DiagramPoint(arrowX + 10.0, _zeroY), colour, width);
                _scene.Line(new DiagramPoint(arrowX - 10.0, last.Y), new DiagramPoint(arrowX + 10.0, last.Y), colour, width);
                double gapTop = Math.Min(_zeroY, last.Y);
                double gapBottom = Math.Max(_zeroY, last.Y);
                if (gapBottom - gapTop >= 2 * ArrowHead + 4.0)
                {
                    Arrow(arrowX, (gapTop + gapBottom) / 2, gapTop, colour, width, dash);
                    Arrow(arrowX, (gapTop + gapBottom) / 2, gapBottom, colour, width, dash);
                }
                else
                {
                    // Too small for arrows inside: point at the two lines from outside, as on a dimension line.
                    Arrow(arrowX, gapTop - 16.0, gapTop, colour, width, null);
                    Arrow(arrowX, gapBottom + 16.0, gapBottom, colour, width, null);
                }
            }

            double blockHeight = lines.Count * LineGap;
            double top = ((_zeroY + last.Y) / 2) - (blockHeight / 2);
            double textX = arrowX + 18.0;
            if (badge)
            {
                var c = new DiagramPoint(arrowX + 22.0, top + 6.0);
                _scene.Circle(c, 8.0, DiagramStyle.Vermillion, "none", 0.0);
                _scene.Text(c.X, c.Y + 4.5, "!", 13.0, TextAnchor.Middle, "#FFFFFF", bold: true);
                textX = arrowX + 36.0;
            }

            for (int i = 0; i < lines.Count; i++)
            {
                IReadOnlyList<FormulaToken> tokens = i == 0 && firstLineIsFormula
                    ? [new FormulaToken("target: ", FormulaTextRole.Normal), .. FormulaMarkup.Tokenize(lines[i]["target: ".Length..])]
                    : [new FormulaToken(lines[i], FormulaTextRole.Normal)];
                _scene.Formula(textX, top + 11.0 + (i * LineGap), tokens, StepSize, TextAnchor.Start, i == 0 && !firstLineIsFormula ? colour : i == 1 ? colour : DiagramStyle.Ink, bold: i == (firstLineIsFormula ? 1 : 0));
            }

            _arrows.Add(new PlacedArrow(kind, new DiagramPoint(arrowX, _zeroY), new DiagramPoint(arrowX, last.Y), string.Join(" ", lines)));
        }

        public LevelDiagram Finish(bool? closes)
        {
            DiagramRect content = _scene.Bounds!.Value;
            _scene.Text(content.Left, content.Top - 18.0, _title, DiagramStyle.TitleSize, TextAnchor.Start, DiagramStyle.Ink, bold: true);
            _scene.Text(content.Left, content.Bottom + 24.0, _options.Caption, DiagramStyle.CaptionSize, TextAnchor.Start, DiagramStyle.Muted, italic: true);
            DiagramRect bounds = _scene.Bounds!.Value;
            double dx = DiagramStyle.Margin - bounds.Left;
            double dy = DiagramStyle.Margin - bounds.Top;
            double width = Math.Ceiling(bounds.Width + (2 * DiagramStyle.Margin));
            double height = Math.Ceiling(bounds.Height + (2 * DiagramStyle.Margin));
            string svg = _scene.ToSvg(width, height, dx, dy, _title, _options.Caption);
            DiagramPoint Shift(DiagramPoint p) => new(p.X + dx, p.Y + dy);
            return new LevelDiagram(
                new SvgDiagram(svg, width, height),
                _levels.Select(l => l with { Y = l.Y + dy, Left = l.Left + dx, Right = l.Right + dx }).ToList(),
                _arrows.Select(a => a with { Start = Shift(a.Start), End = Shift(a.End) }).ToList(),
                closes);
        }

        private double Y(double value) => (_max - value) * _scale;

        private void Arrow(double x, double y0, double y1, string colour, double width, string? dash)
        {
            double length = Math.Abs(y1 - y0);
            if (length < 0.5)
            {
                _scene.Circle(new DiagramPoint(x, y0), 3.0, colour, "none", 0.0);
                return;
            }

            double head = Math.Min(ArrowHead, length);
            double sign = y1 > y0 ? 1.0 : -1.0;
            double baseY = y1 - (sign * head);
            _scene.Line(new DiagramPoint(x, y0), new DiagramPoint(x, baseY), colour, width, dash);
            double half = 3.0 + width;
            _scene.Polygon([new DiagramPoint(x, y1), new DiagramPoint(x - half, baseY), new DiagramPoint(x + half, baseY)], colour, colour, 0.8);
        }

        private void Halo(double x, double y, IReadOnlyList<FormulaToken> tokens, double size, TextAnchor anchor, string colour, bool bold)
        {
            double w = TextMetrics.FormulaWidth(tokens, size, bold);
            double left = anchor switch { TextAnchor.Start => x, TextAnchor.Middle => x - (w / 2), _ => x - w };
            _scene.Rect(new DiagramRect(left - 2.0, y - (size * 0.95), w + 4.0, size * 1.3), 2.0, "#FFFFFF", "none", 0.0);
            _scene.Formula(x, y, tokens, size, anchor, colour, bold);
        }
    }
}
