package study

import (
	"fmt"
	"math"
	"strings"

	"strutrisk/internal/column"
	"strutrisk/sim"
)

// Measurement is a set of test results on an existing member that updates
// the distribution of one quantity of the study by Bayes' rule: a
// conjugate normal model for the logarithm of the quantity (EN 1990:2002
// Annex D, D.7; see sim.UpdateLognormal). The updated (predictive)
// distribution replaces the quantity's distribution in the run.
type Measurement struct {
	// Key is the key in [measurements] ("yield"), Path the quantity it
	// updates ("material.yield") and Line the key's line.
	Key, Path string
	Line      int
	// Unit is the internal unit of Values ("MPa", "mm").
	Unit string
	// Values are the test results in N, mm, MPa.
	Values []float64
	// Quantity is the study quantity updated; its Dist is the predictive
	// distribution once the study is checked.
	Quantity *Quantity
	// Written is the quantity's distribution as written in the study (nil
	// when it was a fixed value), the prior shown beside the update.
	Written sim.Dist
	// Prior are the prior parameters of ln X; PriorTests and PriorDoF are
	// n' and ν' as given, KnownCoV the coefficient of variation taken as
	// known (0: unknown variance).
	Prior                sim.Prior
	PriorTests, PriorDoF float64
	KnownCoV             float64
	// Posterior are the updated parameters, After the predictive
	// distribution that replaces the quantity's.
	Posterior *sim.Posterior
	After     sim.Dist
}

// measureTargets maps the keys of [measurements] to the quantities they
// update.
var measureTargets = []struct{ key, path string }{
	{"yield", "material.yield"},
	{"strength", "material.strength"},
	{"modulus", "material.modulus"},
	{"bow", "imperfection.bow"},
	{"thickness_loss", "member.section.thickness_loss"},
}

// measurements reads the [measurements] table once every quantity is
// built, updates the distributions and records the updates in the study.
func (p *parser) measurements(top *table) {
	t := p.sub(top, "measurements")
	if t == nil {
		return
	}
	for _, mt := range measureTargets {
		v, ok := t.get(mt.key)
		if !ok {
			continue
		}
		m, isMap := v.(map[string]any)
		if !isMap {
			p.errorf(t.key(mt.key), "write test results as a table, e.g. %s = { values = [%s] }", mt.key, measureExample(mt.key))
			continue
		}
		mtab := &table{path: t.key(mt.key), m: m, used: map[string]bool{}}
		known := knownKeys(mtab.path)
		if ms := p.measurement(mtab, mt.path); ms != nil {
			p.st.Measurements = append(p.st.Measurements, ms)
			if ms.Variance() == "unknown" {
				p.uncorrelated(top, ms.Path, mtab.path)
			}
		}
		for _, k := range known {
			if _, ok := m[k]; ok {
				mtab.used[k] = true // reported already when it was wrong
			}
		}
		p.unknown(mtab)
	}
	p.unknown(t)
}

func measureExample(key string) string {
	switch key {
	case "yield":
		return `"287 MPa", "301 MPa", "279 MPa"`
	case "strength":
		return `"27 MPa", "31 MPa", "24 MPa"`
	case "modulus":
		return `"203 GPa", "209 GPa", "198 GPa"`
	}
	return `"3.1 mm", "2.4 mm", "4.0 mm"`
}

// measurement reads one entry of [measurements] and updates its quantity.
func (p *parser) measurement(t *table, path string) *Measurement {
	key := t.path[strings.LastIndexByte(t.path, '.')+1:]
	q := p.byPath[path]
	if q == nil {
		what := "add it to the study"
		if key == "thickness_loss" {
			what = "add thickness_loss to [member.section] (e.g. thickness_loss = \"1 mm\")"
		} else if key == "bow" {
			what = "add bow to [imperfection]"
		} else if key == "yield" && p.st.Material.Kind == column.Timber {
			what = "timber's strength is material.strength: write measurements.strength"
		} else if key == "strength" {
			what = "only timber has material.strength; a metal's is measurements.yield"
		}
		p.errorf(t.path, "the study has no %s to update: %s", path, what)
		p.markAll(t)
		return nil
	}
	o := p.opts[q]
	ms := &Measurement{Key: key, Path: path, Line: p.line(t.path), Quantity: q, Unit: InternalUnit(q.Dim)}
	if q.Relative {
		p.errorf(t.path, "%s is a fraction of a random member length; measured values need a fixed member.length", path)
		p.markAll(t)
		return nil
	}
	length := 0.0
	if p.st.Length != nil && !p.st.Length.Random() {
		length = p.st.Length.Value
	}

	// The test results: positive quantities of the variable's dimension.
	v, ok := t.get("values")
	list, isList := v.([]any)
	switch {
	case !ok:
		p.required(t, "values", fmt.Sprintf("the test results, e.g. values = [%s]", measureExample(key)))
		return nil
	case !isList || len(list) == 0:
		p.errorf(t.key("values"), "values is a non-empty list of test results, e.g. [%s]", measureExample(key))
		return nil
	}
	good := true
	for i, x := range list {
		at := fmt.Sprintf("%s[%d]", t.key("values"), i)
		pv, ok := p.scalar(at, x, qopt{dim: o.dim, rel: o.rel})
		if !ok {
			good = false
			continue
		}
		val := pv.v
		if pv.rel {
			val *= length
		}
		if !p.measuredLcr(at, q, pv, &val, length) {
			good = false
			continue
		}
		if !(val > 0) || math.IsInf(val, 0) {
			p.errorf(at, "test result %d is %s: the update is on the logarithm, so every result must be positive (give the magnitude of a measured bow)", i+1, p.show(val, q.Dim))
			good = false
			continue
		}
		ms.Values = append(ms.Values, val)
	}

	// The prior: n' and ν' weigh the study's distribution; a known cov
	// fixes the spread.
	count := func(k string) (float64, bool) {
		x, ok := p.number(t, k)
		if ok && !(x >= 0 && x <= 1e6) {
			p.errorf(t.key(k), "%s = %g must be zero (no prior information) or positive", k, x)
			good = false
			return 0, false
		}
		return x, ok
	}
	n0, hasN := count("prior_tests")
	nu0, hasNu := count("prior_dof")
	cov, hasCov := p.number(t, "cov")
	if hasCov && !(cov > 0 && cov < 2) {
		p.errorf(t.key("cov"), "cov = %g is the known coefficient of variation of %s: give a value between 0 and 2, e.g. 0.07", cov, path)
		good = false
	}
	if hasCov && hasNu {
		p.errorf(t.key("prior_dof"), "prior_dof weighs a prior spread; with a known cov the spread is not estimated: give one of them")
		good = false
	}
	if !good {
		return nil
	}
	if !hasN {
		p.defaultf("%s.prior_tests: not given; 0 (the study's distribution of %s carries no weight on the mean: the classical estimate of EN 1990 Annex D)", t.path, path)
	}
	if !hasNu && !hasCov {
		p.defaultf("%s.prior_dof: not given; 0 (no prior information on the spread of %s)", t.path, path)
	}
	ms.PriorTests, ms.PriorDoF, ms.KnownCoV = n0, nu0, cov

	if q.Random() {
		ms.Written = q.Dist
	}
	var mean, qcov float64
	if n0 > 0 || nu0 > 0 {
		if !q.Random() {
			p.errorf(t.path, "prior_tests and prior_dof weigh the study's distribution of %s, but %s is a fixed value: give it a distribution, or set both to 0", path, path)
			return nil
		}
		mean, qcov = q.Dist.Mean(), q.Dist.StdDev()/q.Dist.Mean()
		if !(mean > 0) || !(qcov > 0) || math.IsInf(qcov, 0) {
			p.errorf(t.path, "the distribution of %s (mean %s) cannot serve as a lognormal prior: give it a lognormal distribution, or set prior_tests and prior_dof to 0", path, p.show(mean, q.Dim))
			return nil
		}
		if q.DistName != "lognormal" {
			p.warnf("%s: the prior of %s is %s, not lognormal; the update uses the lognormal with the same mean and cov", t.path, path, q.DistName)
		}
	}
	if hasCov {
		sigma := math.Sqrt(math.Log1p(cov * cov))
		ms.Prior = sim.Prior{Sigma: sigma}
		if n0 > 0 {
			ms.Prior.Mean = math.Log(mean) - sigma*sigma/2
			ms.Prior.N = n0
		}
	} else {
		if mean > 0 {
			ms.Prior = sim.PriorFromLognormal(mean, qcov, n0, nu0)
		}
	}
	post, err := sim.UpdateLognormal(ms.Prior, ms.Values)
	if err != nil {
		p.errorf(t.path, "%s", strings.TrimPrefix(err.Error(), "sim: "))
		return nil
	}
	ms.Posterior = post
	ms.After = post.Predictive()
	if !hasCov && post.Nu < 30 && nu0 == 0 {
		p.warnf("%s: %d results and no prior on the spread (prior_dof = 0): the updated %s is log-Student-t with %g degrees of freedom, whose lower tail is heavy (0.01%% fractile %s against %s for a lognormal with the same estimates); if the study's cov is trusted, give prior_dof (e.g. 5 to 10) or a known cov",
			t.path, len(ms.Values), path, post.Nu, p.show(ms.After.Quantile(1e-4), q.Dim), p.show(math.Exp(post.M+post.S*math.Sqrt(1+1/post.N)*stdNormalQuantile(1e-4)), q.Dim))
	}

	// The predictive distribution replaces the quantity's.
	q.Dist = ms.After
	q.update = ms
	if hasCov {
		q.DistName = "lognormal (updated)"
	} else {
		q.DistName = "log-Student-t (updated)"
	}
	if q.Params != "" {
		q.Params = fmt.Sprintf("from %d measurements (prior: %s)", len(ms.Values), q.Params)
	} else {
		q.Params = fmt.Sprintf("from %d measurements (no prior)", len(ms.Values))
	}
	return ms
}

// stdNormalQuantile is the standard normal quantile.
func stdNormalQuantile(p float64) float64 {
	d, _ := sim.NewNormal(0, 1)
	return d.Quantile(p)
}

// MeanValue returns the quantity's mean as the nominal picture uses it:
// the mean of its distribution, or, for a quantity updated from
// measurements whose predictive distribution has no finite mean (the
// log-Student-t), the mean of the lognormal with the predictive's log-mean
// and log-scale (see Measurement.UpdatedSummary). A fixed quantity
// returns its value.
func (q *Quantity) MeanValue() float64 {
	if !q.Random() {
		return q.Value
	}
	m := q.Dist.Mean()
	if q.update != nil && math.IsInf(m, 0) {
		return q.update.UpdatedSummary().Mean
	}
	return m
}

// Updated returns the measurement that updated q, nil when none did.
func (q *Quantity) Updated() *Measurement { return q.update }

// Summary describes a distribution for the check table: its mean, its
// coefficient of variation and its 5 % fractile.
type Summary struct {
	Mean, CoV, P05 float64
}

// PriorSummary describes the distribution written in the study (zero for
// a fixed value, whose Mean is the value).
func (ms *Measurement) PriorSummary() Summary {
	if ms.Written == nil {
		return Summary{Mean: ms.Quantity.Value, P05: ms.Quantity.Value}
	}
	d := ms.Written
	return Summary{Mean: d.Mean(), CoV: d.StdDev() / d.Mean(), P05: d.Quantile(0.05)}
}

// UpdatedSummary describes the updated (predictive) distribution: its 5 %
// fractile, and the mean and cov of the lognormal with its log-mean m″
// and log-scale s″ sqrt(1 + 1/n″) (sigma in place of s″ when known).
// With a known variance that lognormal is the predictive distribution;
// with an unknown one the predictive is a log-Student-t, which has no
// finite moments, and the lognormal is its normal-tailed counterpart.
func (ms *Measurement) UpdatedSummary() Summary {
	po := ms.Posterior
	s := po.S
	if po.Sigma > 0 {
		s = po.Sigma
	}
	s2 := s * s * (1 + 1/po.N)
	return Summary{Mean: math.Exp(po.M + s2/2), CoV: math.Sqrt(math.Expm1(s2)), P05: po.Fractile(0.05)}
}

// Variance says how the spread was treated: "known" or "unknown".
func (ms *Measurement) Variance() string {
	if ms.Posterior != nil && ms.Posterior.Sigma > 0 {
		return "known"
	}
	return "unknown"
}

// uncorrelated reports a correlation with the quantity at path, whose
// update with unknown variance has a log-Student-t predictive: it has no
// finite variance, so a correlation coefficient with it is not defined.
func (p *parser) uncorrelated(top *table, path, key string) {
	list, _ := top.m["correlation"].([]map[string]any)
	for i, m := range list {
		pair, _ := m["pair"].([]any)
		for _, x := range pair {
			if s, _ := x.(string); s == path {
				p.errorf(fmt.Sprintf("correlation[%d].pair", i), "%s is updated by %s with an unknown spread: its predictive distribution (log-Student-t) has no finite variance, so it cannot be correlated; give %s a known cov, or drop this correlation", path, key, key)
			}
		}
	}
}
