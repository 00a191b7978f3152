package analysis

import (
	"context"
	"fmt"
	"math"
	"strings"

	"strutrisk/internal/column"
	"strutrisk/internal/progress"
	"strutrisk/internal/report"
	"strutrisk/internal/study"
	"strutrisk/sim"
)

// cases are the runs of a study's [sweep] and [[variant]] tables. Every
// run uses the settings of the main run (the same method, seed and
// blocks), so differences between cases are not sampling noise.
type cases struct {
	label    string
	values   []float64      // swept values of a one-key sweep, internal units
	keys     []string       // the swept keys with their units, one per axis
	params   []string       // the swept key paths, one per axis
	names    []string       // the names of grid's rows: the study, each variant
	models   []string       // the capacity model of each of grid's rows
	zipped   bool           // several keys swept in step (combine = "zip")
	points   [][]float64    // points[i][a]: axis a at swept point i, internal units
	lam      []float64      // nominal relative slenderness of the study at each point, about lamAxis
	lamAxis  column.Axis    // the axis governing the study at its own values
	baseLam  float64        // the same at the study's own values
	sweep    []report.Point // the study itself at each swept point
	variants []report.Variant
	series   []report.Series
	// grid[v+1][i] is variant v (-1: the study) at swept point i.
	grid [][]*report.Point
	// studyName says what the study itself assumes (baseName).
	studyName string
	warnings  []string
}

// caseSettings are the settings of a case run: the main run's, without
// the kept samples and the auxiliary sample (a case only reports pf and
// beta); its progress goes to the same line.
func caseSettings(s *sim.Settings) sim.Settings {
	c := *s
	c.Keep = -1
	c.AuxSamples = -1
	return c
}

// runCases runs every case of st.CaseList: each variant at the study's
// values, the study and each variant at every swept point. It returns nil
// when the study has none. Each case's numbers depend on the study, the
// case and the settings only, not on the cases run before it.
func runCases(ctx context.Context, l *Loaded, s *sim.Settings, obs Observer) *cases {
	st := l.Study
	list := st.CaseList()
	if len(list) == 0 {
		return nil
	}
	c := newCases(l)
	n := st.SweptPoints()
	settings := caseSettings(s)
	// A case's own warnings are told once, those of the study not again.
	seen := map[string]bool{}
	for _, x := range st.Warnings {
		seen[x] = true
	}
	for k, cs := range list {
		v, i := cs.Variant, cs.Point
		if ctx.Err() != nil {
			c.warnings = append(c.warnings, "sweep and variants: interrupted; the cases not run are missing")
			return c
		}
		name := caseName(st, v, i)
		obs.StartCase(k+1, len(list), caseLabel(st, v, i))
		pt, warns, err := runCase(ctx, st, v, i, &settings)
		for _, x := range warns {
			if !seen[x] {
				seen[x] = true
				c.warnings = append(c.warnings, name+": "+x)
			}
		}
		if err != nil {
			c.warnings = append(c.warnings, fmt.Sprintf("%s: not run: %v", name, err))
			continue
		}
		switch {
		case i < 0:
			c.variants = append(c.variants, variantOf(st.Variants[v].Name, pt))
		case v < 0:
			c.sweep = append(c.sweep, *pt)
		}
		if i >= 0 {
			c.grid[v+1][i] = pt
		}
	}
	if n > 0 && st.Grid == nil {
		c.series = caseSeries(st, c.grid)
	}
	return c
}

// newCases holds the swept keys and points of the study of l, with the
// study's nominal relative slenderness at each, and room for the results.
func newCases(l *Loaded) *cases {
	st := l.Study
	c := &cases{studyName: baseName(st), baseLam: math.NaN()}
	if l.Nominal != nil {
		c.lamAxis = l.Nominal.Axis
		c.baseLam = l.Nominal.RelSlenderness[c.lamAxis]
	}
	axes := st.SweptAxes()
	for _, sw := range axes {
		c.keys = append(c.keys, sw.Label())
		c.params = append(c.params, sw.Parameter)
	}
	c.names = append(c.names, "study ("+c.studyName+")")
	for _, va := range st.Variants {
		c.names = append(c.names, va.Name)
	}
	for v := -1; v < len(st.Variants); v++ {
		c.models = append(c.models, caseModel(st, v))
	}
	c.zipped = st.Grid != nil && st.Grid.Combine == "zip"
	n := st.SweptPoints()
	for i := 0; i < n; i++ {
		c.points = append(c.points, st.PointValues(i))
		c.lam = append(c.lam, relSlendernessAbout(st, i, c.lamAxis))
	}
	if st.Grid == nil && st.Sweep != nil {
		c.label = st.Sweep.Label()
		for _, q := range st.Sweep.Values {
			c.values = append(c.values, q.Value)
		}
	} else {
		c.label = strings.Join(c.keys, ", ")
	}
	c.grid = make([][]*report.Point, len(st.Variants)+1)
	for k := range c.grid {
		c.grid[k] = make([]*report.Point, n)
	}
	return c
}

// caseSeries are the curves of beta against a one-key sweep, the study
// first, then each variant.
func caseSeries(st *study.Study, grid [][]*report.Point) []report.Series {
	var out []report.Series
	for v := -1; v < len(st.Variants); v++ {
		s := report.Series{Name: "study", Model: caseModel(st, v)}
		if v >= 0 {
			s.Name = st.Variants[v].Name
		} else if len(st.Variants) > 0 {
			s.Name = "study (" + baseName(st) + ")"
		}
		for _, pt := range grid[v+1] {
			// A case without failures has no finite beta to draw.
			if pt != nil && pt.Pf > 0 {
				s.Points = append(s.Points, *pt)
			}
		}
		out = append(out, s)
	}
	return out
}

// baseName says briefly what the study itself assumes, to tell it from
// its variants.
func baseName(st *study.Study) string {
	if st.ModelTraits().Curve {
		return st.Model.String() + " " + st.Curve[0]
	}
	if opts := st.ModelTraits().Options; opts != "" {
		return st.Model.String() + " " + opts
	}
	return st.Model.String()
}

// caseName names a case for progress lines and warnings.
func caseName(st *study.Study, v, i int) string {
	var parts []string
	if v >= 0 {
		parts = append(parts, fmt.Sprintf("variant %q", st.Variants[v].Name))
	}
	if i >= 0 {
		parts = append(parts, pointText(st, i))
	}
	return strings.Join(parts, " at ")
}

// caseLabel names a case briefly for the progress line: the swept values
// first, then the variant's name, shortened.
func caseLabel(st *study.Study, v, i int) string {
	var parts []string
	if i >= 0 {
		parts = append(parts, pointText(st, i))
	}
	if v >= 0 {
		parts = append(parts, fmt.Sprintf("variant %q", progress.Clip(st.Variants[v].Name, 24)))
	}
	return strings.Join(parts, ", ")
}

// pointText writes swept point i as a person reads it:
// "member.length = 3 m, imperfection.bow = L/500".
func pointText(st *study.Study, i int) string {
	var parts []string
	values := st.PointValues(i)
	for a, sw := range st.SweptAxes() {
		parts = append(parts, sw.Parameter+" = "+valueText(values[a], sw.Unit()))
	}
	return strings.Join(parts, ", ")
}

// runCase builds and runs one case; it also returns the case's warnings.
func runCase(ctx context.Context, st *study.Study, v, i int, s *sim.Settings) (*report.Point, []string, error) {
	cs, err := st.Derive(v, i)
	if err != nil {
		return nil, nil, err
	}
	pt, status, err := runDerived(ctx, st, cs, i, s)
	warns := cs.Warnings
	if status != "" {
		warns = append(warns[:len(warns):len(warns)], status)
	}
	return pt, warns, err
}

// runDerived runs the derived study cs of st at swept value i. status
// says why the estimate cannot be trusted, or is "" when it can.
func runDerived(ctx context.Context, st, cs *study.Study, i int, s *sim.Settings) (pt *report.Point, status string, err error) {
	md, err := study.Build(cs)
	if err != nil {
		return nil, "", err
	}
	if len(md.Sim.Vars) == 0 {
		return nil, "", fmt.Errorf("nothing in it is uncertain")
	}
	// A variant may set its own [analysis] keys (a cheaper method for an
	// expensive model); the rest is the main run's, but for the settings
	// of its own capacity model.
	settings := md.SimSettings(*s)
	a, b := cs.Analysis, st.Analysis
	if a.Method != b.Method {
		settings.Method = a.Method
	}
	if a.Samples != b.Samples {
		settings.Samples = a.Samples
	}
	if a.TargetCoV != b.TargetCoV {
		settings.TargetCoV = a.TargetCoV
	}
	if a.Seed != b.Seed {
		settings.Seed = a.Seed
	}
	res, err := sim.Run(ctx, md.Sim, &settings)
	if err != nil {
		return nil, "", err
	}
	if res.Incomplete {
		return nil, "", fmt.Errorf("interrupted")
	}
	switch {
	case !res.Status.Trusted():
		status = "the estimate of this case cannot be trusted: " + res.StatusReason
	case res.Status == sim.FewFailures:
		status = res.StatusReason
	}
	pt = &report.Point{Pf: res.Pf, Beta: report.Index(res.Beta), PfCI: [2]float64{res.PfCI[0], res.PfCI[1]},
		Doubtful: !res.Status.Trusted(), Status: res.Status.String()}
	if res.Status != sim.Converged {
		pt.StatusReason = res.StatusReason
	}
	trusted := res.Status.Trusted()
	pt.Trusted = &trusted
	if i >= 0 {
		values := st.PointValues(i)
		pt.Value = values[0]
		if st.Grid != nil {
			pt.Values = map[string]float64{}
			for a, sw := range st.Grid.Axes {
				pt.Values[sw.Parameter] = values[a]
			}
		}
	}
	return pt, status, nil
}

// fill puts the cases into the bundle and its document.
func (c *cases) fill(b *report.Bundle) {
	if c == nil {
		return
	}
	b.Doc.Sweep = c.sweep
	b.Doc.Variants = c.variants
	b.Series = c.series
	b.SweepLabel = c.label
	b.Cases = &report.CaseTable{StudyName: c.studyName, Values: c.values, Grid: c.grid,
		Keys: c.keys, Params: c.params, Points: c.points, BaseLambda: c.baseLam, Names: c.names,
		Models: c.models, Zipped: c.zipped}
	if lamVaries(c.lam) {
		b.Cases.Lambda = c.lam
		b.SweepLambdaAxis = c.lamAxis.String()
	}
	if lamVaries(c.lam) && c.values != nil {
		b.SweepLambda = map[float64]float64{}
		for i, x := range c.values {
			b.SweepLambda[x] = c.lam[i]
		}
		b.SweepLambdaAxis = c.lamAxis.String()
	}
}

// lamVaries tells whether the swept values change the relative slenderness.
func lamVaries(lam []float64) bool {
	for _, l := range lam {
		if math.Abs(l-lam[0]) > 1e-3 {
			return true
		}
	}
	return false
}

// caseModel is the capacity model of variant v of st (-1: the study).
func caseModel(st *study.Study, v int) string {
	if v < 0 {
		return st.Model.String()
	}
	cs, err := st.Derive(v, -1)
	if err != nil {
		return ""
	}
	return cs.Model.String()
}

// relSlendernessAbout is the nominal relative slenderness of the study at
// swept value i about axis a (NaN if it cannot be found).
func relSlendernessAbout(st *study.Study, i int, a column.Axis) float64 {
	n, err := sweptNominal(st, i)
	if err != nil {
		return math.NaN()
	}
	return n.RelSlenderness[a]
}

// relSlenderness is the nominal relative slenderness of the study at
// swept value i about its governing axis (NaN if it cannot be found).
func relSlenderness(st *study.Study, i int) float64 {
	n, err := sweptNominal(st, i)
	if err != nil {
		return math.NaN()
	}
	return n.ModeSlenderness
}

// sweptNominal is the study at swept value i at nominal values.
func sweptNominal(st *study.Study, i int) (*study.Nominal, error) {
	cs, err := st.Derive(-1, i)
	if err != nil {
		return nil, err
	}
	md, err := study.Build(cs)
	if err != nil {
		return nil, err
	}
	return md.Nominal()
}

// casesCheckText lists the sweep and the variants for check, with the
// nominal capacity of each variant at the study's values.
func casesCheckText(st *study.Study) string {
	var b strings.Builder
	if sw := st.Sweep; sw != nil && len(sw.Values) > 0 {
		first, last := sw.Values[0].Value, sw.Values[len(sw.Values)-1].Value
		fmt.Fprintf(&b, "\nSweep of %s over %d values, %.5g to %.5g", sw.Label(), len(sw.Values), first, last)
		l0, l1 := relSlenderness(st, 0), relSlenderness(st, len(sw.Values)-1)
		if math.Abs(l1-l0) > 1e-3 {
			fmt.Fprintf(&b, " (nominal relative slenderness %.3f to %.3f)", l0, l1)
		}
		b.WriteString("\n")
	}
	if g := st.Grid; g != nil {
		fmt.Fprintf(&b, "\nSweep of %d keys (combine = %q), %d points:\n", len(g.Axes), g.Combine, len(g.Points))
		for _, sw := range g.Axes {
			first, last := sw.Values[0].Value, sw.Values[len(sw.Values)-1].Value
			fmt.Fprintf(&b, "  - %s: %d values, %.5g to %.5g\n", sw.Label(), len(sw.Values), first, last)
		}
	}
	if len(st.Variants) > 0 {
		what := "nominal capacity"
		if st.Bending != nil {
			what = "nominal load factor"
		}
		fmt.Fprintf(&b, "\nVariants (run with the study's seed), %s at the study's values:\n", what)
		for v, va := range st.Variants {
			capText := "?"
			if cs, err := st.Derive(v, -1); err == nil {
				if md, err := study.Build(cs); err == nil {
					if n, err := md.Nominal(); err == nil {
						capText = fmt.Sprintf("%.1f kN", n.Capacity/1e3)
						if n.LoadFactor > 0 { // [bending]: the load factor is the capacity
							capText = fmt.Sprintf("factor %.3f", n.LoadFactor)
						}
					}
				}
			}
			fmt.Fprintf(&b, "  - %-26s %12s  sets %s\n", va.Name, capText, strings.Join(va.Keys, ", "))
		}
	}
	return b.String()
}

// valueText writes a swept value in unit (an internal unit of
// study.Sweep.Unit) as a person reads it: forces in kN, lengths of a metre
// or more in m, moments in kN*m, L/n fractions as L/n.
func valueText(v float64, unit string) string {
	switch unit {
	case "N":
		return fmt.Sprintf("%.4g kN", v/1e3)
	case "mm":
		if math.Abs(v) >= 1000 {
			return fmt.Sprintf("%.4g m", v/1e3)
		}
		return fmt.Sprintf("%.4g mm", v)
	case "N*mm":
		return fmt.Sprintf("%.4g kN*m", v/1e6)
	case "N*mm/rad":
		return fmt.Sprintf("%.4g kN*m/rad", v/1e6)
	case "fraction of L":
		if v != 0 {
			return fmt.Sprintf("L/%.4g", 1/v)
		}
	case "":
		return fmt.Sprintf("%.4g", v)
	}
	return fmt.Sprintf("%.4g %s", v, unit)
}

// variantOf is the result document's entry of the variant named name
// whose case at the study's values gave pt, with its trust status.
func variantOf(name string, pt *report.Point) report.Variant {
	trusted := !pt.Doubtful
	return report.Variant{Name: name, Pf: pt.Pf, Beta: pt.Beta, PfCI: pt.PfCI,
		Status: pt.Status, StatusReason: pt.StatusReason, Trusted: &trusted}
}
