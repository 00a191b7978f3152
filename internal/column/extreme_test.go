package column

import (
	"testing"
)

// Any positive finite input gives a finite capacity in [0, A fy], never
// NaN, for every model (the robustness requirement).
func TestCapacityExtremeInputs(t *testing.T) {
	vals := []float64{1e-100, 1e-3, 1, 1e3, 1e100}
	imp := []float64{0, 1e-100, 1, 1e100}
	models := []func(*Member, Axis) (Result, error){FirstYield, Curve}
	bad := 0
	for _, e := range vals {
		for _, fy := range vals {
			for _, l := range vals {
				for _, r := range vals {
					for _, bow := range imp {
						for _, ecc := range imp {
							m := strut(1, r, 1.5*r, e, fy, l)
							m.Bow, m.Ecc = bow, ecc
							m.Alpha = [2]float64{0.49, 0.49}
							for _, f := range models {
								res, err := f(&m, Minor)
								if err != nil || !(res.N >= 0 && res.N <= fy*(1+1e-12)) {
									if bad++; bad < 20 {
										t.Errorf("E %g fy %g L %g r %g bow %g ecc %g: %+v, %v", e, fy, l, r, bow, ecc, res, err)
									}
								}
							}
						}
					}
				}
			}
		}
	}
}
