package study

import (
	"strings"

	"strutrisk/internal/column"
	"strutrisk/sim"
)

// TimberCorrelation is the correlation of the compression strength and
// the modulus of timber that applies, listed, when both are random and the
// study pairs them in no [[correlation]] (JCSS Probabilistic Model Code,
// Part 3.5, Table 1: f_c with E; from memory).
const TimberCorrelation = 0.6

// checkMaterial checks the study against its material's kind and gives
// the kind's buckling curves (materials.go). It runs once the study is
// otherwise clean.
func (p *parser) checkMaterial() {
	if p.st.Material.Kind == column.Steel {
		return
	}
	if p.st.Bending != nil {
		p.errorf("bending", "[bending] takes a steel member for now: its load factor and the EN 1993-1-1 6.3.3 interaction are those of carbon steel, and material.kind is %q (remove [bending], or check the member as steel)", p.st.Material.Kind)
		return
	}
	switch p.st.Material.Kind {
	case column.Timber:
		p.checkTimber()
	case column.Stainless:
		p.checkStainless()
	case column.Aluminium:
		p.checkAluminium()
	}
	p.kindCurves()
	if p.st.Material.Kind != column.Timber && p.st.Section.Shape != column.ShapeRect && p.st.Section.Shape != column.ShapeRound &&
		p.st.Section.Shape != column.ShapeCustom {
		p.warnf("material.kind (line %d): the section class of %s is found with the limits of EN 1993-1-1 Table 5.2 and eps = sqrt(235/fy); %s gives its own limits: check a slender part by hand",
			p.line("material.kind"), p.st.Material.Kind, map[column.Kind]string{column.Stainless: "EN 1993-1-4 5.2", column.Aluminium: "EN 1999-1-1 6.1.4"}[p.st.Material.Kind])
	}
}

// kindCurves gives each axis without one the default buckling curve of
// the material and sets the plateau lambda_0 (model curve, or the
// equivalent imperfection).
func (p *parser) kindCurves() {
	st := p.st
	ms := &st.Material
	def := p.defaultCurve()
	var names [2]string
	for a := range 2 {
		names[a] = st.Curve[a]
		if names[a] == "" {
			names[a] = def
		}
	}
	c0, err0 := column.MaterialCurve(ms.Kind, names[0])
	c1, err1 := column.MaterialCurve(ms.Kind, names[1])
	if err0 != nil || err1 != nil {
		return // reported where the curve was read
	}
	if c0.Lambda0 != c1.Lambda0 {
		p.errorf("capacity.curve", "the two axes take curves with different plateaus (lambda_0 %g and %g): give one section family for both axes", c0.Lambda0, c1.Lambda0)
		return
	}
	ms.Lambda0, ms.ClassA = c0.Lambda0, names[0] == "A"
	if !st.ModelTraits().Curve && st.Imperfection != "equivalent" {
		return
	}
	missing := false
	for a := range 2 {
		if st.Alpha[a] == nil {
			missing = true
			st.Curve[a] = def
			st.Alpha[a] = &Quantity{Path: "capacity.curve", Line: p.line("capacity"), Value: st.kindAlpha(def, a)}
		}
	}
	if missing {
		p.defaultf("capacity.curve: not given; %s", p.curveWhy(def))
	}
}

// defaultCurve is the material's buckling curve for the study's section.
func (p *parser) defaultCurve() string {
	switch p.st.Material.Kind {
	case column.Stainless:
		if s := p.st.Section.Shape; s == column.ShapeRHS || s == column.ShapeCHS {
			return "hollow"
		}
		return "welded-open"
	case column.Aluminium:
		return "B"
	case column.Timber:
		return "solid"
	}
	return ""
}

// curveWhy says why the default curve applies.
func (p *parser) curveWhy(c string) string {
	switch c {
	case "hollow":
		return "EN 1993-1-4 Table 5.2 gives hollow sections alpha 0.49, lambda_0 0.40"
	case "welded-open":
		return "EN 1993-1-4 Table 5.2 has rows for cold-formed open, hollow and welded open sections; this section takes welded-open (alpha 0.49 major, 0.76 minor, lambda_0 0.20), the most severe: write curve = \"cold-formed-open\" for a cold-formed one"
	case "B":
		return "aluminium takes buckling class B of EN 1999-1-1 Table 6.6 (alpha 0.32, lambda_0 0), the more severe; class A (curve = \"A\") is for the heat-treated alloys of Table 3.2"
	case "solid":
		return "timber takes solid timber, beta_c 0.2 (EN 1995-1-1 eq. 6.29); write curve = \"glulam\" for glued laminated timber (beta_c 0.1)"
	}
	return c
}

// checkTimber checks a timber study: its section, its model, its loads'
// durations and the correlation of strength and modulus.
func (p *parser) checkTimber() {
	st := p.st
	if s := st.Section.Shape; s != column.ShapeRect && s != column.ShapeRound {
		p.errorf("member.section.shape", "timber takes a rect or round section (sawn or glued laminated timber; EN 1995-1-1 6.3.2), not %s", st.Section.Name)
	}
	if st.Combination != nil && len(st.Combination.Cases) > 0 {
		p.errorf("loads", "timber takes at most one random variable load for now: each load's duration sets k_mod, and Turkstra's cases are not combined with the load-duration combinations yet; make the others fixed or sum them into one load")
	}
	if st.Model.kernel() == kernelBeam {
		p.errorf("capacity.model", "the beam-column has no timber law: use curve (k_c of EN 1995-1-1 6.3.2), perry-robertson or secant (first yield at the compression strength)")
	}
	var def []string
	for _, q := range st.Loads {
		perm := isPermanentPath(st, q.Path)
		if q.Duration == "" {
			q.Duration = "medium"
			if perm {
				q.Duration = "permanent"
			}
			def = append(def, strings.TrimPrefix(q.Path, "loads.")+" "+q.Duration)
			continue
		}
		if perm && q.Duration != "permanent" {
			p.warnf("%s.duration (line %d): %s is a permanent load (target.permanent) but its duration is %q", q.Path, p.line(q.Path+".duration"), q.Path, q.Duration)
		}
	}
	if len(def) > 0 {
		p.defaultf("loads: duration not given; %s (EN 1995-1-1 Table 2.2: permanent loads permanent, imposed floor loads medium-term; write duration = \"short\" for snow, \"instantaneous\" for a wind gust)", strings.Join(def, ", "))
	}
	p.timberCorrelation()
}

// timberCorrelation correlates a random strength and modulus of timber
// that the study leaves uncorrelated (TimberCorrelation).
func (p *parser) timberCorrelation() {
	st := p.st
	if st.Yield == nil || st.Modulus == nil || !st.Yield.Random() || !st.Modulus.Random() {
		return
	}
	if st.Yield.Dist != nil && st.Yield.Dist.StdDev() == 0 {
		return
	}
	for _, c := range st.Corr {
		if c.A == st.Yield.Path && c.B == st.Modulus.Path || c.B == st.Yield.Path && c.A == st.Modulus.Path {
			return
		}
	}
	if st.Yield.update != nil || st.Modulus.update != nil {
		return // a measured quantity may have no finite variance
	}
	st.Corr = append(st.Corr, sim.Correlation{A: st.Yield.Path, B: st.Modulus.Path, Rho: TimberCorrelation})
	p.defaultf("correlation: material.strength and material.modulus of timber are correlated with rho = %g (JCSS Probabilistic Model Code Part 3.5, compression strength with modulus); give a [[correlation]] pair to change it", TimberCorrelation)
}

// checkStainless checks a stainless study.
func (p *parser) checkStainless() {
	st := p.st
	ms := &st.Material
	if ms.Exponent == 0 {
		ms.Exponent = 7
		if st.ModelTraits().Ultimate {
			p.defaultf("material.exponent: not given; n = 7, austenitic grades (EN 1993-1-4 Annex C, Table C.1; from memory)")
		}
	}
	if st.ModelTraits().Ultimate {
		if ms.Ultimate == nil {
			p.errorf("material.ultimate", "missing: the ultimate beam-column of stainless steel follows the compound Ramberg-Osgood law (EN 1993-1-4 Annex C), which needs the ultimate strength f_u, e.g. ultimate = \"530 MPa\"")
		} else if nominalValue(ms.Ultimate, 0) <= nominalValue(st.Yield, 0) {
			p.errorf("material.ultimate", "the ultimate strength must exceed the 0.2 %% proof stress material.yield")
		}
		if st.Residual != column.ResidualNone {
			p.warnf("capacity.residual_stress (line %d): the residual stress patterns are those of carbon steel; stainless sections differ", p.line("capacity.residual_stress"))
		}
	}
}

// checkAluminium checks an aluminium study: a welded section (fabrication
// welded) needs the strength ratio of its heat-affected zones.
func (p *parser) checkAluminium() {
	st := p.st
	ms := &st.Material
	sec := &st.Section
	_, written := p.lines["member.section.fabrication"]
	if sec.Shape == column.ShapeI && !written && sec.Fabrication == column.Welded {
		// An aluminium I is extruded unless the study says welded.
		sec.Fabrication = column.HotRolled
		for i, d := range st.Defaults {
			if strings.HasPrefix(d, "member.section.fabrication:") {
				st.Defaults[i] = "member.section.fabrication: not given; the aluminium I is taken as extruded, without welds (write fabrication = \"welded\" for one welded from plates: its heat-affected zones then count)"
			}
		}
	}
	if st.Model.kernel() == kernelBeam && st.Limit == column.UltimateLimit {
		p.warnf("material.kind (line %d): the ultimate beam-column of aluminium takes elastic-perfectly-plastic fibres at f_o; the continuous stress-strain law of EN 1999-1-1 Annex E is not modelled, so the capacity near f_o may be overestimated", p.line("material.kind"))
		if st.Residual != column.ResidualNone {
			p.warnf("capacity.residual_stress (line %d): the residual stress patterns are those of carbon steel; aluminium sections differ", p.line("capacity.residual_stress"))
		}
	}
	welded := sec.Fabrication == column.Welded && (sec.Shape == column.ShapeI || sec.Shape == column.ShapeRHS)
	if !welded {
		for _, k := range []string{"haz_factor", "haz_width"} {
			if _, ok := p.lines["material."+k]; ok {
				p.errorf("material."+k, "the heat-affected zone is that of longitudinal welds: it applies to a welded I or RHS (member.section.fabrication = \"welded\"); remove it")
			}
		}
		return
	}
	if ms.HAZFactor == nil {
		p.errorf("material.haz_factor", "missing: a welded aluminium section needs the strength ratio rho_o,haz of its heat-affected zones (EN 1999-1-1 Table 3.2 for the alloy and temper, e.g. haz_factor = 0.48 for 6082-T6 plate)")
		return
	}
	if nominalValue(ms.HAZFactor, 0) > 1 {
		p.errorf("material.haz_factor", "rho_o,haz is the ratio of the heat-affected strength to f_o: at most 1")
	}
	if ms.HAZWidth == nil {
		t := nominalValue(sec.Dims["thickness"], 0)
		if sec.Shape == column.ShapeI {
			t = nominalValue(sec.Dims["flange"], 0)
		}
		w := column.HAZWidth(t)
		ms.HAZWidth = &Quantity{Path: "material.haz_width", Line: p.line("material"), Dim: Length, Value: w}
		p.defaultf("material.haz_width: not given; b_haz = %g mm for MIG welds of %g mm plate (EN 1999-1-1 6.1.6.3)", w, t)
	}
	if !st.ModelTraits().Curve {
		p.warnf("material.haz_factor (line %d): with model %q the heat-affected zones only bound the capacity by the cross-section resistance A1 f_o; the curve model also takes kappa of EN 1999-1-1 Table 6.5", p.line("material.haz_factor"), st.Model)
	}
}
