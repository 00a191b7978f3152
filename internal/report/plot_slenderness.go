package report

import (
	"strings"

	"gonum.org/v1/plot"
	"gonum.org/v1/plot/plotter"
	"gonum.org/v1/plot/vg"
	"gonum.org/v1/plot/vg/draw"
)

// finiteXYs pairs x and y, dropping pairs that are not finite.
func finiteXYs(x, y []float64) plotter.XYs {
	n := min(len(x), len(y))
	xy := make(plotter.XYs, 0, n)
	for i := 0; i < n; i++ {
		if finite(x[i]) && finite(y[i]) {
			xy = append(xy, plotter.XY{X: x[i], Y: y[i]})
		}
	}
	return xy
}

// slendernessFigure draws the deterministic capacity curves against
// relative slenderness, the sampled members as a cloud and the nominal
// member as a marked point.
func slendernessFigure(b *Bundle) *figure {
	s := b.Slenderness
	if s == nil {
		return nil
	}
	p := newPlot("Capacity against relative slenderness", "relative slenderness λ (–)", "capacity / squash load N/Ny (–)")
	addGrid(p, true)
	var lg legendLayout
	var cloud plotter.XYs
	for _, c := range s.Cloud {
		if finite(c[0]) && finite(c[1]) {
			cloud = append(cloud, plotter.XY{X: c[0], Y: c[1]})
		}
	}
	if len(cloud) > 0 {
		if sc, err := plotter.NewScatter(cloud); err == nil {
			sc.GlyphStyle = draw.GlyphStyle{Color: faded(colSafe, 0x66), Radius: vg.Points(1.3), Shape: draw.CircleGlyph{}}
			p.Add(sc)
			lg.add(p, "sampled members", cloud, sc)
		}
	}
	notes := addModelCurves(p, &lg, s.Curves)
	if m := s.Member; finite(m[0]) && finite(m[1]) && (m[0] != 0 || m[1] != 0) {
		pt := plotter.XYs{{X: m[0], Y: m[1]}}
		if sc, err := plotter.NewScatter(pt); err == nil {
			sc.GlyphStyle = draw.GlyphStyle{Color: colFailure, Radius: vg.Points(4.5), Shape: draw.CrossGlyph{}}
			p.Add(sc)
			lg.add(p, "this member (nominal)", pt, sc)
		}
	}
	if len(lg.names) == 0 {
		return nil
	}
	p.X.Min, p.Y.Min = 0, 0
	w, h := 16*vg.Centimeter, 10*vg.Centimeter
	lg.place(p, w, h)
	caption := ""
	if len(notes) > 0 {
		caption = " " + strings.Join(notes, " ")
	}
	return &figure{Name: "slenderness", Caption: "Capacity as a fraction of the squash load, N/Ny, against relative slenderness λ (both dimensionless): the deterministic curve of each capacity model about each axis the study checks (the minor axis's marked with rings), each model in one colour and line style in every picture, the sampled members (cloud) and the nominal member (cross)." + caption, W: w, H: h, Plots: []*plot.Plot{p}}
}

// addModelCurves draws curves in their models' styles (modelStyle), the
// minor axis's marked with rings when both axes are drawn, and returns
// the curves' notes for the caption.
func addModelCurves(p *plot.Plot, lg *legendLayout, curves []Curve) (notes []string) {
	axes := map[string]bool{}
	for _, c := range curves {
		if c.Axis == "major" || c.Axis == "minor" {
			axes[c.Axis] = true
		}
	}
	for _, c := range curves {
		xy := finiteXYs(c.X, c.Y)
		if len(xy) < 2 {
			continue
		}
		ln, err := plotter.NewLine(xy)
		if err != nil {
			continue
		}
		st := modelStyle(c.Model)
		ln.LineStyle = st.line(1.6)
		thumbs := []plot.Thumbnailer{ln}
		p.Add(ln)
		if c.Axis == "minor" && len(axes) > 1 {
			var marks plotter.XYs
			for k := 4; k < len(xy); k += 6 {
				marks = append(marks, xy[k])
			}
			if sc, err := plotter.NewScatter(marks); err == nil {
				sc.GlyphStyle = draw.GlyphStyle{Color: st.Color, Radius: vg.Points(2.2), Shape: draw.RingGlyph{}}
				p.Add(sc)
				thumbs = append(thumbs, sc)
			}
		}
		name := c.Name
		if name == "" {
			name = "capacity model"
		}
		lg.add(p, name, xy, thumbs...)
		if c.Note != "" {
			notes = append(notes, name+": "+c.Note+".")
		}
	}
	return notes
}
