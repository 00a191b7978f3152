package column

import "math"

// SwayMoment returns the largest second-order bending moment (N mm) of an
// elastic cantilever of length lc and bending stiffness ei, fixed at its
// base, whose axis leans by the initial out-of-plumb angle phi (rad) and
// which carries the axial load n (N) at its free top:
//
//	M = n phi lc tan(u)/u,  u = lc sqrt(n / ei) = (pi/2) sqrt(n / Ncr)
//
// with Ncr = pi^2 ei / (2 lc)^2, at the base. A lean of phi is the same
// as the equivalent horizontal force phi n at the top (EN 1993-1-1:2005
// 5.3.2(7), Figure 5.4); the moment is Timoshenko & Gere's cantilever
// under an axial load and a lateral end load Q = phi n, M0 = Q tan(u)/k
// (Theory of Elastic Stability, 2nd ed., art. 1.3; from memory). The
// first-order moment is n phi lc; tan(u)/u is its amplification, which
// grows without bound as n approaches Ncr. For n >= Ncr it returns +Inf.
//
// The capacity models apply it to a member whose ends sway with buckling
// length K L by taking the cantilever of length lc = K L/2: for a
// cantilever (K = 2) that is the member itself, and for a sway member
// fixed against rotation at both ends (K = 1, inflection at mid-height)
// each half; for other end restraints it is an approximation (the point
// of contraflexure is taken at K L/2 from the more restrained end).
func SwayMoment(n, phi, lc, ei float64) float64 {
	if n <= 0 || phi == 0 {
		return 0
	}
	u := lc * math.Sqrt(n/ei)
	if u >= math.Pi/2 {
		return math.Inf(1)
	}
	return n * math.Abs(phi) * lc * math.Tan(u) / u
}

// swayArm is the length lc = K L/2 of the cantilever that carries the sway
// imperfection of a member about axis a (see SwayMoment).
func swayArm(m *Member, a Axis) float64 {
	return 0.5 * m.K[a] * m.Length
}

// SwayBow returns the amplitude (mm) of the half-sine bow that stands for
// the sway imperfection in the numerical beam-column model, on the
// equivalent pinned member of length K L about axis a: |Sway| K L/2, the
// lean at the top of the equivalent cantilever. Mirrored about the fixed
// base, the leaning cantilever is a pinned member of length 2 lc with a
// triangular initial shape of rise phi lc; a half-sine of the same rise
// gives the same first-order moment n phi lc and amplifies it by
// 1/(1 - n/Ncr), which is at least tan(u)/u (SwayMoment) and at most
// pi^2/8 times it (near Ncr): the bow is exact at first order and
// conservative in the second-order moment.
func SwayBow(m *Member, a Axis) float64 {
	return math.Abs(m.Sway) * swayArm(m, a)
}
