package study

import (
	"fmt"
	"strings"
)

// normaliseSwept warns, when code_check.normalise = "design", of each
// swept key and each variant's key that sets a load: the normalisation
// scales every case's loads again so that its design load equals its
// design resistance, so their level is cancelled. Only what the scaling
// keeps survives: the loads' spread and, without load_ratio, their
// proportion. A sweep or variant of a load's CoV keeps its meaning and is
// not warned of.
func (p *parser) normaliseSwept() {
	if p.st.CodeCheck.Normalise != NormaliseDesign {
		return
	}
	kept := "the loads' spread and their proportion"
	if p.st.CodeCheck.LoadRatio >= 0 {
		kept = "the loads' spread (code_check.load_ratio fixes their proportion)"
	}
	warn := func(at, key string) {
		p.warnf("%s: %s sets a load, but code_check.normalise = \"design\" scales the loads of every case so that the design load equals the design resistance: the level it sets is cancelled, only %s can change; to compare load levels, set normalise = \"none\"",
			at, key, kept)
	}
	for a, sw := range p.st.SweptAxes() {
		if loadKey(sw.Parameter) {
			at := "sweep.parameter"
			if p.st.Grid != nil {
				at = fmt.Sprintf("sweep.axis[%d].parameter", a)
			}
			warn(fmt.Sprintf("%s (line %d)", at, p.line(at)), sw.Parameter)
		}
	}
	for i, va := range p.st.Variants {
		for _, k := range va.Keys {
			if loadKey(k) {
				at := fmt.Sprintf("variant[%d].set.%s", i, k)
				warn(fmt.Sprintf("variant %q (line %d)", va.Name, p.line(at)), k)
			}
		}
	}
}

// loadKey tells whether the key path sets the level of a load: a load
// itself or a parameter of its distribution other than its CoV.
func loadKey(path string) bool {
	rest, ok := strings.CutPrefix(path, "loads.")
	if !ok || rest == "" {
		return false
	}
	for _, s := range []string{".cov", ".dist", ".duration"} {
		if strings.HasSuffix(rest, s) {
			return false
		}
	}
	return true
}
