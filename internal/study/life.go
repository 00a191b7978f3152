package study

import (
	"fmt"
	"math"

	"strutrisk/internal/assess"
	"strutrisk/sim"
)

// LifeSpec is the [life] table: the remaining life of the member under
// corrosion. The section loses d(t) = r t^b from every face in addition
// to member.section.thickness_loss (the loss found today), t counted in
// years from now (ISO 9224's law, restarted now: for b <= 1 this is no less
// than the further loss of a member that has already corroded).
type LifeSpec struct {
	// Years is the horizon; Step the years between evaluations (whole
	// years, Step <= Years).
	Years, Step int
	// Rate is r, the loss of the first year (mm); Exponent b (nil: 1).
	Rate, Exponent *Quantity
	// Paths is the number of member paths sampled.
	Paths int
	// Annual are the study's random variable loads with the
	// distributions of their annual maxima (filled once the loads are
	// built, see lifeBuild).
	Annual []LifeLoad
}

// LifeLoad is a variable load of the remaining life: the distribution of
// its annual maxima and how it was found.
type LifeLoad struct {
	Path  string
	Dist  sim.Dist
	Basis string
}

// Life defaults and bounds.
const (
	DefaultLifePaths = 20_000
	maxLifeYears     = 500
	maxLifePaths     = 10_000_000
	// maxLifeRate (mm) is the first-year loss beyond which a rate is
	// warned of.
	maxLifeRate = 1.0
)

// life reads [life].
func (p *parser) life(top *table) {
	t := p.sub(top, "life")
	if t == nil {
		return
	}
	ls := &LifeSpec{Step: 1, Paths: DefaultLifePaths}
	if y, ok := p.lifeYears(t, "years"); ok {
		ls.Years = y
	} else if _, given := t.m["years"]; !given {
		p.required(t, "years", "the horizon of the remaining life, e.g. years = 30")
	}
	if s, ok := p.lifeYears(t, "step"); ok {
		ls.Step = s
		if ls.Years > 0 && s > ls.Years {
			p.errorf(t.key("step"), "step = %d years is longer than years = %d: lower it", s, ls.Years)
		}
	} else if _, given := t.m["step"]; !given {
		p.defaultf("life.step: not given; the member is evaluated every year")
	}
	ls.Rate = p.quantity(t.key("corrosion_rate"), t.m["corrosion_rate"], lifeRateOpt)
	t.used["corrosion_rate"] = true
	if _, given := t.m["corrosion_rate"]; !given {
		p.required(t, "corrosion_rate", "the loss from every face in the first year, e.g. corrosion_rate = \"0.05 mm\"")
	}
	if v, given := t.m["corrosion_exponent"]; given {
		ls.Exponent = p.quantity(t.key("corrosion_exponent"), v, lifeExponentOpt)
		t.used["corrosion_exponent"] = true
	} else {
		p.defaultf("life.corrosion_exponent: not given; b = 1, a loss growing linearly with time (ISO 9224 gives exponents below 1 for most atmospheres, so b = 1 errs on the safe side after the first year)")
	}
	if n, ok := p.count(t, "samples", maxLifePaths); ok {
		ls.Paths = int(n)
		if n < 100 {
			p.errorf(t.key("samples"), "samples = %g member paths are too few: give at least 100", n)
		}
	} else if _, given := t.m["samples"]; !given {
		p.defaultf("life.samples: not given; %d member paths", DefaultLifePaths)
	}
	if p.st.Section.Name == "custom" {
		p.errorf("life", "a custom section has no faces to lose thickness from, so [life] cannot follow its corrosion: give the section by its shape and dimensions")
	}
	p.unknown(t)
	p.st.Life = ls
}

var (
	lifeRateOpt     = qopt{dim: Length, need: nonNegative}
	lifeExponentOpt = qopt{dim: Dimensionless, need: positive}
)

// lifeYears reads a whole number of years, given as a number (30) or a
// duration ("30 years").
func (p *parser) lifeYears(t *table, key string) (int, bool) {
	v, ok := t.get(key)
	if !ok {
		return 0, false
	}
	var y float64
	switch x := v.(type) {
	case int64:
		y = float64(x)
	case float64:
		y = x
	case string:
		d, err := assess.ParseYears(x)
		if err != nil {
			p.errorf(t.key(key), "%v", err)
			return 0, false
		}
		y = d
	default:
		p.errorf(t.key(key), "must be a whole number of years (30) or a duration (\"30 years\"), not %s", tomlType(v))
		return 0, false
	}
	r := math.Round(y)
	switch {
	case math.Abs(y-r) > 1e-9*max(1, r) || r < 1:
		p.errorf(t.key(key), "%v is not a whole number of years of at least 1: the member is evaluated year by year", v)
	case r > maxLifeYears:
		p.errorf(t.key(key), "%v is more than %d years: lower it", v, maxLifeYears)
	default:
		return int(r), true
	}
	return 0, false
}

// lifeBuild builds the loss law's distributions and finds the annual
// maxima of the random variable loads, once the loads are built and
// converted to the reference period (period.go).
func (p *parser) lifeBuild() {
	ls := p.st.Life
	if ls == nil {
		return
	}
	p.build(ls.Rate, lifeRateOpt)
	p.build(ls.Exponent, lifeExponentOpt)
	if b := ls.Exponent; b != nil && !b.Random() && (b.Value > 1.5) {
		p.warnf("life.corrosion_exponent (line %d): b = %g: the loss grows faster than linearly with time; ISO 9224 exponents are below 1 (check the value)", b.Line, b.Value)
	}
	if r := meanOf(ls.Rate, 0); r > maxLifeRate {
		p.warnf("life.corrosion_rate (line %d): %g mm from every face in the first year is more than %g mm, past the most corrosive atmospheres of ISO 9223 (common practice); a bare number is read in the study's length unit (%s): did you mean mm?",
			ls.Rate.Line, r, maxLifeRate, p.sys.unit[Length])
	}
	for _, q := range p.st.Loads {
		if !q.Random() || isPermanentPath(p.st, q.Path) {
			continue
		}
		d, basis, err := annualMaxima(q, p.st.ReferenceYears)
		if err != nil {
			key := q.Path
			if q.Period != "" {
				key += ".period"
			}
			p.errorf(key, "%v", err)
			continue
		}
		ls.Annual = append(ls.Annual, LifeLoad{Path: q.Path, Dist: d, Basis: basis})
	}
	if len(ls.Annual) > 1 {
		p.warnf("life: the annual maxima of the %d variable loads are added in every year (no combination rule within a year): on the safe side, as their maxima rarely meet", len(ls.Annual))
	}
}

// lifeCorrelation refuses a correlation with a load whose annual maxima
// [life] draws independently, once the correlations are read.
func (p *parser) lifeCorrelation() {
	ls := p.st.Life
	if ls == nil {
		return
	}
	for _, c := range p.st.Corr {
		for _, a := range ls.Annual {
			if c.A == a.Path || c.B == a.Path {
				p.errorf("correlation", "%s is correlated with another input, but [life] draws its annual maxima independently of the member and of each other year: remove the correlation or the [life] table", a.Path)
			}
		}
	}
}

// annualMaxima returns the distribution of the annual maxima of the
// variable load q, ref the reference period in years (0 when unknown).
func annualMaxima(q *Quantity, ref float64) (sim.Dist, string, error) {
	if q.Period == PointInTime && q.Repetitions > 0 && ref > 0 {
		// Pulses: Repetitions independent pulses over the reference period.
		pulse := q.Dist
		if q.Written != nil {
			pulse = q.Written
		}
		n := float64(q.Repetitions) / ref
		a, err := sim.MaximumOf(pulse, n)
		if err != nil {
			return nil, "", fmt.Errorf("%s has %d pulses in %s, fewer than one a year: only a gumbel pulse converts to annual maxima; give the distribution of its annual maxima with period = \"1 year\"", q.Path, q.Repetitions, assess.YearsText(ref))
		}
		return a, fmt.Sprintf("annual maxima of %g independent pulses a year (%d in %s)", n, q.Repetitions, assess.YearsText(ref)), nil
	}
	if q.Period == PointInTime {
		return nil, "", fmt.Errorf("[life] needs the annual maxima of %s, not its point-in-time value: give the distribution of its annual maxima with period = \"1 year\"", q.Path)
	}
	d, years := q.Dist, q.MaximaYears(ref)
	if q.MaximaN != 0 && q.Written != nil {
		d, years = q.Written, q.PeriodYears
	}
	from := "as written"
	switch {
	case q.Period == "" && !(ref > 0):
		return nil, "", fmt.Errorf("[life] needs the annual maxima of %s: give period = \"1 year\" with the distribution of its annual maxima (or target.reference_period as a duration, the period its maxima are of)", q.Path)
	case q.Period == "":
		from = fmt.Sprintf("maxima over the reference period of %s", assess.YearsText(ref))
	default:
		from = "maxima over " + q.Period
	}
	if years == 1 {
		return d, "annual maxima as written", nil
	}
	a, err := sim.MaximumOf(d, 1/years)
	if err != nil {
		return nil, "", fmt.Errorf("%s describes %s: only a gumbel converts to annual maxima; give the distribution of its annual maxima with period = \"1 year\"", q.Path, from)
	}
	if _, gumbel := d.(sim.Gumbel); gumbel {
		return a, fmt.Sprintf("annual maxima from the gumbel of %s: the same scale, the location lowered by scale ln %g", from, years), nil
	}
	return a, fmt.Sprintf("annual maxima from %s by F^(1/%g), independent years", from, years), nil
}
