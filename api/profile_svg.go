package api

import (
	"bytes"
	"errors"
	"fmt"
	"image/color"
	"math"
	"strconv"
	"strings"
	"unicode/utf8"

	"gonum.org/v1/plot"
	"gonum.org/v1/plot/font"
	"gonum.org/v1/plot/plotter"
	"gonum.org/v1/plot/text"
	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
	"gonum.org/v1/plot/vg/vgsvg"

	"colloidtriage/advisor"
)

// Size of the interaction-profile chart.
const (
	chartWidth  = 16 * vg.Centimeter
	chartHeight = 11 * vg.Centimeter
)

// Y-range rule of the chart, in kT. The full curve runs from a deep primary
// minimum at contact to nearly zero far out, so a chart of all of it would
// flatten the barrier and the secondary minimum into the axes:
//
//   - top: 1.2 x the barrier; without one, 1.2 x the curve's largest value
//     held to [chartMinTop, chartFreeTop];
//   - bottom: minus the largest of 0.2 x top, 3 x |secondary minimum| and,
//     without a barrier, 1.2 x |lowest value|, held to [chartMinDepth,
//     chartMaxDepth], and deepened to 1.2 x |secondary minimum| if that lies
//     lower, so both marks are always inside.
//
// Lines leaving the range are clipped at the frame; the JSON form of the
// route carries every point.
const (
	chartMinTop   = 5.0
	chartFreeTop  = 20.0
	chartMinDepth = 5.0
	chartMaxDepth = 50.0
)

var (
	colourTotal       = color.RGBA{A: 255}
	colourVanDerWaals = color.RGBA{R: 31, G: 84, B: 200, A: 255}
	colourDoubleLayer = color.RGBA{R: 200, G: 40, B: 40, A: 255}
	colourDepletion   = color.RGBA{R: 20, G: 140, B: 60, A: 255}
	colourZero        = color.RGBA{R: 150, G: 150, B: 150, A: 255}
)

// Layout of the chart, in points: the title block at the top, the legend in
// a column to the right of the plot (never over the curves or the frame),
// and a margin all round so that no label touches the edge. Text is laid
// out with Liberation Sans metrics; a viewer without that font substitutes
// one of the same metrics (Arial, Helvetica) named in the SVG, and
// chartFontSlack leaves room for a substitute up to 12 % wider.
const (
	chartMargin     = vg.Length(8)
	chartGap        = vg.Length(10)
	chartThumbWidth = vg.Length(26)
	chartTitleSize  = vg.Length(11)
	chartLabelSize  = vg.Length(10)
	chartTickSize   = vg.Length(9)
	chartFontSlack  = 1.12
)

// chartFontFamily is what the SVG names for Liberation Sans: the font and
// two of the same metrics, then the generic family.
const chartFontFamily = "font-family:Liberation Sans,Arial,Helvetica,sans-serif;"

// chartFont is the chart's typeface at a size.
func chartFont(size vg.Length) font.Font {
	return font.Font{Typeface: "Liberation", Variant: "Sans", Size: size}
}

// chartText is a text style of the chart at a size.
func chartText(size vg.Length) text.Style {
	return text.Style{Color: colourTotal, Font: chartFont(size), Handler: plot.DefaultTextHandler}
}

// profileChart draws a profile as a labelled SVG chart: energy in kT against
// separation in nm on a logarithmic axis (the grid is log-spaced, and the
// barrier sits at a few nm while the curve runs to hundreds), the total and
// its parts, a zero line, and the barrier and secondary minimum marked. The
// chart is deterministic: the same profile gives the same bytes.
func profileChart(pr *advisor.Profile) ([]byte, error) {
	if len(pr.Points) < 2 {
		return nil, errors.New("interaction profile has fewer than two finite points")
	}
	p := plot.New()
	p.X.Label.Text = "surface separation h (nm, log scale)"
	p.Y.Label.Text = "interaction energy V (kT)"
	p.X.Label.TextStyle.Font, p.Y.Label.TextStyle.Font = chartFont(chartLabelSize), chartFont(chartLabelSize)
	p.X.Tick.Label.Font, p.Y.Tick.Label.Font = chartFont(chartTickSize), chartFont(chartTickSize)
	// The x axis is linear in log10(h) with ticks labelled in nm: gonum's
	// LogScale pads the plot for the axis label as if the axis were linear.
	p.X.Tick.Marker = logTicks125{}
	p.Y.Tick.Marker = linearTicks{}
	p.Add(plotter.NewGrid())

	first, last := math.Log10(pr.Points[0].SeparationNm), math.Log10(pr.Points[len(pr.Points)-1].SeparationNm)
	zero, err := plotter.NewLine(plotter.XYs{{X: first, Y: 0}, {X: last, Y: 0}})
	if err != nil {
		return nil, err
	}
	zero.Color, zero.Width = colourZero, vg.Points(0.75)
	p.Add(zero)

	parts := []chartSeries{
		{"total", func(q advisor.ProfilePoint) float64 { return q.TotalKT }, colourTotal, 2, nil},
		{"van der Waals", func(q advisor.ProfilePoint) float64 { return q.VanDerWaalsKT }, colourVanDerWaals, 1.25, []vg.Length{6, 3}},
		{"double layer", func(q advisor.ProfilePoint) float64 { return q.DoubleLayerKT }, colourDoubleLayer, 1.25, []vg.Length{2, 2}},
	}
	if pr.Points[0].DepletionKT != nil {
		parts = append(parts, chartSeries{"depletion", func(q advisor.ProfilePoint) float64 { return *q.DepletionKT },
			colourDepletion, 1.25, []vg.Length{8, 2, 2, 2}})
	}
	legend := plot.NewLegend()
	legend.TextStyle = chartText(chartLabelSize)
	legend.ThumbnailWidth = chartThumbWidth
	legend.Top, legend.Left = true, true
	legend.Padding = vg.Points(4)
	for _, part := range parts {
		xys := make(plotter.XYs, len(pr.Points))
		for i, q := range pr.Points {
			xys[i] = plotter.XY{X: math.Log10(q.SeparationNm), Y: part.value(q)}
		}
		l, err := plotter.NewLine(xys)
		if err != nil {
			return nil, err
		}
		l.Color, l.Width, l.Dashes = part.colour, vg.Points(part.width), part.dashes
		p.Add(l)
		legend.Add(part.name, l)
	}

	bottom, top := chartYRange(pr)
	marks := []struct {
		at    *advisor.ProfileExtremum
		name  string
		glyph draw.GlyphDrawer
		below bool
	}{
		{pr.Barrier, "barrier", draw.TriangleGlyph{}, false},
		{pr.SecondaryMinimum, "secondary minimum", draw.CircleGlyph{}, true},
	}
	for _, m := range marks {
		if m.at == nil {
			continue
		}
		if err := addMark(p, m.at, m.name, m.glyph, m.below, first, last); err != nil {
			return nil, err
		}
	}
	p.X.Min, p.X.Max = first, last
	p.Y.Min, p.Y.Max = bottom, top

	svg := vgsvg.New(chartWidth, chartHeight)
	c := draw.New(svg)
	c.SetColor(color.White)
	c.Fill(c.Rectangle.Path())
	inner := draw.Crop(c, chartMargin, -chartMargin, chartMargin, -chartMargin)
	titleStyle := chartText(chartTitleSize)
	titleStyle.XAlign = text.XCenter
	lines := chartTitleLines(pr, titleStyle, inner.Size().X)
	lineHeight := titleStyle.Height("Ag")
	for i, line := range lines {
		at := vg.Point{X: inner.Center().X, Y: inner.Max.Y - vg.Length(i+1)*lineHeight + titleStyle.FontExtents().Descent}
		c.FillText(titleStyle, at, line)
	}
	body := draw.Crop(inner, 0, 0, 0, -(vg.Length(len(lines))*lineHeight + chartGap))
	column := legendWidth(legend, parts)
	p.Draw(draw.Crop(body, 0, -(column + chartGap), 0, 0))
	legend.Draw(draw.Crop(body, body.Size().X-column, 0, 0, 0))

	var buf bytes.Buffer
	if _, err := svg.WriteTo(&buf); err != nil {
		return nil, err
	}
	return bytes.ReplaceAll(buf.Bytes(), []byte("font-family:Liberation Sans;"), []byte(chartFontFamily)), nil
}

// legendWidth is the width of the legend column: the line sample, a space
// and the longest name, with room for a wider substitute font.
func legendWidth(l plot.Legend, parts []chartSeries) vg.Length {
	var widest vg.Length
	for _, part := range parts {
		widest = max(widest, l.TextStyle.Width(part.name))
	}
	return l.ThumbnailWidth + l.TextStyle.Width(" ") + vg.Length(chartFontSlack)*widest
}

// chartTitleLines is the title block: what is drawn and for which sample,
// then the pair's parameters, split over two lines when they would not fit
// in width (with room for a wider substitute font); a sample id too long for
// its line is cut with an ellipsis.
func chartTitleLines(pr *advisor.Profile, sty text.Style, width vg.Length) []string {
	fits := func(s string) bool { return vg.Length(chartFontSlack)*sty.Width(s) <= width }
	title := "Interaction energy of two median particles"
	if pr.SampleID != "" {
		id := []rune(xmlSafe(pr.SampleID))
		for n := len(id); n > 0; n-- {
			s := title + ": " + string(id[:n])
			if n < len(id) {
				s += "…"
			}
			if fits(s) {
				title = s
				break
			}
		}
	}
	pp := pr.Pair
	params := []string{fmt.Sprintf("a = %s nm", num(pp.RadiusNm)), fmt.Sprintf("A = %s zJ", num(pp.HamakerZJ)),
		fmt.Sprintf("ζ = %s mV", num(pp.ZetaMV))}
	if pp.DebyeLengthNm != nil {
		params = append(params, fmt.Sprintf("Debye length %s nm", num(*pp.DebyeLengthNm)))
	} else {
		params = append(params, "no electrolyte")
	}
	if pp.ClosestApproachBy == advisor.ContactSteric {
		params = append(params, fmt.Sprintf("steric wall at %s nm", num(pp.ClosestApproachNm)))
	}
	params = append(params, fmt.Sprintf("%s °C", num(pr.Units.TemperatureC)))
	if all := strings.Join(params, ", "); fits(all) {
		return []string{title, all}
	}
	return []string{title, strings.Join(params[:3], ", "), strings.Join(params[3:], ", ")}
}

// chartSeries is one line of the chart: a part of the energy and its style
// (width in points).
type chartSeries struct {
	name   string
	value  func(advisor.ProfilePoint) float64
	colour color.Color
	width  float64
	dashes []vg.Length
}

// chartYRange applies the y-range rule documented above.
func chartYRange(pr *advisor.Profile) (bottom, top float64) {
	highest, lowest := math.Inf(-1), math.Inf(1)
	for _, q := range pr.Points {
		highest, lowest = math.Max(highest, q.TotalKT), math.Min(lowest, q.TotalKT)
	}
	if pr.Barrier != nil {
		top = math.Max(1.2*pr.Barrier.EnergyKT, chartMinTop)
	} else {
		top = math.Min(math.Max(1.2*highest, chartMinTop), chartFreeTop)
	}
	depth := 0.2 * top
	secondary := 0.0
	if pr.SecondaryMinimum != nil {
		secondary = math.Abs(pr.SecondaryMinimum.EnergyKT)
		depth = math.Max(depth, 3*secondary)
	}
	if pr.Barrier == nil && lowest < 0 {
		depth = math.Max(depth, -1.2*lowest)
	}
	depth = math.Max(math.Min(math.Max(depth, chartMinDepth), chartMaxDepth), 1.2*secondary)
	return -depth, top
}

// addMark puts a glyph on an extremum and labels it with its energy and
// position, on the side of the point that faces the middle of the chart.
func addMark(p *plot.Plot, at *advisor.ProfileExtremum, name string, glyph draw.GlyphDrawer, below bool, first, last float64) error {
	xy := plotter.XYs{{X: math.Log10(at.SeparationNm), Y: at.EnergyKT}}
	s, err := plotter.NewScatter(xy)
	if err != nil {
		return err
	}
	s.GlyphStyle = draw.GlyphStyle{Color: colourTotal, Radius: vg.Points(3.5), Shape: glyph}
	p.Add(s)

	label := fmt.Sprintf("%s %s kT at %s nm", name, num(at.EnergyKT), num(at.SeparationNm))
	if at.AtClosestApproach {
		label = fmt.Sprintf("%s (at contact) %s kT", name, num(at.EnergyKT))
	}
	l, err := plotter.NewLabels(plotter.XYLabels{XYs: xy, Labels: []string{label}})
	if err != nil {
		return err
	}
	for i := range l.TextStyle {
		l.TextStyle[i].Font = chartFont(chartTickSize)
	}
	right := xy[0].X > 0.5*(first+last)
	dx, dy := vg.Points(6), vg.Points(4)
	if right {
		dx = -dx
		for i := range l.TextStyle {
			l.TextStyle[i].XAlign = text.XRight
		}
	}
	if below {
		dy = -dy
		for i := range l.TextStyle {
			l.TextStyle[i].YAlign = text.YTop
		}
	}
	l.Offset = vg.Point{X: dx, Y: dy}
	p.Add(l)
	return nil
}

// logTicks125 ticks an axis of log10(h): labels at 1, 2 and 5 times the
// powers of ten inside its range (in nm), unlabelled minor ticks at the other
// integers.
type logTicks125 struct{}

func (logTicks125) Ticks(min, max float64) []plot.Tick {
	var ticks []plot.Tick
	for d := math.Floor(min); d <= math.Ceil(max); d++ {
		for m := 1; m <= 9; m++ {
			x := d + math.Log10(float64(m))
			if x < min-1e-9 || x > max+1e-9 {
				continue
			}
			t := plot.Tick{Value: x}
			if m == 1 || m == 2 || m == 5 {
				t.Label = strconv.FormatFloat(float64(m)*math.Pow(10, d), 'g', 3, 64)
			}
			ticks = append(ticks, t)
		}
	}
	return ticks
}

// linearTicks labels an energy axis at a step of 1, 2 or 5 times a power of
// ten giving about six labels, always through zero, with a minor tick
// between labels.
type linearTicks struct{}

func (linearTicks) Ticks(min, max float64) []plot.Tick {
	raw := (max - min) / 6
	step := math.Pow(10, math.Floor(math.Log10(raw)))
	for _, m := range []float64{2, 5, 10} {
		if step >= raw {
			break
		}
		step = m * math.Pow(10, math.Floor(math.Log10(raw)))
	}
	var ticks []plot.Tick
	for k := math.Ceil(min / step * 2); k <= math.Floor(max/step*2); k++ {
		v := k * step / 2
		if v == 0 {
			v = 0 // not −0
		}
		t := plot.Tick{Value: v}
		if math.Mod(k, 2) == 0 {
			t.Label = num(v)
		}
		ticks = append(ticks, t)
	}
	return ticks
}

// num formats a chart number with three significant digits (whole numbers
// from 1000 on) and a true minus sign.
func num(v float64) string {
	s := strconv.FormatFloat(v, 'g', 3, 64)
	if math.Abs(v) >= 1000 {
		s = strconv.FormatFloat(v, 'f', 0, 64)
	}
	return strings.ReplaceAll(s, "-", "−")
}

// xmlSafe replaces what XML 1.0 cannot carry (control characters, invalid
// UTF-8) by U+FFFD; the SVG canvas escapes markup characters itself.
func xmlSafe(s string) string {
	return strings.Map(func(r rune) rune {
		if r == utf8.RuneError || (r < 0x20 && r != '\t' && r != '\n' && r != '\r') || r == 0xFFFE || r == 0xFFFF {
			return utf8.RuneError
		}
		if r == '\n' || r == '\r' || r == '\t' {
			return ' ' // the title has its own line structure
		}
		return r
	}, s)
}
