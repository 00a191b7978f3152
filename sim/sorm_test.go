package sim

import (
	"math"
	"testing"
)

func TestBreitungParaboloid(t *testing.T) {
	// Breitung's Phi(-beta)(1 + beta kappa)^(-1/2) for the paraboloid
	// g = beta - u2 + (kappa/2) u1^2, whose curvature at the design point
	// is kappa (Breitung, J. Eng. Mech. 110(3), 1984): 1.06719e-3 at
	// (3, 0.2), 2.13438e-3 at (3, -0.2), 4.13978e-3 at (2.5, 0.5),
	// 2.67671e-5 at (4, 0.1).
	cases := []struct{ beta, kappa, want float64 }{
		{3, 0.2, 1.06719e-3},
		{3, -0.2, 2.13438e-3},
		{2.5, 0.5, 4.13978e-3},
		{4, 0.1, 2.67671e-5},
	}
	for _, c := range cases {
		sp := paraboloidSpace(c.beta, c.kappa)
		f := formRun(sp, nil)
		pf, kappa, err := sormBreitung(sp, f.Points[0])
		if err != nil {
			t.Fatal(err)
		}
		if math.Abs(pf-c.want) > 1e-5*c.want {
			t.Errorf("beta %v kappa %v: SORM %.6g, want %.6g (curvatures %v)", c.beta, c.kappa, pf, c.want, kappa)
		}
		// SORM is closer to the exact value than FORM on these cases.
		exact := paraboloidPf(c.beta, c.kappa)
		if math.Abs(pf-exact) >= math.Abs(f.Pf-exact) {
			t.Errorf("beta %v kappa %v: SORM %.5g no better than FORM %.5g (exact %.5g)", c.beta, c.kappa, pf, f.Pf, exact)
		}
	}
}

func TestBreitungModel(t *testing.T) {
	// g = R - S with lognormal R and S is a plane in standard normal
	// space: no curvature, SORM = FORM.
	m := lognormalRSModel(t, 150, 0.10, 100, 0.20)
	f, err := FORM(m, nil)
	if err != nil {
		t.Fatal(err)
	}
	pf, err := Breitung(m, f.Points[0])
	if err != nil {
		t.Fatal(err)
	}
	if math.Abs(pf-f.Pf) > 1e-5*f.Pf {
		t.Errorf("SORM %.7g, FORM %.7g", pf, f.Pf)
	}
	// A surface bending towards the origin faster than the beta-sphere
	// has no valid Breitung estimate.
	sp := funcSpace(2, func(u []float64) float64 { return 2 - u[1] - 0.4*u[0]*u[0] })
	if _, _, err := sormBreitung(sp, DesignPoint{U: []float64{0, 2}, Beta: 2}); err == nil {
		t.Error("no error for beta*kappa = -1.6")
	}
}
