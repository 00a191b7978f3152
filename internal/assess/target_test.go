package assess

import (
	"math"
	"strings"
	"testing"

	"gonum.org/v1/gonum/stat/distuv"
)

// TestEN1990TableB2: the rows of EN 1990:2002 Annex B, Table B2 (from
// memory), minimum reliability indices for ultimate limit states:
//
//	class  1 year  50 years
//	RC3    5.2     4.3
//	RC2    4.7     3.8
//	RC1    4.2     3.3
func TestEN1990TableB2(t *testing.T) {
	for _, c := range []struct {
		consequence, class string
		year1, years50     float64
	}{
		{"high", "RC3", 5.2, 4.3},
		{"medium", "RC2", 4.7, 3.8},
		{"low", "RC1", 4.2, 3.3},
	} {
		for _, y := range []struct{ years, beta float64 }{{1, c.year1}, {50, c.years50}} {
			tg, err := EN1990Target(c.consequence, y.years)
			if err != nil {
				t.Fatal(err)
			}
			if tg.Beta != y.beta || tg.Years != y.years || !strings.Contains(tg.Source, c.class) {
				t.Errorf("%s over %g years: %+v, want beta %g from %s", c.consequence, y.years, tg, y.beta, c.class)
			}
		}
		// The table's 50-year values are its 1-year values converted for
		// independent years, rounded: within 0.15 (4.2 gives 3.21, 4.7
		// gives 3.83, 5.2 gives 4.42).
		if b := BetaOverYears(c.year1, 50); math.Abs(b-c.years50) > 0.15 {
			t.Errorf("%s: the 1-year %g converts to %.3f over 50 years, the table gives %g", c.class, c.year1, b, c.years50)
		}
		// Another period: the 1-year value converted.
		tg, _ := EN1990Target(c.consequence, 100)
		if want := BetaOverYears(c.year1, 100); tg.Beta != want || !strings.Contains(tg.Source, "independent years") {
			t.Errorf("%s over 100 years: %+v, want %g converted from 1 year", c.class, tg, want)
		}
	}
	if _, err := EN1990Target("severe", 50); err == nil {
		t.Error("an unknown consequence was accepted")
	}
}

// TestISO2394Annual: the rows of the ISO 2394:2015 / JCSS Probabilistic
// Model Code table of annual target reliability indices (from memory):
//
//	relative cost of safety  minor  moderate  large  (consequences)
//	large  ("high")          3.1    3.3       3.7
//	normal ("normal")        3.7    4.2       4.4
//	small  ("low")           4.2    4.4       4.7
func TestISO2394Annual(t *testing.T) {
	rows := []struct {
		cost string
		beta [3]float64
	}{
		{"high", [3]float64{3.1, 3.3, 3.7}},
		{"normal", [3]float64{3.7, 4.2, 4.4}},
		{"low", [3]float64{4.2, 4.4, 4.7}},
	}
	for _, r := range rows {
		for j, cons := range Consequences {
			tg, err := ISO2394Target(r.cost, cons, 1)
			if err != nil {
				t.Fatal(err)
			}
			if tg.Beta != r.beta[j] || tg.Years != 1 {
				t.Errorf("cost %s, consequence %s: %+v, want %g for 1 year", r.cost, cons, tg, r.beta[j])
			}
			tg, _ = ISO2394Target(r.cost, cons, 50)
			if want := BetaOverYears(r.beta[j], 50); tg.Beta != want || tg.Years != 50 {
				t.Errorf("cost %s, consequence %s over 50 years: %g, want %g", r.cost, cons, tg.Beta, want)
			}
		}
	}
	if _, err := ISO2394Target("medium", "low", 1); err == nil {
		t.Error("an unknown cost of safety was accepted")
	}
}

// TestBetaOverYears checks the conversion Phi(beta_n) = Phi(beta_1)^n
// against the probability of at least one failure in n independent
// years written out for small n (1 - (1 - p)^2 = 2p - p^2, and the
// binomial sum for 3 years), with gonum's normal quantile.
func TestBetaOverYears(t *testing.T) {
	std := distuv.UnitNormal
	for _, b1 := range []float64{2.5, 3.8, 4.7, 6} {
		p := std.Survival(b1)
		for _, c := range []struct {
			n  float64
			pf float64
		}{
			{2, 2*p - p*p},
			{3, 3*p - 3*p*p + p*p*p},
		} {
			want := -std.Quantile(c.pf)
			if got := BetaOverYears(b1, c.n); math.Abs(got-want) > 1e-6 {
				t.Errorf("beta_1 %g over %g years: %.9f, want %.9f", b1, c.n, got, want)
			}
		}
		// Back and forth: 1/n years inverts n years.
		if got := BetaOverYears(BetaOverYears(b1, 50), 1.0/50); math.Abs(got-b1) > 1e-9 {
			t.Errorf("beta_1 %g to 50 years and back: %.12f", b1, got)
		}
	}
	// A longer period has a lower index.
	if BetaOverYears(4.7, 50) >= 4.7 {
		t.Error("50 years is not below 1 year")
	}
}

func TestParseYears(t *testing.T) {
	for _, c := range []struct {
		in   string
		want float64
		bad  bool
	}{
		{"50 years", 50, false},
		{"1 year", 1, false},
		{"50years", 50, false},
		{"100 y", 100, false},
		{"6 months", 0.5, false},
		{" 25 Years ", 25, false},
		{"design life", 0, true},
		{"50", 0, true},
		{"-1 year", 0, true},
		{"0 years", 0, true},
		{"50 decades", 0, true},
	} {
		got, err := ParseYears(c.in)
		if c.bad != (err != nil) || !c.bad && math.Abs(got-c.want) > 1e-12 {
			t.Errorf("ParseYears(%q) = %g, %v; want %g (error %v)", c.in, got, err, c.want, c.bad)
		}
	}
}
