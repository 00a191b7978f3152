package study

import (
	"errors"
	"fmt"
	"math"
	"path/filepath"
	"slices"
	"sort"
	"strconv"
	"strings"

	"github.com/BurntSushi/toml"

	"strutrisk/internal/column"
	"strutrisk/sim"
)

// parser walks a decoded study file, collecting problems as it goes.
type parser struct {
	file   string
	data   string
	sys    System
	lines  map[string]int
	probs  []Problem
	st     *Study
	opts   map[*Quantity]qopt
	byPath map[string]*Quantity
	dists  map[string]bool // paths of distribution tables

	// edit, if set, changes the decoded document before it is read, and
	// relines the key lines (overrides: see override.go).
	edit    func(raw map[string]any)
	relines func(lines map[string]int)

	// doc, when set, is the decoded document (with lines set): parse
	// does not decode data (a case read from a source, see source.go).
	doc map[string]any
	// raw is the document parse decoded, for newSource.
	raw map[string]any

	// dropped counts the problems beyond maxProblems, not listed.
	dropped int
}

// full reports that no more problems are listed.
func (p *parser) full() bool { return len(p.probs) >= maxProblems }

// problems returns the problems found as an *Error.
func (p *parser) problems() *Error {
	return &Error{Problems: withoutMissingMisspelt(p.probs), Unlisted: p.dropped}
}

func newParser(name string, data []byte) *parser {
	return &parser{
		file:   name,
		data:   string(data),
		sys:    systems["N-mm"],
		st:     &Study{},
		opts:   map[*Quantity]qopt{},
		byPath: map[string]*Quantity{},
		dists:  map[string]bool{},
	}
}

// errorf records a problem at key. A problem with a parameter of a
// distribution is reported under the variable's name, at the parameter's
// line, with the parameter named in the message.
func (p *parser) errorf(key, format string, args ...any) {
	if p.full() {
		p.dropped++
		return
	}
	msg := fmt.Sprintf(format, args...)
	line := p.line(key)
	if v, param, ok := p.param(key); ok {
		if !strings.HasPrefix(msg, param+" ") {
			msg = param + ": " + msg
		}
		key = v
	}
	p.probs = append(p.probs, Problem{File: p.file, Line: line, Key: key, Msg: msg})
}

// param splits the path of a distribution parameter into the variable's
// path and the parameter's name.
func (p *parser) param(key string) (variable, param string, ok bool) {
	i := strings.LastIndexByte(key, '.')
	if i < 0 || !p.dists[key[:i]] {
		return "", "", false
	}
	return key[:i], key[i+1:], true
}

func (p *parser) warnf(format string, args ...any) {
	p.st.Warnings = append(p.st.Warnings, fmt.Sprintf(format, args...))
}

func (p *parser) defaultf(format string, args ...any) {
	p.st.Defaults = append(p.st.Defaults, fmt.Sprintf(format, args...))
}

// line returns the line of key, or of its nearest parent that has one.
func (p *parser) line(key string) int { return lineIn(p.lines, key) }

// lineIn returns the line of key in lines, or of its nearest parent that
// has one.
func lineIn(lines map[string]int, key string) int {
	for key != "" {
		if n, ok := lines[key]; ok {
			return n
		}
		i := strings.LastIndexAny(key, ".[")
		if i < 0 {
			return 0
		}
		key = key[:i]
	}
	return 0
}

// table is one TOML table being read; get marks the keys it reads.
type table struct {
	path string
	m    map[string]any
	used map[string]bool
}

func (t *table) get(key string) (any, bool) {
	if t == nil {
		return nil, false
	}
	if tableInfo(t.path) != nil {
		if !registered(t.path, key) {
			// A programming error, not a problem of the file: every key
			// the parser reads is a row of the registry.
			panic("study: the parser reads " + t.key(key) + ", which is not in the key registry (keys_table.go)")
		}
	}
	v, ok := t.m[key]
	if ok {
		t.used[key] = true
	}
	return v, ok
}

func (t *table) key(k string) string {
	if t.path == "" {
		return k
	}
	return t.path + "." + k
}

// sub returns the table under key, nil when it is absent (or not a table,
// which is reported).
func (p *parser) sub(t *table, key string) *table {
	v, ok := t.get(key)
	if !ok {
		return nil
	}
	m, ok := v.(map[string]any)
	if !ok {
		p.errorf(t.key(key), "must be a table ([%s]), not %s", t.key(key), tomlType(v))
		return nil
	}
	return &table{path: t.key(key), m: m, used: map[string]bool{}}
}

// unknown reports every key of t that was not read, suggesting near
// misses among the keys the registry (keys_table.go) gives its table.
func (p *parser) unknown(t *table) {
	p.unknownOf(t, knownKeys(t.path))
}

// unknownOf reports every key of t that was not read, suggesting near
// misses among known.
func (p *parser) unknownOf(t *table, known []string) {
	if t == nil {
		return
	}
	for _, k := range sortedKeys(t.m) {
		if t.used[k] {
			continue
		}
		if p.full() {
			p.dropped++
			continue
		}
		where := "in [" + t.path + "]"
		if t.path == "" {
			where = "at the top of the file"
		}
		if near, ok := nearest(k, known); ok {
			p.errorf(t.key(k), "unknown key %s; did you mean %s?", where, t.key(near))
		} else {
			p.errorf(t.key(k), "unknown key %s (known keys: %s)", where, strings.Join(known, ", "))
		}
	}
}

// str reads a text value.
func (p *parser) str(t *table, key string) (string, bool) {
	v, ok := t.get(key)
	if !ok {
		return "", false
	}
	s, ok := v.(string)
	if !ok {
		p.errorf(t.key(key), "must be text in quotes, not %s", tomlType(v))
		return "", false
	}
	return s, true
}

// choice reads a text value that must be one of options.
func (p *parser) choice(t *table, key string, options []string) (string, bool) {
	s, ok := p.str(t, key)
	if !ok {
		return "", false
	}
	for _, o := range options {
		if s == o {
			return s, true
		}
	}
	if near, ok := nearest(s, options); ok {
		p.errorf(t.key(key), "%q is not a choice; did you mean %q? (one of %s)", s, near, strings.Join(options, ", "))
	} else {
		p.errorf(t.key(key), "%q is not a choice: use one of %s", s, strings.Join(options, ", "))
	}
	return "", false
}

// tomlNumber is the value v of a TOML document as a float64, and
// whether it is a number (an integer or a float, NaN and infinities
// included: callers bound it).
func tomlNumber(v any) (float64, bool) {
	switch x := v.(type) {
	case int64:
		return float64(x), true
	case float64:
		return x, true
	}
	return 0, false
}

// number reads a plain number (not a quantity).
func (p *parser) number(t *table, key string) (float64, bool) {
	v, ok := t.get(key)
	if !ok {
		return 0, false
	}
	if x, ok := tomlNumber(v); ok {
		if math.IsNaN(x) || math.IsInf(x, 0) {
			p.errorf(t.key(key), "%v is not a usable number", x)
			return 0, false
		}
		return x, true
	}
	p.errorf(t.key(key), "must be a plain number, not %s", tomlType(v))
	return 0, false
}

// q reads the quantity t.key and registers it.
func (p *parser) q(t *table, key string, o qopt) *Quantity {
	v, ok := t.get(key)
	if !ok {
		return nil
	}
	return p.register(p.quantity(t.key(key), v, o), o)
}

func (p *parser) register(q *Quantity, o qopt) *Quantity {
	if q == nil {
		return nil
	}
	p.opts[q] = o
	p.byPath[q.Path] = q
	p.st.Quantities = append(p.st.Quantities, q)
	return q
}

// perAxis reads a value given once for both axes or as { major, minor }.
func (p *parser) perAxis(t *table, key string, o qopt) (qs [2]*Quantity, given bool) {
	v, ok := t.get(key)
	if !ok {
		return qs, false
	}
	m, isMap := v.(map[string]any)
	if !isMap || m["dist"] != nil {
		q := p.register(p.quantity(t.key(key), v, o), o)
		return [2]*Quantity{q, q}, true
	}
	at := &table{path: t.key(key), m: m, used: map[string]bool{}}
	if _, maj := m["major"]; !maj {
		if _, min := m["minor"]; !min {
			p.errorf(at.path, "a table here is either a distribution (with dist = \"...\") or per-axis values { major = ..., minor = ... }")
			return qs, false
		}
	}
	for a, name := range []string{"major", "minor"} {
		if _, ok := at.m[name]; !ok {
			p.errorf(at.path, "a per-axis table needs both major and minor (or give one value for both axes)")
			continue
		}
		qs[a] = p.q(at, name, o)
	}
	p.unknownOf(at, []string{"major", "minor"})
	return qs, true
}

// parse reads the whole study.
func (p *parser) parse() *Study {
	raw := p.doc
	if raw != nil {
		return p.parseDoc(raw)
	}
	if _, err := toml.Decode(p.data, &raw); err != nil {
		var pe toml.ParseError
		if errors.As(err, &pe) {
			msg := pe.Message
			if pe.Usage != "" {
				msg += " (" + strings.TrimSpace(strings.SplitN(pe.Usage, "\n", 2)[0]) + ")"
			}
			p.probs = append(p.probs, Problem{File: p.file, Line: pe.Position.Line, Key: pe.LastKey, Msg: "not valid TOML: " + msg})
		} else {
			p.probs = append(p.probs, Problem{File: p.file, Msg: "not valid TOML: " + err.Error()})
		}
		return nil
	}
	p.lines = keyLines(p.data)
	if p.edit == nil {
		// Text first: no later message may echo a control character.
		// (A derived case reads the same file, checked here once.)
		if hasBadText(raw) {
			p.checkText(raw, "")
			return nil
		}
	}
	p.raw = raw
	return p.parseDoc(raw)
}

// parseDoc reads the decoded document raw, its lines in p.lines.
func (p *parser) parseDoc(raw map[string]any) *Study {
	if p.edit != nil {
		p.edit(raw)
		p.relines(p.lines)
	}
	top := &table{m: raw, used: map[string]bool{}}
	st := p.st

	// Units first: they decide how every bare number reads.
	if u, ok := p.choice(top, "units", choicesOf("", "units")); ok {
		p.sys = systems[u]
	} else if _, given := raw["units"]; !given {
		p.defaultf("units: not given; bare numbers are read in N, mm and MPa")
	}
	st.Units = p.sys
	if t, ok := p.str(top, "title"); ok {
		st.Title = t
	} else if _, given := raw["title"]; !given {
		st.Title = strings.TrimSuffix(filepath.Base(p.file), filepath.Ext(p.file))
		p.defaultf("title: not given; the file name %q is used", st.Title)
	}

	p.member(top)
	p.material(top)
	p.imperfection(top)
	p.loads(top)
	p.bending(top) // bending.go
	p.capacity(top)
	p.target(top)
	p.combinationTable(top) // combination.go
	p.codeCheck(top)        // codecheck_keys.go
	p.record(top)           // record.go
	p.life(top)             // life.go
	p.analysis(top)
	p.sensitivity(top)
	if st.ModelTraits().Expensive && (top.m["sensitivity"] == nil || !hasKey(top.m["sensitivity"], "sobol")) {
		// Sobol indices need tens of thousands of evaluations: too slow for
		// a numerical model unless asked for.
		st.Sensitivity.Sobol = false
		p.defaultf("sensitivity.sobol: off for model %s unless asked for (each evaluation is a numerical analysis)", st.Model)
	}
	p.output(top)
	p.sweep(top)
	p.variants(top)
	p.inventory(top)   // inventory.go
	p.calibration(top) // calibration.go
	if _, ok := raw["correlation"]; ok {
		top.used["correlation"] = true // read once the variables are known
	}
	if _, ok := raw["measurements"]; ok {
		top.used["measurements"] = true // read once the distributions are built
	}
	p.unknown(top)
	if len(p.probs) > 0 {
		return st
	}

	// Quantities in the order of the file.
	sort.SliceStable(st.Quantities, func(i, j int) bool { return st.Quantities[i].Line < st.Quantities[j].Line })

	// L/n values become millimetres when the length is fixed.
	length := 0.0
	if st.Length != nil && !st.Length.Random() {
		length = st.Length.Value
	}
	for _, q := range st.Quantities {
		p.resolve(q, length)
	}
	for _, q := range st.Quantities {
		if q.spec != nil {
			p.build(q, p.opts[q])
		}
	}
	p.loadPeriods() // period.go
	p.combine()     // combination.go
	p.lifeBuild()   // life.go
	if len(p.probs) > 0 {
		return st
	}
	p.measurements(top)
	if len(p.probs) > 0 {
		return st
	}
	p.correlation(top)
	p.lifeCorrelation() // life.go
	p.checkShared()     // inventory.go
	p.checkModel()
	p.checkSection()
	if len(p.probs) == 0 {
		p.checkClass()         // class.go
		p.checkMaterial()      // materialcheck.go
		p.tableCurves()        // curvechoice.go
		p.checkImperfections() // imperfections.go
		p.twistingNotes()
		p.checkBending() // bending.go
	}
	if len(p.probs) == 0 {
		p.normaliseLoads() // normalise.go
		p.normaliseSwept() // normalise_swept.go
	}
	return st
}

func hasKey(v any, k string) bool {
	m, ok := v.(map[string]any)
	if !ok {
		return false
	}
	_, has := m[k]
	return has
}

// required reports a missing key.
func (p *parser) required(t *table, key, what string) {
	p.errorf(t.key(key), "missing: %s", what)
}

func (p *parser) member(top *table) {
	t := p.sub(top, "member")
	if t == nil {
		if _, ok := top.m["member"]; !ok {
			p.errorf("member", "missing table [member]: add it with length and a [member.section]")
		}
		return
	}
	st := p.st
	if st.Length = p.q(t, "length", qopt{dim: Length, need: positive}); st.Length == nil {
		if _, ok := t.m["length"]; !ok {
			p.required(t, "length", "the member length, e.g. length = \"5.2 m\"")
		}
	}
	kOpt := qopt{dim: Dimensionless, need: positive}
	kBoth, hasK := p.perAxis(t, "k", kOpt)
	kMaj := p.q(t, "k_major", kOpt)
	kMin := p.q(t, "k_minor", kOpt)
	ends, hasEnds := p.str(t, "ends")
	sOpt := qopt{dim: Spring, need: nonNegative, inf: true}
	top2, hasTop := p.perAxis(t, "spring_top", sOpt)
	bot, hasBot := p.perAxis(t, "spring_bottom", sOpt)

	endK := 0.0
	if hasEnds {
		canon, ok := endNames[ends]
		if !ok {
			names := sortedKeys(endNames)
			if near, ok := nearest(ends, names); ok {
				p.errorf(t.key("ends"), "%q is not an end condition; did you mean %q?", ends, near)
			} else {
				p.errorf(t.key("ends"), "%q is not an end condition: use one of %s", ends, strings.Join(names, ", "))
			}
			hasEnds = false
		} else {
			k, err := endsK(canon)
			if err != nil {
				p.errorf(t.key("ends"), "%v", err)
				hasEnds = false
			}
			endK = k
			p.fixedEndsNote(canon, k, p.line(t.key("ends")))
		}
	}
	for a, axis := range []string{"major", "minor"} {
		var how []string
		var spec EndSpec
		if hasK {
			how = append(how, t.key("k"))
			spec = EndSpec{How: "k", K: kBoth[a]}
		}
		if own := []*Quantity{kMaj, kMin}[a]; own != nil {
			how = append(how, own.Path)
			spec = EndSpec{How: "k", K: own}
		}
		if hasEnds {
			how = append(how, t.key("ends"))
			spec = EndSpec{How: "ends", Ends: ends, K: &Quantity{Path: t.key("ends"), Value: endK, Line: p.line(t.key("ends"))}}
		}
		if hasTop || hasBot {
			if hasTop {
				how = append(how, t.key("spring_top"))
			} else {
				how = append(how, t.key("spring_bottom"))
			}
			spec = EndSpec{How: "springs", Top: top2[a], Bottom: bot[a]}
			if !hasTop || !hasBot {
				missing := "spring_bottom"
				if !hasTop {
					missing = "spring_top"
				}
				p.errorf(t.key(missing), "missing: end springs need both spring_top and spring_bottom (0 for a pinned end, \"rigid\" for a fixed one)")
			}
		}
		switch len(how) {
		case 0:
			spec = EndSpec{How: "default", K: &Quantity{Path: "member.k_" + axis, Value: 1}}
			p.defaultf("member.k_%s: no k, ends or springs for the %s axis; K = 1 (pinned-pinned) is used", axis, axis)
			p.warnf("member.k_%s: the %s axis has no end conditions given; K = 1 assumed", axis, axis)
		case 1:
		default:
			// Report at the later of the keys in the file.
			at := how[0]
			for _, k := range how {
				if p.line(k) >= p.line(at) {
					at = k
				}
			}
			p.errorf(at, "the %s axis has two end specifications (%s): give one", axis, strings.Join(how, " and "))
		}
		p.st.Ends[a] = spec
	}
	p.rigidSpringsNote()
	p.section(t)
	p.unknown(t)
}

// endNames maps accepted end-condition names to the canonical ones.
var endNames = map[string]string{
	"pinned-pinned": "pinned-pinned",
	"fixed-free":    "fixed-free", "free-fixed": "fixed-free",
	"fixed-fixed":  "fixed-fixed",
	"fixed-pinned": "fixed-pinned", "pinned-fixed": "fixed-pinned",
}

func (p *parser) section(member *table) {
	t := p.sub(member, "section")
	if t == nil {
		if _, ok := member.m["section"]; !ok {
			p.errorf("member.section", "missing table [member.section]: give shape and its dimensions, e.g. shape = \"I\", depth, width, flange, web")
		}
		return
	}
	shapes := choicesOf("member.section", "shape")
	name, ok := p.str(t, "shape")
	if !ok {
		if _, given := t.m["shape"]; !given {
			p.required(t, "shape", "shape = one of "+strings.Join(shapes, ", "))
		}
		p.markAll(t)
		return
	}
	canon := ""
	for _, s := range shapes {
		if strings.EqualFold(s, name) {
			canon = s
		}
	}
	if canon == "" {
		if near, ok := nearest(name, shapes); ok {
			p.errorf(t.key("shape"), "%q is not a shape; did you mean %q?", name, near)
		} else {
			p.errorf(t.key("shape"), "%q is not a shape: use one of %s", name, strings.Join(shapes, ", "))
		}
		p.markAll(t)
		return
	}
	shape, err := column.ParseShape(canon)
	if !p.parseError(t.key("shape"), err) {
		p.markAll(t)
		return
	}
	keys := shapeDims[shape]
	spec := SectionSpec{Shape: shape, Name: canon, Dims: map[string]*Quantity{}}
	for _, k := range keys.required {
		if _, given := t.m[k]; !given {
			p.required(t, k, fmt.Sprintf("shape %s needs %s", canon, strings.Join(keys.required, ", ")))
			continue
		}
		if q := p.q(t, k, sectionDims[dimIndex(k)].opt); q != nil {
			spec.Dims[k] = q
		}
	}
	for _, k := range keys.optional {
		if q := p.q(t, k, sectionDims[dimIndex(k)].opt); q != nil {
			spec.Dims[k] = q
		}
	}
	if _, given := t.m["thickness_loss"]; given && shape == column.ShapeCustom {
		t.used["thickness_loss"] = true
		p.errorf(t.key("thickness_loss"), "a custom section has no faces to lose thickness from: reduce area, i_major, i_minor instead")
	}
	p.fabrication(t, &spec)
	// Keys that belong to another shape get a pointed message.
	for _, k := range sortedKeys(t.m) {
		if t.used[k] || k == "shape" || k == "fabrication" {
			continue
		}
		if dimIndex(k) >= 0 {
			t.used[k] = true
			p.errorf(t.key(k), "shape %s does not take %s (it takes %s)", canon, k, strings.Join(append(append([]string{}, keys.required...), keys.optional...), ", "))
		}
	}
	p.unknownOf(t, append(append([]string{"shape", "fabrication"}, keys.required...), keys.optional...))
	p.st.Section = spec
}

func (p *parser) markAll(t *table) {
	for k := range t.m {
		t.used[k] = true
	}
}

func (p *parser) material(top *table) {
	t := p.sub(top, "material")
	if t == nil {
		if _, ok := top.m["material"]; !ok {
			p.errorf("material", "missing table [material]: give modulus and yield")
		}
		return
	}
	p.materialKind(t) // materials.go
	o := qopt{dim: Stress, need: positive}
	p.materialModulus(t, o)
	p.materialStrength(t, o)
	p.st.Shear = p.q(t, "shear_modulus", o)
	p.unknown(t)
}

func (p *parser) imperfection(top *table) {
	t := p.sub(top, "imperfection")
	if t == nil {
		return
	}
	o := qopt{dim: Length, rel: true}
	p.st.Bow = p.q(t, "bow", o)
	p.st.Ecc = p.q(t, "eccentricity", o)
	p.st.Sway = p.q(t, "sway", qopt{dim: Dimensionless, frac: true})
	p.unknown(t)
}

func (p *parser) loads(top *table) {
	t := p.sub(top, "loads")
	if t == nil {
		if _, ok := top.m["loads"]; !ok {
			p.errorf("loads", "missing table [loads]: give at least one axial load, e.g. dead = \"620 kN\"")
		}
		return
	}
	// Loads keep the order of the file.
	names := sortedKeys(t.m)
	sort.SliceStable(names, func(i, j int) bool { return p.line(t.key(names[i])) < p.line(t.key(names[j])) })
	for _, k := range names {
		if k == "effect_factor" {
			p.st.EffectFactor = p.q(t, k, qopt{dim: Dimensionless, need: positive})
			continue
		}
		if near, ok := nearest(k, []string{"effect_factor"}); ok && len(k) > 6 {
			t.used[k] = true
			p.errorf(t.key(k), "unknown key in [loads]; did you mean loads.%s? (if it is a load, name it differently)", near)
			continue
		}
		if q := p.q(t, k, qopt{dim: Force, period: true}); q != nil {
			p.st.Loads = append(p.st.Loads, q)
		}
	}
	if len(t.m) == 0 || len(t.m) == 1 && t.m["effect_factor"] != nil {
		p.errorf("loads", "no loads: give at least one axial load, e.g. dead = \"620 kN\"")
	}
}

func (p *parser) capacity(top *table) {
	t := p.sub(top, "capacity")
	st := p.st
	st.Axis = column.Both
	if t == nil {
		t = &table{path: "capacity", m: map[string]any{}, used: map[string]bool{}}
	}
	if m, ok := p.choice(t, "model", choicesOf("capacity", "model")); ok {
		st.Model = modelNamed(m)
	} else if _, given := t.m["model"]; !given {
		st.Model = defaultModel
		p.defaultf("capacity.model: not given; %s is used", defaultModel)
	}
	if a, ok := p.choice(t, "axis", choicesOf("capacity", "axis")); ok {
		var err error
		st.Axis, err = column.ParseAxis(a)
		p.parseError(t.key("axis"), err)
	} else if _, given := t.m["axis"]; !given {
		p.defaultf("capacity.axis: not given; both axes are checked and each sample takes the weaker")
	}
	st.ModelFactor = p.q(t, "model_factor", qopt{dim: Dimensionless, need: positive})

	// Buckling curve: by name or by alpha, once or per axis.
	curves, hasCurve := p.curves(t)
	alphas, hasAlpha := p.perAxis(t, "alpha", qopt{dim: Dimensionless, need: nonNegative})
	if hasCurve && hasAlpha {
		p.errorf(t.key("alpha"), "give curve or alpha, not both")
	}
	if hasCurve {
		for a, c := range curves {
			if c == "" {
				continue
			}
			st.Curve[a] = c
			st.Alpha[a] = &Quantity{Path: t.key("curve"), Line: p.line(t.key("curve")), Value: st.kindAlpha(c, a)}
		}
	}
	if hasAlpha {
		st.Alpha = alphas
	}
	if imp, ok := p.choice(t, "imperfection", []string{"geometric", "equivalent"}); ok {
		st.Imperfection = imp
	}
	if (hasCurve || hasAlpha) && st.Model != nil && !st.ModelTraits().Curve && st.Imperfection != "equivalent" {
		key := "curve"
		if hasAlpha {
			key = "alpha"
		}
		p.errorf(t.key(key), "%s applies to model = %q or imperfection = \"equivalent\" only (the model is %q)", key, bucklingCurve{}, st.Model)
	}
	// Without curve or alpha, model "curve" takes EN 1993-1-1 Table 6.2's
	// (curvechoice.go).

	p.modelOptions(t) // capmodel.go
	p.unknown(t)
}

// curveAlpha is the imperfection factor of a buckling curve's name
// (column.CurveAlpha, EN 1993-1-1:2005 Table 6.1), 0 for an unknown name.
func curveAlpha(name string) float64 {
	a, _ := column.CurveAlpha(name)
	return a
}

func (p *parser) curves(t *table) (c [2]string, given bool) {
	v, ok := t.get("curve")
	if !ok {
		return c, false
	}
	check := func(key string, v any) string {
		s, ok := v.(string)
		if !ok {
			p.errorf(key, "a buckling curve is a name in quotes: \"a0\", \"a\", \"b\", \"c\" or \"d\"")
			return ""
		}
		if !p.validCurve(key, s) { // materials.go
			return ""
		}
		return s
	}
	if m, ok := v.(map[string]any); ok {
		at := &table{path: t.key("curve"), m: m, used: map[string]bool{}}
		for a, name := range []string{"major", "minor"} {
			x, ok := at.get(name)
			if !ok {
				p.errorf(at.path, "a per-axis table needs both major and minor (or give one curve for both axes)")
				continue
			}
			c[a] = check(at.key(name), x)
		}
		p.unknownOf(at, []string{"major", "minor"})
		return c, true
	}
	s := check(t.key("curve"), v)
	return [2]string{s, s}, true
}

// profile reads measured bow offsets.
func (p *parser) profile(key string, v any) []float64 {
	list, ok := v.([]any)
	if !ok || len(list) < 3 {
		p.errorf(key, "profile must be a list of at least 3 measured offsets at equal spacing, e.g. [0.0, 1.8, 3.1, 2.6, 0.0]")
		return nil
	}
	out := make([]float64, len(list))
	for i, x := range list {
		pv, ok := p.scalar(fmt.Sprintf("%s[%d]", key, i), x, qopt{dim: Length})
		if !ok {
			return nil
		}
		out[i] = pv.v
	}
	return out
}

func (p *parser) target(top *table) {
	t := p.sub(top, "target")
	if t == nil {
		// No [target]: the loads with permanent names are still
		// permanent for characteristic values and the code check.
		for _, q := range p.st.Loads {
			if slices.Contains(permanentNames, strings.TrimPrefix(q.Path, "loads.")) {
				p.st.PermanentLoads = append(p.st.PermanentLoads, q.Path)
			}
		}
		return
	}
	p.targetBeta(t) // targetsource.go
	p.reserve(t)
	p.unknown(t)
}

// MaxSamples bounds analysis.samples and run --samples; MaxSamplesText
// writes it as people read it ("1e10").
const MaxSamples = 1e10

// MaxSamplesText is MaxSamples as the key table and messages write it.
var MaxSamplesText = strings.Replace(strconv.FormatFloat(MaxSamples, 'g', -1, 64), "e+", "e", 1)

func (p *parser) analysis(top *table) {
	t := p.sub(top, "analysis")
	a := &p.st.Analysis
	if t == nil {
		t = &table{path: "analysis", m: map[string]any{}, used: map[string]bool{}}
	}
	methods := choicesOf("analysis", "method")
	if m, ok := p.choice(t, "method", methods); ok {
		a.Method = methodOf(m)
	} else if _, given := t.m["method"]; !given {
		a.Method = methodOf("auto")
		p.defaultf("analysis.method: not given; auto picks the estimator")
	}
	if n, ok := p.count(t, "samples", MaxSamples); ok {
		a.Samples = int64(n)
	} else if _, given := t.m["samples"]; !given {
		a.Samples = sim.DefaultSamples
		p.defaultf("analysis.samples: not given; at most %d evaluations", a.Samples)
	}
	if c, ok := p.number(t, "target_cov"); ok {
		if !(c > 0 && c < 1) {
			p.errorf(t.key("target_cov"), "target_cov = %g must be between 0 and 1 (e.g. 0.05)", c)
		}
		a.TargetCoV = c
	} else if _, given := t.m["target_cov"]; !given {
		a.TargetCoV = 0.05
		p.defaultf("analysis.target_cov: not given; sampling stops once the cov of pf is 0.05")
	}
	if s, ok := p.count(t, "seed", math.MaxInt64); ok {
		a.Seed = uint64(s)
	} else if _, given := t.m["seed"]; !given {
		a.Seed = 1
		p.defaultf("analysis.seed: not given; seed 1")
	}
	p.unknown(t)
}

// count reads a whole number in [0, max] (1 or more for samples).
func (p *parser) count(t *table, key string, max float64) (float64, bool) {
	v, ok := t.get(key)
	if !ok {
		return 0, false
	}
	f, ok := tomlNumber(v)
	if !ok {
		p.errorf(t.key(key), "must be a whole number, not %s", tomlType(v))
		return 0, false
	}
	switch {
	case math.IsNaN(f) || f != math.Trunc(f):
		p.errorf(t.key(key), "%v must be a whole number", v)
	case f < 0 || key == "samples" && f < 1:
		p.errorf(t.key(key), "%v must be positive", v)
	case f > max:
		p.errorf(t.key(key), "%v is more than %g: lower it", v, max)
	default:
		return f, true
	}
	return 0, false
}

func (p *parser) sensitivity(top *table) {
	s := &p.st.Sensitivity
	s.Tornado, s.TornadoLow, s.TornadoHigh = true, 0.05, 0.95
	s.Sobol, s.SobolSamples = true, 2048
	t := p.sub(top, "sensitivity")
	if t == nil {
		p.defaultf("sensitivity: not given; tornado between the 5 %% and 95 %% fractiles")
		if !p.st.ModelTraits().Expensive {
			p.defaultf("sensitivity.sobol: not given; Sobol indices from 2048 samples")
		}
		return
	}
	if v, ok := t.get("tornado"); ok {
		switch x := v.(type) {
		case bool:
			s.Tornado = x
		case map[string]any:
			tt := &table{path: t.key("tornado"), m: x, used: map[string]bool{}}
			if lo, ok := p.number(tt, "low"); ok {
				s.TornadoLow = lo
			}
			if hi, ok := p.number(tt, "high"); ok {
				s.TornadoHigh = hi
			}
			if !(s.TornadoLow > 0 && s.TornadoLow < s.TornadoHigh && s.TornadoHigh < 1) {
				p.errorf(tt.path, "low and high are fractiles with 0 < low < high < 1, e.g. { low = 0.05, high = 0.95 }")
			}
			p.unknownOf(tt, []string{"low", "high"})
		default:
			p.errorf(t.key("tornado"), "tornado is true, false or { low = 0.05, high = 0.95 }")
		}
	}
	if v, ok := t.get("sobol"); ok {
		switch x := v.(type) {
		case bool:
			s.Sobol = x
		case map[string]any:
			tt := &table{path: t.key("sobol"), m: x, used: map[string]bool{}}
			if n, ok := p.count(tt, "samples", 1e7); ok {
				if n < 64 {
					p.errorf(tt.key("samples"), "%g samples are too few for Sobol indices: give 1000 or more", n)
				}
				s.SobolSamples = int(n)
			}
			p.unknownOf(tt, []string{"samples"})
		default:
			p.errorf(t.key("sobol"), "sobol is true, false or { samples = 20000 }")
		}
	}
	p.unknown(t)
}

func (p *parser) output(top *table) {
	t := p.sub(top, "output")
	o := &p.st.Output
	if t == nil {
		return
	}
	if d, ok := p.str(t, "dir"); ok {
		if strings.TrimSpace(d) == "" {
			p.errorf(t.key("dir"), "dir is empty: give a folder, e.g. \"out/bay3\"")
		}
		o.Dir, o.DirLine = d, p.line(t.key("dir"))
	}
	if v, ok := t.get("formats"); ok {
		known := choicesOf("output", "formats")
		list, ok := v.([]any)
		if !ok {
			p.errorf(t.key("formats"), "formats is a list, e.g. [\"html\", \"json\", \"csv\"]")
		}
		for i, x := range list {
			s, _ := x.(string)
			found := false
			for _, k := range known {
				found = found || k == s
			}
			if !found {
				p.errorf(fmt.Sprintf("%s[%d]", t.key("formats"), i), "%v is not a format: use %s", x, strings.Join(known, ", "))
				continue
			}
			o.Formats = append(o.Formats, s)
		}
	}
	p.unknown(t)
}
