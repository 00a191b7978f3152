package sim

import (
	"math"
	"testing"
)

// TestLogStudentsTNaN: a NaN argument gives NaN back instead of entering
// the inverse incomplete beta, which does not return on NaN.
func TestLogStudentsTNaN(t *testing.T) {
	post, err := UpdateLognormal(Prior{}, []float64{287, 301, 279})
	if err != nil {
		t.Fatal(err)
	}
	d := post.Predictive()
	for name, f := range map[string]func(float64) float64{"FromStdNormal": d.FromStdNormal, "Quantile": func(p float64) float64 {
		defer func() { recover() }() // Quantile may refuse NaN by panicking
		return d.Quantile(p)
	}} {
		if v := f(math.NaN()); !math.IsNaN(v) && v != 0 {
			t.Errorf("%s(NaN) = %v, want NaN", name, v)
		}
	}
}
