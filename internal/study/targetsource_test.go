package study

import (
	"errors"
	"math"
	"strconv"
	"strings"
	"testing"

	"gonum.org/v1/gonum/stat/distuv"

	"strutrisk/internal/assess"
)

// TestTargetSources: the target from beta, from EN 1990 Annex B Table B2
// (consequence) and from the ISO 2394 / JCSS annual table (cost_of_safety
// with consequence), with the reference period applied.
func TestTargetSources(t *testing.T) {
	// beta_n from beta_1 for independent years: Phi(beta_n) =
	// Phi(beta_1)^n (EN 1990 Annex C, from memory), with gonum's normal.
	over := func(b1, n float64) float64 {
		return -distuv.UnitNormal.Quantile(1 - math.Pow(distuv.UnitNormal.CDF(b1), n))
	}
	for _, c := range []struct {
		keys   string
		beta   float64
		years  float64
		source string // fragment
		period string
	}{
		{"beta = 3.1\nreference_period = \"1 year\"", 3.1, 1, "target.beta as given", "1 year"},
		{"beta = 3.8", 3.8, 0, "target.beta as given", ""},
		// EN 1990 Annex B Table B2 (from memory): RC2 4.7 for 1 year, 3.8
		// for 50; RC1 3.3 for 50 years; RC3 5.2 for 1 year.
		{"consequence = \"medium\"", 3.8, 50, "EN 1990 Annex B Table B2, RC2", "50 years"},
		{"consequence = \"low\"\nreference_period = \"50 years\"", 3.3, 50, "RC1", "50 years"},
		{"consequence = \"high\"\nreference_period = \"1 year\"", 5.2, 1, "RC3", "1 year"},
		{"consequence = \"medium\"\nreference_period = \"25 years\"", over(4.7, 25), 25, "1-year value 4.7 converted to 25 years", "25 years"},
		// ISO 2394:2015 / JCSS annual targets (from memory): normal cost,
		// moderate consequence 4.2; large cost, minor consequence 3.1;
		// small cost, large consequence 4.7.
		{"consequence = \"medium\"\ncost_of_safety = \"normal\"", 4.2, 1, "ISO 2394:2015 / JCSS annual target", "1 year"},
		{"consequence = \"low\"\ncost_of_safety = \"high\"\nreference_period = \"1 year\"", 3.1, 1, "high relative cost", "1 year"},
		{"consequence = \"high\"\ncost_of_safety = \"low\"\nreference_period = \"50 years\"", over(4.7, 50), 50, "4.7 converted to 50 years", "50 years"},
	} {
		st := parse(t, base+"[target]\n"+c.keys+"\n")
		if !st.HasTarget || math.Abs(st.Target-c.beta) > 1e-9 || st.ReferenceYears != c.years ||
			!strings.Contains(st.TargetSource, c.source) || st.ReferencePeriod != c.period {
			t.Errorf("%q: beta %g, %g years (%q) from %q; want %g, %g years (%q) from %q",
				c.keys, st.Target, st.ReferenceYears, st.ReferencePeriod, st.TargetSource, c.beta, c.years, c.period, c.source)
		}
	}
}

// TestTargetReferencePeriodText: free text is still read, with a warning
// naming the key and its line; a table target then takes its default.
func TestTargetReferencePeriodText(t *testing.T) {
	line := strings.Count(base, "\n") + 3
	st := parse(t, base+"[target]\nbeta = 3.8\nreference_period = \"the design life\"\n")
	if st.ReferencePeriod != "the design life" || st.ReferenceYears != 0 || st.Target != 3.8 {
		t.Errorf("free text: %q, %g years, beta %g", st.ReferencePeriod, st.ReferenceYears, st.Target)
	}
	w := strings.Join(st.Warnings, "\n")
	if want := "target.reference_period (line " + strconv.Itoa(line) + "): \"the design life\" is not a duration"; !strings.Contains(w, want) {
		t.Errorf("warnings lack %q:\n%s", want, w)
	}
	st = parse(t, base+"[target]\nconsequence = \"medium\"\nreference_period = \"the design life\"\n")
	if st.Target != 3.8 || st.ReferenceYears != 50 || !strings.Contains(strings.Join(st.Defaults, "\n"), "target.reference_period: not a duration; the EN 1990 target applies to 50 years") {
		t.Errorf("free text with a consequence: beta %g, %g years; defaults %q", st.Target, st.ReferenceYears, st.Defaults)
	}
	if len(parse(t, base+"[target]\nbeta = 3.8\nreference_period = \"50 years\"\n").Warnings) != 0 {
		t.Error("a duration drew a warning")
	}
}

// TestTargetReferencePeriodImpossible: a reference period that starts
// with a number but is no positive duration is refused, naming the key
// and its line (it was read as a free-text note with a warning, and a
// table target took its default period).
func TestTargetReferencePeriodImpossible(t *testing.T) {
	line := strings.Count(base, "\n") + 3
	for _, c := range []struct{ value, msg string }{
		{`"-50 years"`, "positive"},
		{`"-50years"`, "positive"},
		{`"0 years"`, "positive"},
		{`"NaN years"`, "positive"},
		{`"inf years"`, "positive"},
		{`"50 kN"`, "not years, months, weeks or days"},
		{`"50"`, "write a number and a unit"},
		{`-50`, "not the bare number -50"},
		{`50.0`, "not the bare number 50"},
	} {
		for _, head := range []string{"beta = 3.8", "consequence = \"medium\""} {
			_, err := Parse("t.toml", []byte(base+"[target]\n"+head+"\nreference_period = "+c.value+"\n"))
			var se *Error
			if !errors.As(err, &se) {
				t.Errorf("%s with %s: accepted", c.value, head)
				continue
			}
			found := false
			for _, p := range se.Problems {
				if p.Key == "target.reference_period" && p.Line == line && strings.Contains(p.Msg, c.msg) {
					found = true
				}
			}
			if !found {
				t.Errorf("%s with %s: no problem on target.reference_period, line %d, saying %q: %v", c.value, head, line, c.msg, se.Problems)
			}
		}
	}
}

// TestTargetSourceErrors: each problem names the key and its line.
func TestTargetSourceErrors(t *testing.T) {
	line := strings.Count(base, "\n") + 2
	for _, c := range []struct{ keys, key, msg string }{
		{"beta = 3.8\nconsequence = \"medium\"", "target.beta", "either as beta or by consequence"},
		{"cost_of_safety = \"normal\"", "target.cost_of_safety", "needs a consequence too"},
		{"consequence = \"severe\"", "target.consequence", "not a choice"},
		{"consequence = \"medium\"\ncost_of_safety = \"medium\"", "target.cost_of_safety", "not a choice"},
		{"reference_period = \"50 years\"", "target.beta", "missing"},
	} {
		_, err := Parse("t.toml", []byte(base+"[target]\n"+c.keys+"\n"))
		var se *Error
		if !errors.As(err, &se) {
			t.Errorf("%q: no error", c.keys)
			continue
		}
		found := false
		for _, p := range se.Problems {
			if p.Key == c.key && strings.Contains(p.Msg, c.msg) {
				found = true
				if p.Line < line-1 {
					t.Errorf("%q: line %d, want the [target] table's (%d or after)", c.keys, p.Line, line-1)
				}
			}
		}
		if !found {
			t.Errorf("%q: want %s with %q, got\n%v", c.keys, c.key, c.msg, err)
		}
	}
}

// TestTargetChoicesAgree: the registry's choices are the tables' rows.
func TestTargetChoicesAgree(t *testing.T) {
	if got := strings.Join(choicesOf("target", "consequence"), ","); got != strings.Join(assess.Consequences, ",") {
		t.Errorf("consequence choices %s, tables %v", got, assess.Consequences)
	}
	if got := strings.Join(choicesOf("target", "cost_of_safety"), ","); got != strings.Join(assess.CostsOfSafety, ",") {
		t.Errorf("cost_of_safety choices %s, tables %v", got, assess.CostsOfSafety)
	}
}
