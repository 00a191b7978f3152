package study

import (
	"fmt"
	"math"
	"strings"

	"strutrisk/internal/assess"
	"strutrisk/sim"
)

// NormaliseDesign is the value of code_check.normalise that scales the
// loads of each case so that its design load equals its design
// resistance.
const NormaliseDesign = "design"

// normaliseKeys reads code_check.normalise and code_check.load_ratio.
func (p *parser) normaliseKeys(t *table) {
	cs := &p.st.CodeCheck
	cs.LoadRatio = -1
	if s, ok := p.choice(t, "normalise", choicesOf("code_check", "normalise")); ok && s != "none" {
		cs.Normalise = s
	}
	x, ok := p.number(t, "load_ratio")
	if !ok {
		return
	}
	switch {
	case !(x >= 0 && x <= 1):
		p.errorf(t.key("load_ratio"), "load_ratio = %g is outside 0 to 1 (the variable share of the characteristic loads, e.g. 0.5)", x)
	case cs.Normalise == "":
		p.errorf(t.key("load_ratio"), "load_ratio applies only with normalise = \"design\": add it, or remove load_ratio")
	default:
		cs.LoadRatio = x
	}
}

// normaliseLoads scales the loads of the study, when code_check.normalise
// = "design", so that the design load of EN 1990 expression 6.10 (6.3.2,
// with the study's partial factors) equals the design resistance of the
// code check (EN 1993-1-1 6.3.1): the usual set-up of code-calibration
// studies, so that beta is comparable across slenderness, sections and
// models. With load_ratio the characteristic loads are first put in that
// proportion: the variable loads make load_ratio of their sum. Each load
// is scaled with its whole distribution (its CoV stays).
func (p *parser) normaliseLoads() {
	st := p.st
	cs := &st.CodeCheck
	if cs.Normalise != NormaliseDesign {
		return
	}
	key := "code_check.normalise"
	switch {
	case st.Bending != nil:
		p.errorf(key, "normalise = \"design\" scales axial loads; a [bending] study has no single design resistance to scale them to")
		return
	case st.Combination != nil:
		p.errorf(key, "normalise = \"design\" cannot be used with a [combination] of random variable loads: give the loads without it")
		return
	case st.Life != nil:
		p.errorf(key, "normalise = \"design\" cannot be used with [life]")
		return
	}
	md, err := Build(st)
	if err != nil {
		p.errorf(key, "cannot build the model to normalise the loads: %v", err)
		return
	}
	c, err := md.CodeCheck()
	if err != nil {
		p.errorf(key, "the loads cannot be normalised: the code check is not made: %v", err)
		return
	}
	scale, err := designScales(c, cs.LoadRatio)
	if err != nil {
		p.errorf(key, "%v", err)
		return
	}
	var text []string
	for i, q := range st.Loads {
		s := scale[i]
		if q.Dist != nil {
			q.Dist = scaledDist{d: q.Dist, k: s}
			q.Params = fmt.Sprintf("%s, times %.4g", q.Params, s)
		} else {
			q.Value *= s
		}
		if x, ok := cs.Characteristic[q.Path]; ok {
			cs.Characteristic[q.Path] = x * s
		}
		text = append(text, fmt.Sprintf("%s x %.4g (characteristic %.4g kN)", q.Path, s, c.Loads[i].Characteristic*s/1e3))
	}
	cs.NormalisedResistance = c.Resistance
	p.defaultf("code_check.normalise = \"design\": the loads are scaled so that the design load equals the design resistance %.4g kN: %s", c.Resistance/1e3, strings.Join(text, ", "))
	if c.AxialOnly {
		p.warnf("code_check.normalise: the member also bends, but the design resistance that sets the loads is the axial one of EN 1993-1-1 6.3.1")
	}
}

// designScales returns the factor of each load of the code check c that
// makes the design load equal the design resistance; with ratio >= 0 the
// variable loads first make that share of the characteristic loads.
func designScales(c *CodeCheck, ratio float64) ([]float64, error) {
	f := make([]float64, len(c.Loads))
	var g, q float64
	for _, l := range c.Loads {
		if !(l.Characteristic > 0) {
			return nil, fmt.Errorf("load %s has the characteristic value %g: normalising needs positive loads", l.Name, l.Characteristic)
		}
		if l.Permanent {
			g += l.Characteristic
		} else {
			q += l.Characteristic
		}
	}
	switch {
	case ratio > 0 && q == 0:
		return nil, fmt.Errorf("load_ratio = %g asks for a variable share but every load is permanent", ratio)
	case ratio >= 0 && ratio < 1 && g == 0:
		return nil, fmt.Errorf("load_ratio = %g asks for a permanent share but no load is permanent (name it in target.permanent)", ratio)
	}
	loads := append([]assess.Load(nil), c.Loads...)
	for i, l := range c.Loads {
		f[i] = 1
		switch {
		case ratio < 0:
		case l.Permanent:
			f[i] = (1 - ratio) / g
		default:
			f[i] = ratio / q
		}
		loads[i].Characteristic = l.Characteristic * f[i]
	}
	comb, err := assess.DesignLoad(loads, c.Factors)
	if err != nil {
		return nil, err
	}
	// The design load is homogeneous of degree one in the loads.
	ed := c.EffectFactor * comb.Design
	if !(ed > 0) || math.IsInf(ed, 0) {
		return nil, fmt.Errorf("the design load %g N is not a positive number", ed)
	}
	t := c.Resistance / ed
	for i := range f {
		f[i] *= t
	}
	return f, nil
}

// scaledDist is a distribution times a positive factor k: a load scaled
// by normalisation, its CoV unchanged.
type scaledDist struct {
	d sim.Dist
	k float64
}

func (s scaledDist) CDF(x float64) float64      { return s.d.CDF(x / s.k) }
func (s scaledDist) Survival(x float64) float64 { return s.d.Survival(x / s.k) }
func (s scaledDist) Quantile(p float64) float64 { return s.k * s.d.Quantile(p) }
func (s scaledDist) Prob(x float64) float64     { return s.d.Prob(x/s.k) / s.k }
func (s scaledDist) Mean() float64              { return s.k * s.d.Mean() }
func (s scaledDist) StdDev() float64            { return s.k * s.d.StdDev() }
func (s scaledDist) FromStdNormal(u float64) float64 {
	return s.k * s.d.FromStdNormal(u)
}
func (s scaledDist) ToStdNormal(x float64) float64 { return s.d.ToStdNormal(x / s.k) }
func (s scaledDist) String() string {
	return fmt.Sprintf("%.4g x %s", s.k, s.d.String())
}

// normalisedCheck states in the code check c of a study whose loads were
// normalised that the utilisation is 1 by construction: the rounding of
// the scaled loads (a few parts in 1e16) does not decide its verdict.
func normalisedCheck(c *CodeCheck, cs CodeCheckSpec) {
	if cs.NormalisedResistance <= 0 {
		return
	}
	if math.Abs(c.Utilisation-1) < 1e-9 {
		c.Utilisation = 1
		c.DesignLoad = c.Resistance
	}
	c.Notes = append(c.Notes, "The loads are normalised (code_check.normalise = \"design\"): the design load equals the design resistance by construction.")
}
