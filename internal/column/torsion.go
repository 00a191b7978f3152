package column

import "math"

// defaultPoisson is the Poisson ratio of steel that gives the default
// shear modulus G = E / (2 (1 + nu)) (EN 1993-1-1:2005 3.2.6).
const defaultPoisson = 0.3

// ShearModulus returns m.G, or E / (2 (1 + 0.3)) when it is zero.
func ShearModulus(m *Member) float64 {
	if m.G != 0 {
		return m.G
	}
	return m.E / (2 * (1 + defaultPoisson))
}

// TorsionK returns the effective length factor K_T of the torsional mode:
// the larger of the two flexural factors. The warping restraint at the
// ends is taken no better than the weaker of the flexural restraints (a
// fixed end that prevents bending about one axis alone is not assumed to
// prevent warping).
func TorsionK(m *Member) float64 { return math.Max(m.K[Major], m.K[Minor]) }

// PolarRadius2 returns i0^2 = r_major^2 + r_minor^2 + s_major^2 +
// s_minor^2, the squared polar radius of gyration about the shear centre
// (EN 1993-1-3:2006 6.2.3; Timoshenko & Gere, 5.3).
func PolarRadius2(p *Props) float64 {
	return p.R[Major]*p.R[Major] + p.R[Minor]*p.R[Minor] + p.S[Major]*p.S[Major] + p.S[Minor]*p.S[Minor]
}

// TorsionalLoad returns the elastic critical load of pure torsional
// buckling about the shear centre,
//
//	N_cr,T = (G It + pi^2 E Iw / (K_T L)^2) / i0^2
//
// (EN 1993-1-3:2006 eq. 6.33a; Timoshenko & Gere, Theory of Elastic
// Stability, 2nd ed., eq. 5-19), with K_T from TorsionK. It returns +Inf
// when Props.It is 0 (torsion unknown). The member is not checked.
func TorsionalLoad(m *Member) float64 {
	p := &m.Props
	if p.It == 0 {
		return math.Inf(1)
	}
	lt := TorsionK(m) * m.Length
	return (ShearModulus(m)*p.It + math.Pi*math.Pi*m.E*p.Iw/(lt*lt)) / PolarRadius2(p)
}

// TwistingLoad returns the lowest elastic critical load of the modes that
// twist the section, and that mode: ModeTorsional when the shear centre
// is the centroid (the torsional load), else ModeFlexuralTorsional, the
// smallest root of
//
//	i0^2 (N0 - N)(N1 - N)(NT - N) - N^2 s0^2 (N1 - N) - N^2 s1^2 (N0 - N) = 0
//
// (Timoshenko & Gere, Theory of Elastic Stability, 2nd ed., 5.3,
// eq. 5-21), N0, N1 the flexural Euler loads about the major and minor
// axes, NT the torsional load and s0, s1 the shear centre's coordinates
// along the major and minor axes. With one coordinate zero the cubic
// factors into the uncoupled flexural load and the quadratic of a
// monosymmetric section (EN 1993-1-3:2006 eq. 6.35). It returns +Inf when
// Props.It is 0. The member is not checked.
func TwistingLoad(m *Member) (float64, Mode) {
	nt := TorsionalLoad(m)
	if math.IsInf(nt, 1) {
		return nt, ModeTorsional
	}
	p := &m.Props
	s0, s1 := p.S[Major], p.S[Minor]
	if s0 == 0 && s1 == 0 {
		return nt, ModeTorsional
	}
	n0, n1 := Euler(m, Major), Euler(m, Minor)
	i02 := PolarRadius2(p)
	if s1 == 0 {
		return monoRoot(n0, nt, s0*s0/i02), ModeFlexuralTorsional
	}
	if s0 == 0 {
		return monoRoot(n1, nt, s1*s1/i02), ModeFlexuralTorsional
	}
	return cubicRoot(n0, n1, nt, s0*s0/i02, s1*s1/i02), ModeFlexuralTorsional
}

// monoRoot returns the smaller root of beta N^2 - (NF + NT) N + NF NT = 0,
// beta = 1 - s^2/i0^2 = 1 - q, as 2 NF NT / (NF + NT + sqrt(D)), a form
// free of cancellation for small q.
func monoRoot(nf, nt, q float64) float64 {
	sum := nf + nt
	d := (nf-nt)*(nf-nt) + 4*q*nf*nt
	return 2 * nf * nt / (sum + math.Sqrt(d))
}

// cubicRoot returns the smallest root of
// (N0 - N)(N1 - N)(NT - N) - q0 N^2 (N1 - N) - q1 N^2 (N0 - N), q = s^2/i0^2,
// which lies in (0, min(N0, N1, NT)]: the cubic is positive at 0 and not
// positive at the smallest of the three loads. Safeguarded Newton steps
// in the scaled variable x = N / min.
func cubicRoot(n0, n1, nt, q0, q1 float64) float64 {
	lo, hi := 0.0, math.Min(n0, math.Min(n1, nt))
	if !(hi > 0) || math.IsInf(hi, 1) {
		return hi
	}
	a, b, c := n0/hi, n1/hi, nt/hi
	f := func(x float64) (float64, float64) {
		u, v, w := a-x, b-x, c-x
		y := u*v*w - q0*x*x*v - q1*x*x*u
		dy := -(v*w + u*w + u*v) - q0*(2*x*v-x*x) - q1*(2*x*u-x*x)
		return y, dy
	}
	xl, xh := lo, 1.0
	x := 0.5
	for i := 0; i < 200; i++ {
		y, dy := f(x)
		if y == 0 {
			break
		}
		if y > 0 {
			xl = x
		} else {
			xh = x
		}
		next := x - y/dy
		if !(next > xl && next < xh) {
			next = 0.5 * (xl + xh)
		}
		if math.Abs(next-x) <= 1e-15*x || xh-xl <= 1e-15 {
			x = next
			break
		}
		x = next
	}
	return x * hi
}

// CriticalLoad returns the governing (lowest) elastic critical load of the
// member over flexural buckling about the axes that axis names (Major,
// Minor or Both) and, with Both and Props.It not zero, the modes that
// twist (TwistingLoad), with its mode. A tie between the flexural axes
// reports the minor one; a twisting mode wins a tie with a flexural one.
// The member is not checked (see Member.Validate).
func CriticalLoad(m *Member, axis Axis) (float64, Mode) {
	n, mode := math.Inf(1), ModeFlexuralMinor
	for a := Major; a <= Minor; a++ {
		if axis != Both && axis != a {
			continue
		}
		if e := Euler(m, a); e <= n {
			n, mode = e, flexuralMode(a)
		}
	}
	if axis != Both {
		return n, mode
	}
	if nt, tm := TwistingLoad(m); nt <= n {
		n, mode = nt, tm
	}
	return n, mode
}
