package study

import (
	"fmt"
	"math"
	"sort"
	"strings"

	"gonum.org/v1/gonum/stat/distuv"
	"strutrisk/sim"
)

// distSpec is a distribution table as parsed, its values in N, mm, MPa (or
// fractions of the member length where rel is set).
type distSpec struct {
	name    string
	set     []string // the parameter set used, in canonical order
	params  map[string]pval
	written string // "mean 205 GPa, cov 0.03"
	// period is what a load's distribution describes ("" when not given,
	// PointInTime, or a duration such as "1 year"), periodYears it in
	// years (0 unless a duration).
	period      string
	periodYears float64
	// companion and repetitions are what a variable load says for load
	// combinations (combination.go): the distribution it takes while
	// another load leads, and its number of independent pulses in the
	// reference period.
	companion   *Quantity
	repetitions int
	// duration is a timber load's load-duration class ("" when not
	// given; see loadDuration).
	duration string
}

// distSets lists, per distribution, its complete parameter sets; optional
// lists keys that may be added to any set.
var distSets = map[string][][]string{
	"normal":     {{"mean", "sd"}, {"mean", "cov"}},
	"lognormal":  {{"mean", "sd"}, {"mean", "cov"}, {"mu", "sigma"}, {"characteristic", "fractile", "cov"}},
	"gumbel":     {{"mean", "sd"}, {"mean", "cov"}, {"location", "scale"}},
	"weibull":    {{"shape", "scale"}, {"mean", "cov"}},
	"uniform":    {{"min", "max"}},
	"triangular": {{"min", "mode", "max"}},
	"gamma":      {{"mean", "sd"}, {"mean", "cov"}, {"shape", "scale"}},
	"fixed":      {{"value"}},
}

var distOptional = map[string][]string{"normal": {"lower", "upper"}}

// distNames are the accepted values of "dist", in the order of the docs.
var distNames = []string{"normal", "lognormal", "gumbel", "weibull", "uniform", "triangular", "gamma", "fixed"}

// plainParams are the parameters that are plain numbers whatever the
// quantity (the rest carry the quantity's dimension).
var plainParams = map[string]bool{"cov": true, "fractile": true, "mu": true, "sigma": true, "shape": true}

func setString(set []string) string { return strings.Join(set, " + ") }

// distTable reads a table with a "dist" key.
func (p *parser) distTable(path string, m map[string]any, o qopt) *distSpec {
	p.dists[path] = true
	dv, ok := m["dist"]
	if !ok {
		keys := sortedKeys(m)
		p.errorf(path, "a table here must be a distribution: add dist = \"normal\" (or %s); found keys %s", strings.Join(distNames[1:], ", "), strings.Join(keys, ", "))
		return nil
	}
	name, ok := dv.(string)
	if !ok {
		p.errorf(path+".dist", "dist must be text, one of %s", strings.Join(distNames, ", "))
		return nil
	}
	sets, ok := distSets[name]
	if !ok {
		msg := fmt.Sprintf("unknown distribution %q: use one of %s", name, strings.Join(distNames, ", "))
		if near, ok := nearest(name, distNames); ok {
			msg = fmt.Sprintf("unknown distribution %q; did you mean %q?", name, near)
		}
		p.errorf(path+".dist", "%s", msg)
		return nil
	}
	allowed := map[string]bool{}
	for _, s := range sets {
		for _, k := range s {
			allowed[k] = true
		}
	}
	for _, k := range distOptional[name] {
		allowed[k] = true
	}
	if o.period {
		allowed["period"] = true
		allowed["companion"] = true
		allowed["repetitions"] = true
		allowed["duration"] = true
	}
	spec := &distSpec{name: name, params: map[string]pval{}}
	given := map[string]bool{}
	bad := false
	for _, k := range sortedKeys(m) {
		kp := path + "." + k
		if k == "dist" {
			continue
		}
		if k == "duration" {
			var ok bool
			if spec.duration, ok = p.loadDuration(kp, m[k]); !ok { // materials.go
				bad = true
			}
			continue
		}
		if k == "period" {
			var ok bool
			if spec.period, spec.periodYears, ok = p.loadPeriod(kp, m[k], o); !ok {
				bad = true
			}
			continue
		}
		if o.period && (k == "companion" || k == "repetitions") {
			if !p.combinationKey(spec, kp, k, m[k], o) { // combination.go
				bad = true
			}
			continue
		}
		if !allowed[k] {
			msg := fmt.Sprintf("%s takes %s", name, allowedList(sets, distOptional[name]))
			if near, ok := nearest(k, sortedKeys(allowed)); ok {
				msg = fmt.Sprintf("unknown parameter; did you mean %q? (%s)", near, msg)
			} else {
				msg = fmt.Sprintf("unknown parameter (%s)", msg)
			}
			p.errorf(kp, "%s", msg)
			bad = true
			continue
		}
		given[k] = true
		po := qopt{dim: o.dim, rel: o.rel, frac: o.frac, inf: false}
		if plainParams[k] {
			po = qopt{dim: Dimensionless}
		}
		if _, isTable := m[k].(map[string]any); isTable {
			p.errorf(kp, "a distribution parameter must be a number, not a table")
			bad = true
			continue
		}
		pv, ok := p.scalar(kp, m[k], po)
		if !ok {
			bad = true
			continue
		}
		spec.params[k] = pv
	}
	if bad {
		return nil
	}
	// Exactly one complete set, and nothing beyond it and the optional keys.
	var match []string
	for _, s := range sets {
		complete := true
		for _, k := range s {
			if !given[k] {
				complete = false
			}
		}
		if complete && (match == nil || len(s) > len(match)) {
			match = s
		}
	}
	if match == nil {
		p.errorf(path, "%s needs %s", name, alternatives(sets))
		return nil
	}
	inSet := map[string]bool{}
	for _, k := range match {
		inSet[k] = true
	}
	for _, k := range distOptional[name] {
		inSet[k] = true
	}
	var extra []string
	for k := range given {
		if !inSet[k] {
			extra = append(extra, k)
		}
	}
	if len(extra) > 0 {
		sort.Strings(extra)
		p.errorf(path, "give one set of parameters for %s (%s), not also %s", name, alternatives(sets), strings.Join(extra, ", "))
		return nil
	}
	spec.set = match
	var w []string
	for _, k := range append(append([]string{}, match...), distOptional[name]...) {
		if v, ok := m[k]; ok {
			w = append(w, fmt.Sprintf("%s %v", k, v))
		}
	}
	if spec.period != "" {
		w = append(w, "period "+spec.period)
	}
	if spec.repetitions > 0 {
		w = append(w, fmt.Sprintf("repetitions %d", spec.repetitions))
	}
	spec.written = strings.Join(w, ", ")
	if !p.checkParams(path, spec, o) {
		return nil
	}
	return spec
}

func allowedList(sets [][]string, optional []string) string {
	s := alternatives(sets)
	if len(optional) > 0 {
		s += ", optionally " + strings.Join(optional, ", ")
	}
	return s
}

func alternatives(sets [][]string) string {
	parts := make([]string, len(sets))
	for i, s := range sets {
		parts[i] = setString(s)
	}
	return strings.Join(parts, " or ")
}

func sortedKeys[V any](m map[string]V) []string {
	keys := make([]string, 0, len(m))
	for k := range m {
		keys = append(keys, k)
	}
	sort.Strings(keys)
	return keys
}

// checkParams checks the values of a distribution's parameters.
func (p *parser) checkParams(path string, s *distSpec, o qopt) bool {
	ok := true
	get := func(k string) (float64, bool) { v, has := s.params[k]; return v.v, has }
	fail := func(k, format string, args ...any) {
		p.errorf(path+"."+k, format, args...)
		ok = false
	}
	if v, has := get("cov"); has {
		switch {
		case v == 0:
			fail("cov", "cov = 0 is no spread: write a plain quantity instead of a distribution")
		case !(v > 0 && v <= 1):
			fail("cov", "cov = %g must be between 0 and 1 (a fraction: 0.10 for 10 %%)", v)
		}
	}
	if v, has := get("sd"); has {
		switch {
		case v == 0:
			fail("sd", "sd = 0 is no spread: write a plain quantity instead of a distribution")
		case !(v > 0):
			fail("sd", "sd = %s must be positive", p.show(v, o.dim))
		}
	}
	if v, has := get("fractile"); has && !(v > 0 && v < 1) {
		fail("fractile", "fractile = %g must be between 0 and 1 exclusive (e.g. 0.05 for a 5 %% characteristic value)", v)
	}
	for _, k := range []string{"sigma", "shape", "scale"} {
		if v, has := get(k); has && !(v > 0) {
			if v == 0 && k == "sigma" {
				fail(k, "sigma = 0 is no spread: write a plain quantity instead of a distribution")
				continue
			}
			fail(k, "%s = %g must be positive", k, v)
		}
	}
	if v, has := get("characteristic"); has && !(v > 0) {
		fail("characteristic", "characteristic = %s must be positive (a lognormal variable is positive)", p.show(v, o.dim))
	}
	if v, has := get("mean"); has {
		switch s.name {
		case "lognormal", "weibull", "gamma":
			if !(v > 0) {
				fail("mean", "mean = %s must be positive (a %s variable is positive)", p.show(v, o.dim), s.name)
			}
		default:
			if _, cov := get("cov"); cov && v == 0 {
				fail("cov", "cov needs a non-zero mean: give sd instead")
			}
		}
	}
	if lo, has := get("min"); has {
		hi, _ := get("max")
		switch {
		case lo == hi:
			fail("min", "min = max = %s is no spread: write a plain quantity instead of a distribution", p.show(lo, o.dim))
		case lo > hi:
			fail("min", "min = %s must be less than max = %s", p.show(lo, o.dim), p.show(hi, o.dim))
		case s.name == "triangular":
			if md, _ := get("mode"); md < lo || md > hi {
				fail("mode", "mode = %s must lie between min and max", p.show(md, o.dim))
			}
		}
	}
	if lo, has := get("lower"); has {
		if hi, has := get("upper"); has && !(lo < hi) {
			fail("lower", "lower = %s must be less than upper = %s", p.show(lo, o.dim), p.show(hi, o.dim))
		}
	}
	// Values written relative to L and absolute values mix only when the
	// length is fixed; checked when the length is known.
	return ok
}

// resolve turns L/n values of a quantity into millimetres when the member
// length is fixed (length > 0), or checks that they can stay fractions of
// a random length (length = 0).
func (p *parser) resolve(q *Quantity, length float64) {
	if q == nil {
		return
	}
	if p.resolveLcr(q) {
		return
	}
	if q.spec == nil {
		if q.Relative && length > 0 {
			q.Value *= length
			q.Relative = false
			q.perLength = true
		}
		return
	}
	rel, abs := false, false
	for k, v := range q.spec.params {
		if plainParams[k] {
			continue
		}
		if v.rel {
			rel = true
		} else if v.v != 0 {
			abs = true
		}
	}
	if !rel {
		return
	}
	if length > 0 {
		for k, v := range q.spec.params {
			if v.rel {
				q.spec.params[k] = pval{v: v.v * length}
			}
		}
		q.perLength = !abs
		return
	}
	if abs {
		p.errorf(q.Path, "mixes L/n and absolute lengths while member.length is random: write every length of this distribution as L/n, or every one with a unit")
		return
	}
	for k, v := range q.spec.params {
		v.rel = false
		q.spec.params[k] = v
	}
	q.Relative = true
}

// build makes the distribution of a random quantity and checks its
// support against what the quantity may physically be.
func (p *parser) build(q *Quantity, o qopt) {
	if q == nil || q.spec == nil {
		return
	}
	s := q.spec
	v := func(k string) float64 { return s.params[k].v }
	has := func(k string) bool { _, ok := s.params[k]; return ok }
	sdOf := func() float64 {
		if has("sd") {
			return v("sd")
		}
		return v("cov") * math.Abs(v("mean"))
	}
	var d sim.Dist
	var err error
	switch s.name {
	case "normal":
		lo, hi := math.Inf(-1), math.Inf(1)
		if has("lower") {
			lo = v("lower")
		}
		if has("upper") {
			hi = v("upper")
		}
		if o.need != anyValue && lo < 0 {
			if has("lower") {
				p.errorf(q.Path+".lower", "lower = %s lets %s take negative values: make it 0 or more", p.show(lo, q.Dim), q.Path)
				return
			}
			// A normal variable that must be positive: truncate at zero when
			// the cut-off mass matters, and say so.
			pr := distuv.Normal{Mu: v("mean"), Sigma: sdOf()}.CDF(0)
			if pr > negligible {
				lo = 0
				p.warnf("%s: a normal distribution can go negative here (P = %.2g); it is truncated at 0 — give lower = 0 to say so, or use a lognormal", q.Path, pr)
			}
		}
		if math.IsInf(lo, -1) && math.IsInf(hi, 1) {
			d, err = sim.NewNormal(v("mean"), sdOf())
		} else {
			d, err = sim.NewTruncNormal(v("mean"), sdOf(), lo, hi)
		}
	case "lognormal":
		switch {
		case has("mu"):
			// mu is of ln X in the study's units: shift to internal units.
			d, err = sim.NewLognormalLog(v("mu")+math.Log(p.sys.Factor(q.Dim)), v("sigma"))
		case has("characteristic"):
			d, err = sim.NewLognormalChar(v("characteristic"), v("fractile"), v("cov"))
		default:
			d, err = sim.NewLognormal(v("mean"), sdOf())
		}
	case "gumbel":
		if has("location") {
			d, err = sim.NewGumbelLoc(v("location"), v("scale"))
		} else {
			d, err = sim.NewGumbel(v("mean"), sdOf())
		}
	case "weibull":
		if has("shape") {
			d, err = sim.NewWeibull(v("shape"), v("scale"))
		} else {
			d, err = sim.NewWeibullMean(v("mean"), v("cov"))
		}
	case "uniform":
		d, err = sim.NewUniform(v("min"), v("max"))
	case "triangular":
		d, err = sim.NewTriangular(v("min"), v("mode"), v("max"))
	case "gamma":
		if has("shape") {
			d, err = sim.NewGammaShape(v("shape"), v("scale"))
		} else {
			d, err = sim.NewGamma(v("mean"), sdOf())
		}
	}
	if err != nil {
		p.errorf(q.Path, "%v", err)
		return
	}
	if o.need != anyValue {
		lowest := d.Quantile(0)
		bad := lowest < 0 || o.need == positive && lowest == 0 && s.name != "lognormal" && s.name != "weibull" && s.name != "gamma" && s.name != "normal"
		if bad {
			switch s.name {
			case "uniform", "triangular":
				p.errorf(q.Path+".min", "min = %s lets %s take values that are not %s: raise min", p.show(lowest, q.Dim), q.Path, o.need)
				return
			case "gumbel":
				if pr := d.CDF(0); pr > negligible {
					p.errorf(q.Path, "this gumbel distribution goes negative with probability %.2g but %s must be %s: use a lognormal or a truncated normal", pr, q.Path, o.need)
					return
				}
			}
		}
	}
	if math.IsNaN(d.Mean()) || math.IsInf(d.Mean(), 0) || math.IsNaN(d.StdDev()) {
		p.errorf(q.Path, "the distribution has no finite mean and spread: check its parameters")
		return
	}
	if !p.distInRange(q, d, o) {
		return
	}
	q.Dist = d
}

// negligible is the probability of non-physical values below which a
// distribution is left as written.
const negligible = 1e-12
