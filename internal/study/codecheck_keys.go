package study

import (
	"fmt"
	"sort"
	"strings"

	"strutrisk/internal/assess"
)

// codeCheck reads [code_check]: the partial factors of the code check
// (the recommended values of EN 1993-1-1 and EN 1990 when not given,
// listed under the defaults) and the characteristic values the study
// sets.
func (p *parser) codeCheck(top *table) {
	cs := &p.st.CodeCheck
	*cs = CodeCheckSpec{GammaM0: assess.GammaM0, GammaM1: assess.GammaM1, GammaG: assess.GammaG, GammaQ: assess.GammaQ, Psi0: assess.Psi0}
	t := p.sub(top, "code_check")
	var defaulted []string
	psiTable := p.psi0ByLoad(t)
	for _, f := range []struct {
		key      string
		to       *float64
		min, max float64
		source   string
	}{
		{"gamma_m0", &cs.GammaM0, 1, 2, "EN 1993-1-1 6.1 note 2B"},
		{"gamma_m1", &cs.GammaM1, 1, 2, "EN 1993-1-1 6.1 note 2B"},
		{"gamma_g", &cs.GammaG, 1, 2, "EN 1990 Table A1.2(B)"},
		{"gamma_q", &cs.GammaQ, 1, 2, "EN 1990 Table A1.2(B)"},
		{"psi_0", &cs.Psi0, 0, 1, "EN 1990 Table A1.1, imposed loads"},
	} {
		if f.key == "psi_0" && psiTable {
			continue
		}
		x, ok := p.number(t, f.key)
		if _, given := t.get(f.key); !given {
			defaulted = append(defaulted, fmt.Sprintf("%s = %g (%s)", f.key, *f.to, f.source))
			continue
		}
		if !ok {
			continue // reported by number
		}
		if x < f.min || x > f.max {
			p.errorf(t.key(f.key), "%s = %g is outside %g to %g", f.key, x, f.min, f.max)
			continue
		}
		*f.to = x
	}
	if len(defaulted) > 0 {
		p.defaultf("code_check: %s: recommended values; the National Annex may differ", strings.Join(defaulted, ", "))
	}
	p.st.CodeCheck.LoadRatio = -1
	if t != nil {
		p.normaliseKeys(t) // normalise.go
		p.checkCharacteristic(t)
		p.unknown(t)
	}
}

// checkCharacteristic reads code_check.characteristic: a table of random
// inputs' paths and their characteristic values.
func (p *parser) checkCharacteristic(t *table) {
	v, ok := t.get("characteristic")
	if !ok {
		return
	}
	key := t.key("characteristic")
	m, ok := v.(map[string]any)
	if !ok {
		p.errorf(key, "must be a table of input paths and values, e.g. characteristic = { \"loads.imposed\" = \"150 kN\" }, not %s", tomlType(v))
		return
	}
	paths := make([]string, 0, len(m))
	for k := range m {
		paths = append(paths, k)
	}
	sort.Strings(paths)
	for _, path := range paths {
		at := key + "." + path
		q := p.byPath[path]
		switch {
		case q == nil:
			p.errorf(at, "%q is not an input of the study: write the path in quotes, e.g. \"loads.imposed\" = \"150 kN\"", path)
			continue
		case q.spec == nil && q.Dist == nil:
			p.errorf(at, "%s is fixed: its value is its characteristic value, so leave it out here", path)
			continue
		}
		o := p.opts[q]
		o.rel, o.frac = false, false
		x, ok := p.scalar(at, m[path], o)
		if !ok {
			continue
		}
		if p.st.CodeCheck.Characteristic == nil {
			p.st.CodeCheck.Characteristic = map[string]float64{}
		}
		p.st.CodeCheck.Characteristic[path] = x.v
	}
}

// psi0ByLoad reads code_check.psi_0 written as a table of load names and
// combination factors, { snow = 0.5, stock = 1.0 } (EN 1990 Table A1.1
// gives each kind of variable action its own psi_0), into
// CodeCheckSpec.Psi0By; the loads it does not name keep the recommended
// 0.7. It reports whether psi_0 is such a table.
func (p *parser) psi0ByLoad(t *table) bool {
	v, ok := t.get("psi_0")
	m, isTable := v.(map[string]any)
	if !ok || !isTable {
		return false
	}
	key := t.key("psi_0")
	names := make([]string, 0, len(m))
	for k := range m {
		names = append(names, k)
	}
	sort.Strings(names)
	cs := &p.st.CodeCheck
	for _, name := range names {
		at := key + "." + name
		path := "loads." + strings.TrimPrefix(name, "loads.")
		if !p.isLoad(path) {
			p.errorf(at, "%q is not a load of [loads]: name a load as in [loads], e.g. psi_0 = { snow = 0.5 }", name)
			continue
		}
		x, ok := tomlNumber(m[name])
		if !ok {
			p.errorf(at, "must be a number from 0 to 1, not %s", tomlType(m[name]))
			continue
		}
		if !(x >= 0 && x <= 1) {
			p.errorf(at, "psi_0 = %g is outside 0 to 1", x)
			continue
		}
		if cs.Psi0By == nil {
			cs.Psi0By = map[string]float64{}
		}
		cs.Psi0By[path] = x
	}
	return true
}

// isLoad reports whether path names a load of [loads].
func (p *parser) isLoad(path string) bool {
	for _, q := range p.st.Loads {
		if q.Path == path {
			return true
		}
	}
	return false
}
