package study

import (
	"fmt"
	"strings"
)

// SweptAxes are the swept keys of the study: the one of a plain [sweep],
// the axes of a grid, none without a sweep.
func (s *Study) SweptAxes() []*Sweep {
	switch {
	case s.Grid != nil:
		return s.Grid.Axes
	case s.Sweep != nil:
		return []*Sweep{s.Sweep}
	}
	return nil
}

// SweptPoints is the number of swept points: the values of a plain
// sweep, the combinations (or zipped values) of a grid, 0 without one.
func (s *Study) SweptPoints() int {
	switch {
	case s.Grid != nil:
		return len(s.Grid.Points)
	case s.Sweep != nil:
		return len(s.Sweep.Values)
	}
	return 0
}

// pointIndex is the index in the values of axis a at swept point i.
func (s *Study) pointIndex(i, a int) int {
	if s.Grid != nil {
		return s.Grid.Points[i][a]
	}
	return i
}

// PointValues are the values of swept point i, one per axis of
// SweptAxes, in N, mm and MPa (a fraction of the length for L/n).
func (s *Study) PointValues(i int) []float64 {
	axes := s.SweptAxes()
	out := make([]float64, len(axes))
	for a, sw := range axes {
		out[a] = sw.Values[s.pointIndex(i, a)].Value
	}
	return out
}

// pointSettings are the overrides of swept point i, and the point as
// text ("member.length = 3 m, imperfection.bow = L/500").
func (s *Study) pointSettings(i int) ([]override, string) {
	var ovs []override
	var where []string
	for a, sw := range s.SweptAxes() {
		j := s.pointIndex(i, a)
		at := sw.Values[j].Path
		if sw.Scale != "list" {
			at = sw.at
		}
		where = append(where, fmt.Sprintf("%s = %v", sw.Parameter, sw.raw[j]))
		ovs = append(ovs, override{key: sw.Parameter, value: sw.raw[j], at: at})
	}
	return ovs, strings.Join(where, ", ")
}

// overrides are the changes of one case: variant v (-1 for none) at
// swept point i (-1 for none).
func (s *Study) overrides(v, i int) []override {
	var ovs []override
	label := "the study"
	if v >= 0 {
		va := s.Variants[v]
		label = fmt.Sprintf("variant %q", va.Name)
		for _, o := range va.set {
			o.label = label
			ovs = append(ovs, o)
		}
	}
	if i >= 0 && i < s.SweptPoints() {
		swept, where := s.pointSettings(i)
		if v >= 0 {
			where = label + " at " + where
		}
		for k := range ovs {
			ovs[k].label = where
		}
		// The swept values come last: they win over a variant's setting.
		for _, o := range swept {
			o.label = where
			ovs = append(ovs, o)
		}
	}
	return ovs
}

// Derive returns the study as variant v (an index of Variants, -1 for the
// study itself) at swept point i (an index below SweptPoints, -1 for
// none): the study file read again with the variant's keys and the swept
// values set, without its sweep and variants. Parse has checked every
// case, so an error here is unexpected.
func (s *Study) Derive(v, i int) (*Study, error) {
	if v < -1 || v >= len(s.Variants) || i < -1 || i >= s.SweptPoints() {
		return nil, fmt.Errorf("study: no case variant %d, swept point %d", v, i)
	}
	st, probs := derive(s.File, s.src, s.overrides(v, i))
	if len(probs) > 0 {
		return nil, &Error{Problems: probs}
	}
	st.File, st.SHA256, st.Data = s.File, s.SHA256, s.Data
	return st, nil
}

// Case is one run of a study's sweep and variants beside its own.
type Case struct {
	// Variant is an index of Variants, -1 for the study itself; Point an
	// index of the swept points, -1 at the study's own values.
	Variant, Point int
	// Name says the case as the study file writes it: `variant "bow
	// L/500" at member.length = "3 m"`.
	Name string
}

// CaseList is every case of the study beside its own run, in the order
// a run takes them: the study at every swept point, then each variant at
// the study's values and at every swept point. Derive reads each;
// calibration and the sweep iterate this one list.
func (s *Study) CaseList() []Case {
	var out []Case
	n := s.SweptPoints()
	for v := -1; v < len(s.Variants); v++ {
		for i := -1; i < n; i++ {
			if v < 0 && i < 0 {
				continue // the study's own run
			}
			var parts []string
			if v >= 0 {
				parts = append(parts, fmt.Sprintf("variant %q", s.Variants[v].Name))
			}
			if i >= 0 {
				_, where := s.pointSettings(i)
				parts = append(parts, where)
			}
			out = append(out, Case{Variant: v, Point: i, Name: strings.Join(parts, " at ")})
		}
	}
	return out
}

// checkCases reads every variant at every swept point (and each alone)
// and returns their problems, each reported once.
func (s *Study) checkCases() *Error {
	if s.SweptPoints() == 0 && len(s.Variants) == 0 {
		return nil
	}
	n := s.SweptPoints()
	if cases := s.Cases(); cases > MaxCases {
		key, line := "variant", s.src.parts["sweep"]["variant"]
		if n > len(s.Variants) {
			key, line = "sweep", firstLine(s.src.parts["sweep"], "sweep")
		}
		what := "values"
		if s.Grid != nil {
			what = "points"
		}
		return &Error{Problems: []Problem{{File: s.File, Line: line, Key: key, Msg: fmt.Sprintf(
			"%d cases (the study and %d variants, at %d swept %s) are more than the %d a study may run: split it into several studies",
			cases, len(s.Variants), n, what, MaxCases)}}}
	}
	var out []Problem
	seen := map[string]bool{}
	more := 0
	for _, c := range s.CaseList() {
		_, probs := derive(s.File, s.src, s.overrides(c.Variant, c.Point))
		for _, pr := range probs {
			pr.File = s.File
			if k := pr.String(); !seen[k] {
				seen[k] = true
				if len(out) >= maxProblems {
					more++
					continue
				}
				out = append(out, pr)
			}
		}
	}
	if len(out) == 0 {
		return nil
	}
	return &Error{Problems: out, Unlisted: more}
}

// Cases is the number of runs after the study's own: each variant, and
// the study and each variant at each swept point.
func (s *Study) Cases() int {
	return (len(s.Variants)+1)*(s.SweptPoints()+1) - 1
}

// firstLine is the first line of the keys of lines under prefix: the line
// of [sweep], or of the first [[sweep.axis]] when [sweep] is not written.
func firstLine(lines map[string]int, prefix string) int {
	first := 0
	for k, n := range lines {
		if (k == prefix || strings.HasPrefix(k, prefix+".")) && n > 0 && (first == 0 || n < first) {
			first = n
		}
	}
	return first
}
