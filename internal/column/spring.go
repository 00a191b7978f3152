package column

import "math"

// SpringK returns the effective length factor K = pi/u of a braced member
// (no sway) whose ends are restrained against rotation by elastic springs
// of dimensionless stiffness ra and rb, R = k L / (E I): 0 is a pin and
// +Inf a full fixity. u = L sqrt(P/(E I)) at buckling is the root in
// (pi, 2 pi] of the exact stability equation of the elastic member
// (Timoshenko & Gere, Theory of Elastic Stability, 2nd ed., ch. 2, with
// the spring end conditions E I v” = ±k v'):
//
//	u^2 + (ra + rb)(1 - u cot u) + ra rb (2 tan(u/2)/u - 1) = 0
//
// SpringK solves it multiplied through by u sin u,
//
//	u^3 sin u + (ra + rb)(u sin u - u^2 cos u) + ra rb (2 - 2 cos u - u sin u) = 0,
//
// which removes the poles of cot u and tan(u/2) at u = pi and is smooth on
// [pi, 2 pi], so Brent's method on that bracket always converges; an
// infinite stiffness is handled by dividing through by it. Pinned and
// fixed ends give exactly K = 1 and K = 0.5.
//
// With R = 2/G this is the sidesway-inhibited alignment-chart equation of
// the AISC Specification Commentary (G at each end, girders bent in single
// curvature).
func SpringK(ra, rb float64) (float64, error) {
	if !(ra >= 0) || !(rb >= 0) { // also rejects NaN
		return 0, ErrSpring
	}
	infA, infB := math.IsInf(ra, 1), math.IsInf(rb, 1)
	var w0, w1, w2 float64 // weights of the three terms above
	switch {
	case infA && infB:
		return 0.5, nil
	case ra == 0 && rb == 0:
		return 1, nil
	case infA:
		w1, w2 = 1, rb
	case infB:
		w1, w2 = 1, ra
	default:
		// Divide by (1 + ra)(1 + rb) in a form that cannot overflow.
		ia, ib := 1/(1+ra), 1/(1+rb)
		w0 = ia * ib
		w1 = ra*ia*ib + rb*ib*ia
		w2 = (ra * ia) * (rb * ib)
	}
	f := func(u float64) float64 {
		sin, cos := math.Sincos(u)
		return w0*u*u*u*sin + w1*(u*sin-u*u*cos) + w2*(2-2*cos-u*sin)
	}
	// At pi the sum is w1 pi^2 + 4 w2 > 0, at 2 pi it is -4 pi^2 w1 < 0.
	lo, hi := math.Pi, 2*math.Pi
	u := brent(f, lo, hi, w1*lo*lo+4*w2, -w1*hi*hi, 1e-15)
	return math.Pi / u, nil
}

// SpringKFromStiffness returns SpringK for rotational end springs of
// stiffness kA and kB (N mm/rad; 0 pinned, +Inf fixed) on a member of
// modulus E, second moment I and length L, using R = k L / (E I).
func SpringKFromStiffness(kA, kB, e, i, l float64) (float64, error) {
	switch {
	case !positive(e):
		return 0, ErrModulus
	case !positive(i):
		return 0, ErrSecond
	case !positive(l):
		return 0, ErrLength
	case !(kA >= 0) || !(kB >= 0):
		return 0, ErrSpring
	}
	return SpringK(kA*l/(e*i), kB*l/(e*i))
}
