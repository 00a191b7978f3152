package study

import (
	"fmt"
	"strings"

	"strutrisk/internal/column"
)

// MaterialSpec is the material of [material] beyond its modulus and
// strength (see Study.Modulus and Study.Yield, which holds timber's
// strength too).
type MaterialSpec struct {
	// Kind is material.kind: steel (the default), stainless, aluminium or
	// timber.
	Kind column.Kind
	// Lambda0 is the plateau of the kind's buckling curves (see
	// column.MaterialCurve): 0.2 for steel.
	Lambda0 float64
	// ClassA reports an aluminium member of buckling class A (curve "A").
	ClassA bool
	// Service is the service class of timber (1 to 3, EN 1995-1-1 2.3.1.3).
	Service int
	// Ultimate is the ultimate strength f_u of stainless steel (nil when
	// not given) and Exponent the Ramberg-Osgood exponent n: the
	// stress-strain law of the ultimate beam-column (EN 1993-1-4 Annex C).
	Ultimate *Quantity
	Exponent float64
	// HAZWidth and HAZFactor are the width b_haz of the heat-affected
	// zone beside a weld and its strength ratio rho_o,haz (welded
	// aluminium; nil when the member is not welded).
	HAZWidth, HAZFactor *Quantity
}

// strengthKey is the key of the material's strength: "strength" for
// timber (compression parallel to the grain), "yield" for metals (the
// 0.2 % proof stress f_0.2 of stainless steel and aluminium).
func (m *MaterialSpec) strengthKey() string {
	if m.Kind == column.Timber {
		return "strength"
	}
	return "yield"
}

// StrengthPath is the path of the material's strength: material.strength
// for timber, material.yield otherwise.
func (st *Study) StrengthPath() string { return "material." + st.Material.strengthKey() }

// defaultModulus is the modulus of the metals that have one fixed value in
// their standard: stainless steel 200 GPa (EN 1993-1-4:2006 2.1 and
// Table 2.1, most grades; from memory), aluminium 70 GPa
// (EN 1999-1-1:2007 3.2.5(1)). Steel and timber (whose modulus follows
// the strength class) have none.
var defaultModulus = map[column.Kind]float64{column.Stainless: 200000, column.Aluminium: 70000}

// materialKind reads material.kind and the keys that belong to one kind
// only, before the modulus and strength are read.
func (p *parser) materialKind(t *table) {
	ms := &p.st.Material
	if k, ok := p.choice(t, "kind", choicesOf("material", "kind")); ok {
		ms.Kind, _ = column.ParseKind(k)
	}
	ms.Lambda0 = 0.2
	only := func(key string, kind column.Kind, what string) bool {
		if _, given := t.m[key]; !given {
			return false
		}
		if ms.Kind != kind {
			t.used[key] = true
			p.errorf(t.key(key), "%s belongs to material.kind = %q (%s); the material here is %s: remove it", key, kind, what, ms.Kind)
			return false
		}
		return true
	}
	if only("service_class", column.Timber, "the service class of EN 1995-1-1 2.3.1.3") {
		if n, ok := p.number(t, "service_class"); ok {
			if n != 1 && n != 2 && n != 3 {
				p.errorf(t.key("service_class"), "service_class = %g: give 1 (heated indoors), 2 (covered, unheated) or 3 (exposed)", n)
			}
			ms.Service = int(n)
		}
	}
	if ms.Kind == column.Timber && ms.Service == 0 {
		ms.Service = 2
		if _, given := t.m["service_class"]; !given {
			p.defaultf("material.service_class: not given; service class 2 (covered, unheated: EN 1995-1-1 2.3.1.3), whose k_mod equals class 1's and whose k_def (0.8) is the larger")
		}
	}
	if only("ultimate", column.Stainless, "the ultimate strength of the Ramberg-Osgood law") {
		ms.Ultimate = p.q(t, "ultimate", qopt{dim: Stress, need: positive})
	}
	if only("exponent", column.Stainless, "the Ramberg-Osgood exponent n") {
		if n, ok := p.number(t, "exponent"); ok {
			if !(n >= 2 && n <= 50) {
				p.errorf(t.key("exponent"), "exponent = %g: the Ramberg-Osgood exponent n of stainless steel lies between 2 and 50 (EN 1993-1-4 Annex C: about 7 austenitic, 8 duplex, 14 ferritic)", n)
			}
			ms.Exponent = n
		}
	}
	if only("haz_width", column.Aluminium, "the heat-affected zone of welds") {
		ms.HAZWidth = p.q(t, "haz_width", qopt{dim: Length, need: nonNegative})
	}
	if only("haz_factor", column.Aluminium, "the heat-affected zone of welds") {
		ms.HAZFactor = p.q(t, "haz_factor", qopt{dim: Dimensionless, need: positive})
	}
	for _, key := range []string{"yield", "strength"} {
		if _, given := t.m[key]; given && key != ms.strengthKey() {
			t.used[key] = true
			if ms.Kind == column.Timber {
				p.errorf(t.key(key), "timber takes strength (compression parallel to the grain, f_c,0), not yield: write strength = ...")
			} else {
				p.errorf(t.key(key), "%s takes yield (the yield strength, or the 0.2 %% proof stress of stainless steel and aluminium), not %s: write yield = ...", ms.Kind, key)
			}
		}
	}
}

// materialModulus reads the modulus, or gives the kind's default.
func (p *parser) materialModulus(t *table, o qopt) {
	if p.st.Modulus = p.q(t, "modulus", o); p.st.Modulus != nil {
		return
	}
	if _, given := t.m["modulus"]; given {
		return
	}
	kind := p.st.Material.Kind
	if e, ok := defaultModulus[kind]; ok {
		q := &Quantity{Path: "material.modulus", Line: p.line("material"), Dim: Stress, Value: e}
		p.st.Modulus = p.register(q, o)
		p.defaultf("material.modulus: not given; %s takes %.0f GPa (%s)", kind, e/1000, map[column.Kind]string{
			column.Stainless: "EN 1993-1-4 2.1, most grades", column.Aluminium: "EN 1999-1-1 3.2.5"}[kind])
		return
	}
	example := "\"205 GPa\""
	if kind == column.Timber {
		example = "{ dist = \"lognormal\", mean = \"11 GPa\", cov = 0.13 } (the mean modulus of the strength class; cov of the JCSS Probabilistic Model Code 3.5)"
	}
	p.required(t, "modulus", "the elastic modulus, e.g. modulus = "+example)
}

// materialStrength reads the strength under the kind's key.
func (p *parser) materialStrength(t *table, o qopt) {
	key := p.st.Material.strengthKey()
	if p.st.Yield = p.q(t, key, o); p.st.Yield != nil {
		return
	}
	if _, given := t.m[key]; given {
		return
	}
	if p.st.Material.Kind == column.Timber {
		p.required(t, key, "the compression strength parallel to the grain, e.g. strength = { dist = \"lognormal\", mean = \"26 MPa\", cov = 0.2 }")
		return
	}
	p.required(t, key, "the yield strength, e.g. yield = \"275 MPa\"")
}

// validCurve reports whether name is a buckling curve of the study's
// material, and says which names are when it is not.
func (p *parser) validCurve(key, name string) bool {
	kind := p.st.Material.Kind
	if _, err := column.MaterialCurve(kind, name); err == nil {
		return true
	}
	names := column.MaterialCurveNames(kind)
	quoted := make([]string, len(names))
	for i, n := range names {
		quoted[i] = fmt.Sprintf("%q", n)
	}
	what := map[column.Kind]string{
		column.Steel:     "the curves of EN 1993-1-1 Table 6.1",
		column.Stainless: "the section families of EN 1993-1-4 Table 5.2",
		column.Aluminium: "the buckling classes of EN 1999-1-1 Table 6.6",
		column.Timber:    "solid timber (beta_c 0.2) or glued laminated timber (beta_c 0.1), EN 1995-1-1 6.3.2",
	}[kind]
	for _, k := range []column.Kind{column.Steel, column.Stainless, column.Aluminium, column.Timber} {
		if _, err := column.MaterialCurve(k, name); err == nil && k != kind {
			p.errorf(key, "%q is a %s curve; material.kind = %q takes %s: %s", name, k, kind, what, strings.Join(quoted, ", "))
			return false
		}
	}
	msg := fmt.Sprintf("%q is not a buckling curve of %s: use %s (%s)", name, kind, strings.Join(quoted, ", "), what)
	if near, ok := nearest(name, names); ok {
		msg = fmt.Sprintf("%q is not a buckling curve of %s; did you mean %q? (%s)", name, kind, near, what)
	}
	p.errorf(key, "%s", msg)
	return false
}

// kindAlpha is the imperfection factor of the study's material's curve
// name about axis a (0 for an unknown name).
func (st *Study) kindAlpha(name string, a int) float64 {
	c, err := column.MaterialCurve(st.Material.Kind, name)
	if err != nil {
		return 0
	}
	return c.Alpha[a]
}

// loadDuration reads the duration key of a load's distribution table:
// a load-duration class of EN 1995-1-1 Table 2.1, for timber only.
func (p *parser) loadDuration(key string, v any) (string, bool) {
	names := column.DurationNames()
	s, ok := v.(string)
	if !ok {
		p.errorf(key, "duration must be text: one of %s", strings.Join(names, ", "))
		return "", false
	}
	if p.st.Material.Kind != column.Timber {
		p.errorf(key, "duration is the load-duration class of timber (k_mod, EN 1995-1-1 3.1.3); material.kind is %q: remove it", p.st.Material.Kind)
		return "", false
	}
	if _, err := column.ParseDuration(s); err != nil {
		msg := fmt.Sprintf("%q is not a load-duration class: use one of %s (EN 1995-1-1 Table 2.1)", s, strings.Join(names, ", "))
		if near, ok := nearest(s, names); ok {
			msg = fmt.Sprintf("%q is not a load-duration class; did you mean %q? (one of %s)", s, near, strings.Join(names, ", "))
		}
		p.errorf(key, "%s", msg)
		return "", false
	}
	return s, true
}

// strengthRange is the plausible range of the material's strength (MPa):
// structural steel MinSteelYield to MaxSteelYield; stainless steel's 0.2 %
// proof stress 150 to 1,000 (austenitic annealed to duplex cold-worked,
// EN 1993-1-4 Table 2.1); aluminium's f_o 20 to 600 (EN 1999-1-1 Table
// 3.2); timber's compression strength 10 to 60 (EN 338 and EN 14080
// classes: common practice).
func (st *Study) strengthRange() plausible {
	switch st.Material.Kind {
	case column.Stainless:
		return plausible{lo: 150, hi: 1000, what: "the 0.2 % proof stress of stainless steel"}
	case column.Aluminium:
		return plausible{lo: 20, hi: 600, what: "the 0.2 % proof stress of an aluminium alloy"}
	case column.Timber:
		return plausible{lo: 10, hi: 60, what: "the compression strength of timber parallel to the grain"}
	}
	return plausible{lo: MinSteelYield, hi: MaxSteelYield, what: "the yield strength of structural steel"}
}
