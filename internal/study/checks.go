package study

import (
	"fmt"
	"math"
	"strings"

	"gonum.org/v1/gonum/mat"

	"strutrisk/internal/column"
	"strutrisk/sim"
)

// methodOf returns the method named s, a choice the key registry (which
// lists sim.Methods) has already accepted.
func methodOf(s string) sim.Method {
	m, _ := sim.ParseMethod(s)
	return m
}

func endsK(name string) (float64, error) { return column.EndsK(name) }

// correlation reads the [[correlation]] tables once every variable is
// known, and checks the matrix.
func (p *parser) correlation(top *table) {
	v, ok := top.get("correlation")
	if !ok {
		return
	}
	list, ok := v.([]map[string]any)
	if !ok {
		p.errorf("correlation", "write correlations as [[correlation]] tables with pair = [\"a\", \"b\"] and rho")
		return
	}
	random := map[string]bool{}
	var names []string
	for _, q := range p.st.Quantities {
		if q.Random() {
			random[q.Path] = true
			names = append(names, q.Path)
		}
	}
	seen := map[[2]string]string{}
	for i, m := range list {
		t := &table{path: fmt.Sprintf("correlation[%d]", i), m: m, used: map[string]bool{}}
		var pair [2]string
		good := true
		if pv, ok := t.get("pair"); ok {
			l, isList := pv.([]any)
			if !isList || len(l) != 2 {
				p.errorf(t.key("pair"), "pair names two random variables, e.g. pair = [\"material.yield\", \"material.modulus\"]")
				good = false
			} else {
				for j, x := range l {
					s, _ := x.(string)
					pair[j] = s
					key := t.key("pair")
					switch {
					case p.st.Combination.replaces(p.byPath[s]):
						p.errorf(key, "%q is combined into %s by combination.rule = %q: correlate %s instead", s, CombinedPath, FerryBorges, CombinedPath)
						good = false
					case random[s]:
					case p.byPath[s] != nil:
						p.errorf(key, "%q is a fixed quantity, not a random variable: a correlation needs two random variables", s)
						good = false
					default:
						if near, ok := nearest(s, names); ok {
							p.errorf(key, "%q is not a random variable of this study; did you mean %q?", s, near)
						} else if len(names) > 0 {
							p.errorf(key, "%q is not a random variable of this study (they are %s)", s, strings.Join(names, ", "))
						} else {
							p.errorf(key, "%q is not a random variable: this study has none", s)
						}
						good = false
					}
				}
				if good && pair[0] == pair[1] {
					p.errorf(t.key("pair"), "a variable is not correlated with itself: name two different variables")
					good = false
				}
			}
		} else {
			p.required(t, "pair", "pair = [\"a\", \"b\"] naming two random variables")
			good = false
		}
		rho, ok := p.number(t, "rho")
		if !ok {
			if _, given := m["rho"]; !given {
				p.required(t, "rho", "the correlation coefficient, between -1 and 1")
			}
			good = false
		} else if !(rho > -1 && rho < 1) {
			p.errorf(t.key("rho"), "rho = %g must lie strictly between -1 and 1 (a correlation of ±1 means one variable: write it once)", rho)
			good = false
		}
		p.unknown(t)
		if !good {
			continue
		}
		k := pair
		if k[0] > k[1] {
			k[0], k[1] = k[1], k[0]
		}
		if prev, dup := seen[k]; dup {
			p.errorf(t.path, "the pair %s, %s is already correlated in %s: give it once", pair[0], pair[1], prev)
			continue
		}
		seen[k] = t.path
		if rho != 0 {
			c := sim.Correlation{A: pair[0], B: pair[1], Rho: rho}
			if err := p.reachable(c); err != nil {
				p.errorf(t.key("rho"), "%v", err)
				continue
			}
			p.st.Corr = append(p.st.Corr, c)
		}
	}
	if len(p.st.Corr) == 0 || len(p.probs) > 0 {
		return
	}
	// The matrix of the given coefficients must be positive definite.
	idx := map[string]int{}
	for _, c := range p.st.Corr {
		for _, n := range []string{c.A, c.B} {
			if _, ok := idx[n]; !ok {
				idx[n] = len(idx)
			}
		}
	}
	r := mat.NewSymDense(len(idx), nil)
	for i := range len(idx) {
		r.SetSym(i, i, 1)
	}
	for _, c := range p.st.Corr {
		r.SetSym(idx[c.A], idx[c.B], c.Rho)
	}
	var ch mat.Cholesky
	if !ch.Factorize(r) {
		p.errorf("correlation", "the correlation coefficients do not form a positive definite matrix (they contradict each other): lower the largest ones")
		return
	}
	// The coefficients are of the variables themselves: in normal space
	// (Nataf) they change, and that matrix must be positive definite too.
	m := &sim.Model{Corr: p.st.Corr}
	for _, q := range p.st.Quantities {
		if q.Random() && isCorrelated(q.Path, p.st.Corr) {
			m.Vars = append(m.Vars, sim.Variable{Name: q.Path, Dist: q.Dist})
		}
	}
	if _, err := sim.NewTransform(m); err != nil {
		p.errorf("correlation", "%s: lower the largest coefficients", strings.TrimPrefix(err.Error(), "sim: "))
	}
}

// reachable reports whether the correlation c can be reached by its two
// variables with their marginal distributions (through the Gaussian copula
// the attainable range of a correlation is narrower than (-1, 1), e.g. for
// two skewed lognormals).
func (p *parser) reachable(c sim.Correlation) error {
	m := &sim.Model{Corr: []sim.Correlation{c}}
	for _, q := range p.st.Quantities {
		if q.Random() && (q.Path == c.A || q.Path == c.B) {
			m.Vars = append(m.Vars, sim.Variable{Name: q.Path, Dist: q.Dist})
		}
	}
	if len(m.Vars) != 2 {
		return nil
	}
	_, err := sim.NewTransform(m)
	if err == nil {
		return nil
	}
	msg := err.Error()
	if i := strings.LastIndex(msg, ": "); i >= 0 {
		msg = msg[i+2:]
	}
	return fmt.Errorf("%s: rho is the correlation of the variables themselves, and their distributions bound it", msg)
}

// isCorrelated reports whether the variable named path is in a correlation.
func isCorrelated(path string, corr []sim.Correlation) bool {
	for _, c := range corr {
		if c.A == path || c.B == path {
			return true
		}
	}
	return false
}

// checkModel checks what the capacity model needs from the rest of the
// study.
func (p *parser) checkModel() {
	if p.st.Model != nil {
		p.st.Model.check(p)
	}
}

// checkSection computes the section at nominal values to catch
// impossible dimensions before sampling.
func (p *parser) checkSection() {
	st := p.st
	if st.Section.Dims == nil {
		return
	}
	sec := st.Section.at(func(q *Quantity) float64 { return nominalValue(q, 0) })
	if st.Section.Shape == column.ShapeCustom {
		imaj, imin := st.Section.Dims["i_major"], st.Section.Dims["i_minor"]
		if ea, a := st.Section.Dims["effective_area"], st.Section.Dims["area"]; ea != nil && a != nil && nominalValue(ea, 0) > nominalValue(a, 0) {
			p.errorf(ea.Path, "effective_area %g mm2 is larger than area %g mm2: give the effective area of the class 4 section, at most its area", nominalValue(ea, 0), nominalValue(a, 0))
			return
		}
		if imaj != nil && imin != nil && nominalValue(imin, 0) > nominalValue(imaj, 0) {
			p.errorf(imin.Path, "i_minor is larger than i_major: the major axis is the stiffer one, swap them (and c_major, c_minor)")
			return
		}
	}
	if _, err := sec.Properties(); err != nil {
		p.errorf("member.section", "%v", strings.TrimPrefix(err.Error(), "column: "))
	}
	for _, d := range sectionDims {
		q := st.Section.Dims[d.info.Name]
		if !d.ranged || q == nil || !q.Random() {
			continue
		}
		// A random dimension must keep the section valid over its range.
		for _, pr := range []float64{1e-6, 1 - 1e-6} {
			s := st.Section.at(func(x *Quantity) float64 {
				if x == q {
					return q.Dist.Quantile(pr)
				}
				return nominalValue(x, 0)
			})
			if _, err := s.Properties(); err != nil {
				p.errorf(q.Path, "the section becomes impossible within this distribution (at its %g fractile: %v): narrow it", pr, strings.TrimPrefix(err.Error(), "column: "))
				break
			}
		}
	}
	if loss := st.Section.Dims["thickness_loss"]; loss != nil && loss.Random() {
		s := st.Section.at(func(x *Quantity) float64 {
			if x == loss {
				return loss.Dist.Quantile(1 - 1e-6)
			}
			return nominalValue(x, 0)
		})
		if _, err := s.Properties(); err != nil {
			what := "narrow it or add upper"
			if loss.update != nil {
				what = "the update from measurements.thickness_loss has too wide an upper tail: give a smaller known cov, or weigh a narrower prior with prior_tests and prior_dof"
			}
			p.errorf(loss.Path, "the largest thickness losses of this distribution leave no section (%v): %s", strings.TrimPrefix(err.Error(), "column: "), what)
		}
	}
}

// at returns the column section with each dimension from value.
func (s SectionSpec) at(value func(*Quantity) float64) column.Section {
	sec := column.Section{Shape: s.Shape}
	for k, q := range s.Dims {
		*sectionField(&sec, k) = value(q)
	}
	corners(&sec, s.Dims["radius"] != nil, s.Fabrication)
	return sec
}

// nominalValue is a quantity's value at nominal: the mean of a random
// one; length scales L/n values (0 when they were already resolved).
func nominalValue(q *Quantity, length float64) float64 {
	v := q.Value
	if q.Random() {
		v = q.MeanValue() // finite for an updated quantity too
	}
	if q.Relative {
		v *= length
	}
	return v
}

// meanMagnitude returns E|X| of a distribution: its mean when it cannot
// go negative, else the integral of |F^-1(Phi(u))| phi(u) over the
// standard normal u, by composite Simpson rules on each side of the sign
// change (the integrand has a kink there), truncated at |u| = 9.
func meanMagnitude(d sim.Dist) float64 {
	if d.CDF(0) == 0 {
		return d.Mean()
	}
	u0 := math.Max(-9, math.Min(9, d.ToStdNormal(0)))
	f := func(u float64) float64 {
		return math.Exp(-u*u/2) / math.Sqrt(2*math.Pi) * math.Abs(d.FromStdNormal(u))
	}
	return simpson(f, -9, u0, 2000) + simpson(f, u0, 9, 2000)
}

// simpson integrates f over [a, b] by the composite Simpson rule with n
// (even) intervals.
func simpson(f func(float64) float64, a, b float64, n int) float64 {
	if b <= a {
		return 0
	}
	h := (b - a) / float64(n)
	sum := f(a) + f(b)
	for i := 1; i < n; i++ {
		w := 2.0
		if i%2 == 1 {
			w = 4
		}
		sum += w * f(a+float64(i)*h)
	}
	return sum * h / 3
}
