package assess

import (
	"fmt"
	"math"

	"strutrisk/sim"
)

// Consequences are the accepted consequence levels, lowest first.
var Consequences = []string{"low", "medium", "high"}

// CostsOfSafety are the accepted relative costs of safety measures.
var CostsOfSafety = []string{"low", "normal", "high"}

// en1990B2 are the target reliability indices of EN 1990:2002 Annex B,
// Table B2, for the reliability classes RC1, RC2 and RC3 (consequence
// classes CC1, CC2, CC3 of Table B1), ultimate limit states, for reference
// periods of 1 and 50 years (from memory).
var en1990B2 = map[string]struct {
	class          string
	year1, years50 float64
}{
	"low":    {"RC1", 4.2, 3.3},
	"medium": {"RC2", 4.7, 3.8},
	"high":   {"RC3", 5.2, 4.3},
}

// iso2394Annual are the target reliability indices for a one-year
// reference period tabulated in ISO 2394:2015 and in the JCSS
// Probabilistic Model Code, Part 1 (its table of target reliability
// indices for one year and ultimate limit states), by the relative cost of
// safety measures (rows) and the consequences of failure (columns: minor,
// moderate, large, here "low", "medium", "high"); from memory.
var iso2394Annual = map[string]map[string]float64{
	"high":   {"low": 3.1, "medium": 3.3, "high": 3.7},
	"normal": {"low": 3.7, "medium": 4.2, "high": 4.4},
	"low":    {"low": 4.2, "medium": 4.4, "high": 4.7},
}

// Target is a target reliability index with the reference period it
// applies to and where it came from.
type Target struct {
	// Beta applies to a reference period of Years years.
	Beta, Years float64
	// Source says where Beta came from, as a reader should see it.
	Source string
}

// BetaOverYears converts a reliability index for one year into one for a
// reference period of n years, by Phi(beta_n) = Phi(beta_1)^n: failures in
// different years are taken as independent events of equal probability
// (EN 1990:2002 Annex C, expression C.3, from memory). n may be below 1 (the inverse conversion).
func BetaOverYears(beta1, n float64) float64 {
	if n == 1 {
		return beta1
	}
	// 1 - (1 - pf1)^n without cancellation for small pf1.
	pf1 := sim.PfFromBeta(beta1)
	pf := -math.Expm1(n * math.Log1p(-pf1))
	return sim.BetaFromPf(pf)
}

// EN1990Target returns the target of EN 1990 Annex B, Table B2, for a
// consequence level ("low", "medium", "high": RC1, RC2, RC3) over a
// reference period of years: the tabulated value for 1 or 50 years, the
// 1-year value converted by BetaOverYears for any other period.
func EN1990Target(consequence string, years float64) (Target, error) {
	row, ok := en1990B2[consequence]
	if !ok {
		return Target{}, fmt.Errorf("consequence %q is not one of low, medium, high", consequence)
	}
	if !(years > 0) || math.IsInf(years, 0) {
		return Target{}, fmt.Errorf("reference period of %g years: give a positive duration", years)
	}
	src := fmt.Sprintf("EN 1990 Annex B Table B2, %s (consequence %s)", row.class, consequence)
	switch years {
	case 1:
		return Target{Beta: row.year1, Years: 1, Source: src + ", 1-year value"}, nil
	case 50:
		return Target{Beta: row.years50, Years: 50, Source: src + ", 50-year value"}, nil
	}
	b := BetaOverYears(row.year1, years)
	return Target{Beta: b, Years: years, Source: fmt.Sprintf("%s, 1-year value %.1f converted to %s: Phi(beta_n) = Phi(beta_1)^n, independent years", src, row.year1, YearsText(years))}, nil
}

// ISO2394Target returns the annual target of ISO 2394:2015 and the JCSS
// Probabilistic Model Code for a relative cost of safety measures ("low",
// "normal", "high") and a consequence level ("low", "medium", "high":
// minor, moderate, large), converted to a reference period of years by
// BetaOverYears.
func ISO2394Target(cost, consequence string, years float64) (Target, error) {
	row, ok := iso2394Annual[cost]
	if !ok {
		return Target{}, fmt.Errorf("cost_of_safety %q is not one of low, normal, high", cost)
	}
	b1, ok := row[consequence]
	if !ok {
		return Target{}, fmt.Errorf("consequence %q is not one of low, medium, high", consequence)
	}
	if !(years > 0) || math.IsInf(years, 0) {
		return Target{}, fmt.Errorf("reference period of %g years: give a positive duration", years)
	}
	src := fmt.Sprintf("ISO 2394:2015 / JCSS annual target (%s relative cost of safety, %s consequence)", cost, consequence)
	if years == 1 {
		return Target{Beta: b1, Years: 1, Source: src}, nil
	}
	return Target{Beta: BetaOverYears(b1, years), Years: years, Source: fmt.Sprintf("%s %.1f converted to %s: Phi(beta_n) = Phi(beta_1)^n, independent years", src, b1, YearsText(years))}, nil
}

// YearsText writes a duration in years: "1 year", "50 years", "0.5 years".
func YearsText(years float64) string {
	if years == 1 {
		return "1 year"
	}
	return fmt.Sprintf("%g years", years)
}
