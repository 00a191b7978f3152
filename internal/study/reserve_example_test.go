package study_test

import (
	"context"
	"fmt"
	"log"

	"strutrisk/internal/study"
)

// A stocky strut whose capacity and load are both lognormal: the factor on
// the imposed load at which the FORM reliability index reaches 3.8, and
// the axial load that could be added before it falls to 3.8. The dead load
// is permanent, so the factor leaves it alone.
func ExampleModel_Reserve() {
	src := []byte(`
[member]
length = 300
ends = "pinned-pinned"
[member.section]
shape = "rect"
depth = 100
width = 100
[material]
modulus = 205000
yield = { dist = "lognormal", mean = 300, cov = 0.10 }
[capacity]
model = "curve"
curve = "b"
[loads]
dead    = "400 kN"
imposed = { dist = "lognormal", mean = "600 kN", cov = 0.30 }
[target]
beta = 3.8
`)
	st, err := study.Parse("strut.toml", src)
	if err != nil {
		log.Fatal(err)
	}
	md, err := study.Build(st)
	if err != nil {
		log.Fatal(err)
	}
	r, err := md.Reserve(context.Background(), st.Target, nil)
	if err != nil {
		log.Fatal(err)
	}
	fmt.Printf("reserve factor %.2f on %v (FORM beta %.2f)\n", r.Factor, r.Loads, r.FactorBeta)
	fmt.Printf("largest added load %.0f kN\n", r.Added/1e3)
	// Output:
	// reserve factor 1.35 on [loads.imposed] (FORM beta 3.80)
	// largest added load 559 kN
}

// Coupon results update the yield strength: the study's lognormal counts
// as three tests for the mean and three degrees of freedom for the
// spread, and the 5 % fractile of the predictive distribution is the
// characteristic value of EN 1990 Annex D, D.7.
func ExampleMeasurement() {
	src := []byte(`
[member]
length = "2 m"
ends = "pinned-pinned"
[member.section]
shape = "rect"
depth = "100 mm"
width = "50 mm"
[material]
modulus = "200 GPa"
yield = { dist = "lognormal", mean = "300 MPa", cov = 0.08 }
[imperfection]
bow = "2 mm"
[loads]
dead = "300 kN"
[measurements]
yield = { values = ["287 MPa", "301 MPa", "279 MPa", "295 MPa", "290 MPa"], prior_tests = 3, prior_dof = 3 }
`)
	st, err := study.Parse("bar.toml", src)
	if err != nil {
		log.Fatal(err)
	}
	m := st.Measurements[0]
	p, u := m.PriorSummary(), m.UpdatedSummary()
	fmt.Printf("%s from %d coupons, %s variance\n", m.Path, len(m.Values), m.Variance())
	fmt.Printf("prior:   mean %.0f MPa, 5%% fractile %.0f MPa\n", p.Mean, p.P05)
	fmt.Printf("updated: mean %.0f MPa, 5%% fractile %.0f MPa\n", u.Mean, u.P05)
	// Output:
	// material.yield from 5 coupons, unknown variance
	// prior:   mean 300 MPa, 5% fractile 262 MPa
	// updated: mean 294 MPa, 5% fractile 263 MPa
}
