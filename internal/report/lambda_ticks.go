package report

import (
	"sort"

	"gonum.org/v1/plot"
)

// lambdaTicks labels each major tick of a swept value with the study's
// relative slenderness there, on a second line: a second scale along the
// same axis (λ interpolated linearly between the swept values; none
// outside them).
type lambdaTicks struct {
	base   plot.Ticker
	xs, ls []float64 // swept values, increasing, and λ at each
}

// newLambdaTicks returns the ticker of b's sweep axis, or nil when b has
// no relative slenderness per swept value.
func newLambdaTicks(b *Bundle, base plot.Ticker) *lambdaTicks {
	if len(b.SweepLambda) < 2 {
		return nil
	}
	t := &lambdaTicks{base: base}
	for x := range b.SweepLambda {
		if l := b.SweepLambda[x]; finite(x) && finite(l) {
			t.xs = append(t.xs, x)
		}
	}
	sort.Float64s(t.xs)
	for _, x := range t.xs {
		t.ls = append(t.ls, b.SweepLambda[x])
	}
	if len(t.xs) < 2 {
		return nil
	}
	return t
}

// at returns λ at swept value x, false outside the swept range.
func (t *lambdaTicks) at(x float64) (float64, bool) {
	n := len(t.xs)
	if x < t.xs[0] || x > t.xs[n-1] {
		return 0, false
	}
	i := sort.SearchFloat64s(t.xs, x)
	if i == 0 {
		return t.ls[0], true
	}
	x0, x1 := t.xs[i-1], t.xs[i]
	return t.ls[i-1] + (t.ls[i]-t.ls[i-1])*(x-x0)/(x1-x0), true
}

// Ticks implements plot.Ticker.
func (t *lambdaTicks) Ticks(min, max float64) []plot.Tick {
	ts := t.base.Ticks(min, max)
	for i := range ts {
		if ts[i].Label == "" {
			continue
		}
		if l, ok := t.at(ts[i].Value); ok {
			ts[i].Label += "\nλ " + fixed(l, 2)
		}
	}
	return ts
}

// lambdaAxisLabel is the sweep axis's label when its ticks carry λ.
func lambdaAxisLabel(b *Bundle, xlabel string) string {
	return xlabel + "\nunder each value: relative slenderness λ (nominal, " + b.SweepLambdaAxis + " axis, –)"
}
