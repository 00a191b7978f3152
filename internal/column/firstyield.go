package column

import "math"

// FirstYield returns the axial load at which the extreme fibre of a pinned
// elastic member first reaches the yield strength, with the initial
// half-sine bow of amplitude e0 = |Bow| and the end eccentricity e = |Ecc|
// acting together:
//
//	P/A [1 + (c/r^2)(e sec((pi/2) sqrt(P/PE)) + e0/(1 - P/PE))] = fy
//
// with PE = pi^2 E A r^2 / (K L)^2. The eccentricity term is the secant
// formula (Timoshenko & Gere, Theory of Elastic Stability, 2nd ed., ch. 1;
// Gere, Mechanics of Materials, eq. 11-59); the bow term is the
// amplification 1/(1 - P/PE) of an initially curved bar (Timoshenko &
// Gere, ch. 1; Case & Chilver, Strength of Materials and Structures,
// ch. 18). The two add exactly: the beam-column equation
// E I d2v/dx2 + P v = -P (e + v0) is linear in v, so the deflections of the two
// cases superpose, and for pinned ends both have their maximum (and the
// moment P(e + v0 + v) its maximum) at mid-height. Within linear-elastic
// second-order theory the equation is therefore the exact first-yield
// condition of a pinned member, not an approximation; K L stands in for L
// for other ends, which is the usual effective-length idealisation.
//
// With e = 0 it is the Perry-Robertson equation, solved in closed form as
// the smaller root of (fy - s)(sE - s) = eta s sE, eta = e0 c / r^2. With
// e > 0 the root is found by safeguarded Newton iteration on
// (0, min(A fy, PE)). The capacity tends to the squash load A fy as the
// imperfections vanish and to PE as the member grows slender.
//
// A sway imperfection m.Sway = phi adds the bending stress of the leaning
// cantilever of length K L/2 (see SwayMoment), (c/r^2) phi (K L/2)
// tan(u)/u with u = (pi/2) sqrt(P/PE); its maximum, at the fixed base, is
// where the mirrored equivalent pinned member has its mid-height, so the
// three terms add at one section.
//
// FirstYield evaluates axis, or both axes taking the weaker when axis is
// Both (a tie reports Minor). Invalid input returns an error (see
// Member.Validate), never NaN.
func FirstYield(m *Member, axis Axis) (Result, error) {
	if err := m.Validate(axis); err != nil {
		return Result{}, err
	}
	if axis != Both { // weaker's first case, without its dispatch
		return Result{N: firstYield(m, axis), Axis: axis, Governs: GovernsFirstYield, Mode: flexuralMode(axis)}, nil
	}
	return weaker(m, axis, GovernsFirstYield), nil
}

// PerryRobertson is the "perry-robertson" model: FirstYield for a member
// whose imperfection is its bow. It evaluates the same combined equation,
// so an eccentricity, if the member has one, is included.
func PerryRobertson(m *Member, axis Axis) (Result, error) { return FirstYield(m, axis) }

// Secant is the "secant" model: FirstYield for a member loaded at an end
// eccentricity (the secant formula). It evaluates the same combined
// equation, so a bow, if the member has one, is included.
func Secant(m *Member, axis Axis) (Result, error) { return FirstYield(m, axis) }

// firstYield is FirstYield about one axis of a validated member.
//
// A class 4 member (Props.AEff > 0) is taken on its effective section, as
// EN 1993-1-1 6.3.1 takes A_eff: P/A_eff + P e_total / W_eff = fy, with
// the Euler load of the gross section, so rho = A_eff fy / PE and the
// relative imperfection is e A_eff / W_eff.
func firstYield(m *Member, a Axis) float64 {
	r, c := m.Props.R[a], m.Props.C[a]
	lam := m.K[a] * m.Length / r
	// rho = fy/sE = lam_bar^2, the load ratio P/PE at the squash load.
	rho := m.Fy * lam * lam / (math.Pi * math.Pi * m.E)
	if m.Props.AEff > 0 {
		ae, we := m.Props.AEff, m.Props.EffectiveModulus(a)
		rho *= ae / m.Props.A
		sw := math.Abs(m.Sway*swayArm(m, a)) * ae / we
		return ae * m.Fy * firstYieldChi(rho, math.Abs(m.Bow)*ae/we, math.Abs(m.Ecc)*ae/we, sw)
	}
	if m.Ecc == 0 && m.Sway == 0 { // the Perry-Robertson root, as firstYieldChi finds it
		return m.Props.A * m.Fy * perryChi(rho, relImp(m.Bow, r, c))
	}
	sw := relImp(m.Sway*swayArm(m, a), r, c)
	return m.Props.A * m.Fy * firstYieldChi(rho, relImp(m.Bow, r, c), relImp(m.Ecc, r, c), sw)
}

// relImp returns the imperfection e as the relative bending stress
// |e| c / r^2, written so that e = 0 gives 0 whatever r and c.
func relImp(e, r, c float64) float64 {
	if e == 0 {
		return 0
	}
	return math.Abs(e) / r * (c / r)
}

// perryChi returns the smaller root chi of (1 - chi)(1 - chi rho) = eta chi,
// the Perry-Robertson equation (Ayrton & Perry 1886; Robertson 1925) in
// terms of chi = s/fy and rho = fy/sE. The form 2/(B + sqrt(D)) with
// B = 1 + eta + rho and D = (1 - rho)^2 + eta (2 + 2 rho + eta) = B^2 - 4 rho
// avoids cancellation; everything is scaled by max(1, rho, eta) so that no
// intermediate overflows.
func perryChi(rho, eta float64) float64 {
	if rho <= 1e150 && eta <= 1e150 {
		b := 1 + eta + rho
		d := (1-rho)*(1-rho) + eta*(2+2*rho+eta)
		return 2 / (b + math.Sqrt(d))
	}
	if math.IsInf(rho, 1) || math.IsInf(eta, 1) {
		return 0
	}
	s := math.Max(rho, eta)
	r, e, u := rho/s, eta/s, 1/s
	b := u + e + r
	d := (u-r)*(u-r) + e*(2*u+2*r+e)
	return 2 / s / (b + math.Sqrt(d))
}

// firstYieldChi solves chi [1 + ecc sec(u) + eta/(1 - chi rho) +
// sw tan(u)/u] = 1, u = (pi/2) sqrt(chi rho), for chi in
// (0, min(1, 1/rho)), where ecc = e c/r^2, eta = e0 c/r^2 and
// sw = phi (K L/2) c/r^2 (see SwayMoment).
func firstYieldChi(rho, eta, ecc, sw float64) float64 {
	if ecc == 0 && sw == 0 || math.IsInf(rho, 1) || math.IsInf(eta, 1) || math.IsInf(ecc, 1) || math.IsInf(sw, 1) {
		return perryChi(rho, eta+ecc+sw)
	}
	hi := 1.0
	if rho > 1 {
		hi = 1 / rho
	}
	lo := 0.0
	// The left-hand side g is increasing and convex in chi, and sec θ ≥
	// 1/(1 - q) for q = chi rho in [0, 1), so without sway the Perry root
	// with eta + ecc lies at or right of the root: Newton then descends
	// monotonically. tan θ/θ ≤ 1/(1 - q), so with sway the start may lie
	// left of the root; the bracket [lo, hi] and bisection keep the
	// iteration safe either way.
	x := perryChi(rho, eta+ecc+sw)
	for i := 0; i < 100; i++ {
		g, dg := firstYieldG(x, rho, eta, ecc, sw)
		if g == 0 {
			return x
		}
		if g > 0 {
			hi = x
		} else {
			lo = x
		}
		step := g / dg
		next := x - step
		if math.Abs(step) <= 1e-15*x { // converged to rounding level
			if next > lo && next < hi {
				return next
			}
			return x
		}
		if !(next > lo && next < hi) { // also catches NaN and Inf
			next = 0.5 * (lo + hi)
		}
		if hi-lo <= 1e-15*hi {
			return next
		}
		x = next
	}
	return x
}

// firstYieldG returns g(chi) - 1 and its derivative, where g is the
// left-hand side of the first-yield equation over fy.
func firstYieldG(x, rho, eta, ecc, sw float64) (g, dg float64) {
	q := x * rho
	if q >= 1 {
		return math.Inf(1), math.Inf(1)
	}
	th := 0.5 * math.Pi * math.Sqrt(q)
	sin, cos := math.Sincos(th)
	sec := 1 / cos
	w := 1 / (1 - q)
	tu := 1.0 // tan θ / θ, 1 at θ = 0
	if th > 1e-8 {
		tu = sin * sec / th
	}
	g = x*(1+ecc*sec+eta*w+sw*tu) - 1
	// d(x tan θ/θ)/dx = (tan θ/θ + sec^2 θ)/2, as θ = (pi/2) sqrt(x rho).
	dg = 1 + ecc*sec*(1+0.5*th*sin*sec) + eta*w*w + 0.5*sw*(tu+sec*sec)
	return g, dg
}
