package assess

import (
	"math"
	"testing"

	"strutrisk/sim"
)

// TestDesignValuesLognormal: a lognormal resistance R against a lognormal
// action S, g = R - S. With lambda, zeta the mean and sd of ln R and ln S,
// the failure surface ln R = ln S is the plane
//
//	lambda_R + zeta_R u_R = lambda_S + zeta_S u_S
//
// in standard normal space, so FORM is exact:
//
//	beta    = (lambda_R - lambda_S) / D,  D = sqrt(zeta_R^2 + zeta_S^2),
//	alpha_R = zeta_R / D,  alpha_S = -zeta_S / D
//
// and at a target beta_t (EN 1990 Annex C, C.7, design point along alpha):
//
//	R_d = exp(lambda_R - alpha_R beta_t zeta_R)
//	S_d = exp(lambda_S - alpha_S beta_t zeta_S)
//
// with characteristic values R_k = exp(lambda_R - 1.6449 zeta_R) (5 %
// fractile) and S_k = exp(lambda_S + 2.0537 zeta_S) (98 % fractile, a
// variable action of annual maxima, EN 1990 4.1.2), so that
//
//	gamma_R = R_k / R_d = exp(zeta_R (alpha_R beta_t - 1.6449))
//	gamma_S = S_d / S_k = exp(zeta_S (-alpha_S beta_t - 2.0537))
//
// (1.6449 and 2.0537 are the standard normal 95 % and 98 % fractiles).
func TestDesignValuesLognormal(t *testing.T) {
	const (
		muR, covR = 300.0, 0.10
		muS, covS = 150.0, 0.25
	)
	zR, zS := math.Sqrt(math.Log1p(covR*covR)), math.Sqrt(math.Log1p(covS*covS))
	lR, lS := math.Log(muR)-zR*zR/2, math.Log(muS)-zS*zS/2
	D := math.Hypot(zR, zS)
	aR, aS := zR/D, -zS/D
	beta := (lR - lS) / D
	const z95, z98 = 1.6448536269514722, 2.0537489106318225

	R, _ := sim.NewLognormal(muR, covR*muR)
	S, _ := sim.NewLognormal(muS, covS*muS)
	m := &sim.Model{Vars: []sim.Variable{{Name: "R", Dist: R}, {Name: "S", Dist: S}},
		G: func(x, _ []float64) float64 { return x[0] - x[1] }}
	f, err := sim.FORM(m, nil)
	if err != nil || !f.Converged {
		t.Fatalf("FORM: %v %v", err, f)
	}
	p := f.Points[0]
	if math.Abs(p.Beta-beta) > 1e-6 || math.Abs(p.Alpha[0]-aR) > 1e-6 || math.Abs(p.Alpha[1]-aS) > 1e-6 {
		t.Fatalf("FORM beta %g alpha %v, closed form %g [%g %g]", p.Beta, p.Alpha, beta, aR, aS)
	}
	rk, sk := math.Exp(lR-z95*zR), math.Exp(lS+z98*zS)
	for _, bt := range []float64{3.3, 3.8, 4.7} {
		dv, err := DesignValues(m, p.Alpha, bt, []Characteristic{{rk, "5 % fractile"}, {sk, "98 % fractile"}})
		if err != nil {
			t.Fatal(err)
		}
		want := []struct {
			role           string
			design, factor float64
		}{
			{Resistance, math.Exp(lR - aR*bt*zR), math.Exp(zR * (aR*bt - z95))},
			{Action, math.Exp(lS - aS*bt*zS), math.Exp(zS * (-aS*bt - z98))},
		}
		for i, w := range want {
			d := dv[i]
			if d.Role != w.role || math.Abs(d.Design/w.design-1) > 1e-6 || math.Abs(d.Factor/w.factor-1) > 1e-6 {
				t.Errorf("beta_t %g, %s: %s design %.9g factor %.9g; closed form %s %.9g %.9g", bt, d.Name, d.Role, d.Design, d.Factor, w.role, w.design, w.factor)
			}
			// The fractile of the design value is Phi(-alpha beta_t).
			if pw := sim.PfFromBeta(p.Alpha[i] * bt); math.Abs(d.Fractile-pw) > 1e-9*math.Max(pw, 1e-3) {
				t.Errorf("%s: fractile %g, want %g", d.Name, d.Fractile, pw)
			}
		}
	}
}

func TestPartialFactor(t *testing.T) {
	for _, c := range []struct {
		role   string
		xk, xd float64
		want   float64
	}{
		{Resistance, 235, 200, 1.175},
		{Action, 100, 150, 1.5},
		{Action, 0, 3, math.NaN()},
		{Resistance, 2, -1, math.NaN()},
	} {
		got := PartialFactor(c.role, c.xk, c.xd)
		if math.IsNaN(c.want) != math.IsNaN(got) || !math.IsNaN(got) && math.Abs(got-c.want) > 1e-12 {
			t.Errorf("%s %g %g: %g, want %g", c.role, c.xk, c.xd, got, c.want)
		}
	}
}
