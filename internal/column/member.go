package column

import (
	"fmt"
	"math"
)

// Limits reported in Result.Governs.
const (
	GovernsFirstYield = "first-yield"    // FirstYield, PerryRobertson, Secant
	GovernsCurve      = "buckling-curve" // Curve
)

// String returns "major", "minor" or "both".
func (a Axis) String() string {
	switch a {
	case Major:
		return "major"
	case Minor:
		return "minor"
	case Both:
		return "both"
	}
	return fmt.Sprintf("Axis(%d)", int(a))
}

// positive reports whether x is a positive finite number (false for NaN).
func positive(x float64) bool { return x > 0 && x <= math.MaxFloat64 }

// Validate checks the inputs a capacity evaluation about axis (Major,
// Minor or Both) reads: E, Fy, Length, Props.A, and per axis K, Props.R and
// Props.C must be positive and finite, and so must the squash load A fy;
// Bow, Ecc and Sway must be finite (they act by their magnitude). The capacity
// models call it themselves; it is exported for callers that want to check
// a member before using the float64 helpers (Slenderness,
// RelativeSlenderness, Euler).
func (m *Member) Validate(axis Axis) error {
	if axis != Major && axis != Minor && axis != Both {
		return ErrAxis
	}
	switch {
	case !positive(m.Length):
		return ErrLength
	case !positive(m.E):
		return ErrModulus
	case !positive(m.Fy):
		return ErrYield
	case !positive(m.Props.A):
		return ErrArea
	case !positive(m.Props.A * m.Fy):
		return ErrRange
	case math.IsNaN(m.Bow) || math.IsInf(m.Bow, 0) || math.IsNaN(m.Ecc) || math.IsInf(m.Ecc, 0) ||
		math.IsNaN(m.Sway) || math.IsInf(m.Sway, 0):
		return ErrImperfection
	}
	if axis == Both && m.Props.It != 0 {
		p := &m.Props
		switch {
		case !positive(ShearModulus(m)):
			return ErrShear
		case !positive(p.It) || !(p.Iw >= 0 && p.Iw <= math.MaxFloat64) ||
			math.IsNaN(p.S[0]+p.S[1]) || math.IsInf(p.S[0]+p.S[1], 0):
			return ErrTorsion
		}
	}
	lo, hi := axis, axis
	if axis == Both {
		lo, hi = Major, Minor
	}
	for a := lo; a <= hi; a++ {
		switch {
		case !positive(m.K[a]):
			return ErrK
		case !positive(m.Props.R[a]):
			return ErrRadius
		case !positive(m.Props.C[a]):
			return ErrFibre
		}
	}
	return nil
}

// weaker evaluates the closed-form model on the requested axis, or on both
// axes keeping the smaller resistance. The model is chosen by governs
// rather than passed as a function value so that the member does not
// escape to the heap: a capacity evaluation stays free of allocation for
// callers too.
//
// With Both, the modes that twist the section are evaluated too
// (twisting). A tie of resistances, as on the plateau of the buckling
// curves where every mode reaches the squash load, reports the mode of
// the lowest elastic critical load (tieWins): a stocky solid bar is not
// said to fail in torsional buckling.
func weaker(m *Member, axis Axis, governs string) Result {
	if axis != Both {
		return Result{N: evalAxis(m, axis, governs), Axis: axis, Governs: governs, Mode: flexuralMode(axis)}
	}
	res := Result{N: evalAxis(m, Major, governs), Axis: Major, Governs: governs, Mode: ModeFlexuralMajor}
	if n := evalAxis(m, Minor, governs); MinorGoverns(m, n, res.N) {
		res = Result{N: n, Axis: Minor, Governs: governs, Mode: ModeFlexuralMinor}
	}
	if m.Props.It != 0 {
		if t := twisting(m, governs); TwistingGoverns(m, t.N, res.N, res.Axis) {
			res = t
		}
	}
	return res
}

// MinorGoverns reports whether the resistance minor about the minor axis
// governs over major about the major axis: it is smaller, or equal (as
// on the plateau of the buckling curves) with an elastic critical load
// not above the major axis's.
func MinorGoverns(m *Member, minor, major float64) bool {
	return minor < major || minor == major && Euler(m, Minor) <= Euler(m, Major)
}

// TwistingGoverns reports whether the resistance twist of the modes that
// twist the section (Twisting) governs over the resistance flexural about
// axis a: it is smaller, or equal with an elastic critical load
// (TwistingLoad) not above the flexural one.
func TwistingGoverns(m *Member, twist, flexural float64, a Axis) bool {
	if twist != flexural {
		return twist < flexural
	}
	nt, _ := TwistingLoad(m)
	return nt <= Euler(m, a)
}

// evalAxis runs the closed-form model named by governs about one axis.
func evalAxis(m *Member, a Axis, governs string) float64 {
	if governs == GovernsCurve {
		return curve(m, a)
	}
	return firstYield(m, a)
}
