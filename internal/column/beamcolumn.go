package column

import (
	"errors"
	"fmt"
	"math"
	"sort"
)

// BeamLimit selects the limit state of the numerical beam-column model.
type BeamLimit int

// The beam-column limits.
const (
	// FirstYieldLimit is the elastic second-order load at which the
	// extreme-fibre stress first reaches fy (residual stresses ignored,
	// as in the Perry-Robertson and secant formulas).
	FirstYieldLimit BeamLimit = iota
	// UltimateLimit is the peak of the load-deflection path of the
	// member with spread of plasticity through a fibre section.
	UltimateLimit
)

// String returns "first-yield" or "ultimate".
func (l BeamLimit) String() string {
	switch l {
	case FirstYieldLimit:
		return "first-yield"
	case UltimateLimit:
		return "ultimate"
	}
	return "limit(?)"
}

// ParseBeamLimit reads "first-yield" or "ultimate".
func ParseBeamLimit(s string) (BeamLimit, error) {
	switch s {
	case "first-yield":
		return FirstYieldLimit, nil
	case "ultimate":
		return UltimateLimit, nil
	}
	return 0, fmt.Errorf("column: beam-column limit %q: use \"first-yield\" or \"ultimate\"", s)
}

// Residual selects the residual stress pattern of the ultimate limit.
type Residual int

// The residual stress patterns. Each is self-equilibrated over the
// section; see beamcolumn_fibre.go for the distributions and their sources.
const (
	ResidualNone       Residual = iota // stress free
	ResidualHotRolled                  // hot-rolled I or H section (ECCS linear pattern)
	ResidualWelded                     // welded I or box section (tension blocks at the welds)
	ResidualColdFormed                 // cold-formed RHS or CHS (through-thickness bending)
)

// String returns "none", "hot-rolled", "welded" or "cold-formed".
func (r Residual) String() string {
	switch r {
	case ResidualNone:
		return "none"
	case ResidualHotRolled:
		return "hot-rolled"
	case ResidualWelded:
		return "welded"
	case ResidualColdFormed:
		return "cold-formed"
	}
	return "residual(?)"
}

// ParseResidual reads "none", "hot-rolled", "welded" or "cold-formed".
func ParseResidual(s string) (Residual, error) {
	for r := ResidualNone; r <= ResidualColdFormed; r++ {
		if s == r.String() {
			return r, nil
		}
	}
	return 0, fmt.Errorf("column: residual stress %q: use \"none\", \"hot-rolled\", \"welded\" or \"cold-formed\"", s)
}

// BeamOptions configure BeamColumn. The zero value (or a nil pointer) is a
// pinned member evaluated at first yield with 40 elements.
type BeamOptions struct {
	// Limit is the limit state.
	Limit BeamLimit
	// Residual is the residual stress pattern (ultimate limit only).
	Residual Residual
	// Profile, when it has two or more entries, is a measured bow: lateral
	// offsets (mm) at equal spacing along the member, both ends included.
	// The chord through the end offsets is removed and the rest is
	// interpolated by a natural cubic spline. It replaces the half-sine
	// bow of amplitude Member.Bow.
	Profile []float64
	// Springs[axis][end] is the rotational stiffness (N mm/rad) of the end
	// restraint about axis at end 0 and end 1: 0 is a pin, +Inf full
	// fixity. The ends are held against lateral movement (braced member).
	// When both springs of an axis are 0 the member is analysed as a
	// pinned member of the equivalent length K L, K = Member.K[axis];
	// otherwise K is not used and the springs act on the true length L.
	Springs [2][2]float64
	// Elements is the number of beam elements along the member (0: 40;
	// rounded up to an even number so that mid-length is a node).
	Elements int
	// Fibres is the approximate number of fibres of the section in the
	// ultimate limit (0: about 50).
	Fibres int
	// Bending, with Load > 0, adds end moments and a uniform lateral load
	// about Bending.Axis that grow with the axial load: at an axial load
	// N they are Bending's moments and load times N/Load, so the load
	// factor of a study is the returned capacity over Load (the capacity
	// of the other axis has no bending). The end moments act on the ends
	// of the analysed member (K L when pinned, L with springs), the first
	// at end 0.
	Bending Bending
	// Load is the axial load (N) that goes with Bending; 0 leaves the
	// member without bending.
	Load float64
	// Law, when Law.N > 0, replaces the elastic-perfectly-plastic fibres of
	// the ultimate limit by the compound Ramberg-Osgood law of stainless
	// steel (EN 1993-1-4 Annex C) with the member's E and Fy (the 0.2 %
	// proof stress) and Law.Fu and Law.N; Law.E and Law.Fy are not read.
	// The law is followed as a non-linear elastic one (no unloading path),
	// adequate up to the peak load, where few fibres unload.
	Law RambergOsgood
}

// Defaults of BeamOptions.
const (
	DefaultBeamElements = 40
	DefaultBeamFibres   = 50
)

// Governs strings of the beam-column model besides GovernsFirstYield.
const (
	GovernsUltimate        = "ultimate"
	GovernsSquash          = "squash"
	GovernsElasticBuckling = "elastic-buckling"
)

var (
	errBeamAxis     = errors.New("column: beam-column axis must be Major, Minor or Both")
	errBeamMember   = errors.New("column: beam-column needs positive, finite E, Fy, Length and Props.A, and finite Bow, Ecc and Sway")
	errBeamSway     = errors.New("column: beam-column end springs hold the ends against lateral movement (a braced member): a sway imperfection needs the pinned equivalent member of length K L (no springs)")
	errBeamAxisProp = errors.New("column: beam-column needs a positive, finite Props.I (or Props.R) and Props.W (or Props.C) for the axis, and K > 0 for a pinned axis")
	errBeamSpring   = errors.New("column: beam-column end springs must be zero (pinned), positive or +Inf (fixed)")
	errBeamProfile  = errors.New("column: beam-column profile offsets must be finite numbers")
	errBeamMesh     = errors.New("column: beam-column Elements and Fibres must be zero (default) or positive; Elements at most 2000, Fibres at most 5000")
	errBeamLimit    = errors.New("column: beam-column limit must be FirstYieldLimit or UltimateLimit")
	errBeamCustom   = errors.New("column: the ultimate beam-column limit needs a section with dimensions; a custom section (area and second moments only) has no fibres: use the first-yield limit")
	errBeamClass4   = errors.New("column: the ultimate beam-column limit uses the gross fibre section and cannot follow the local buckling of a class 4 section (Props.AEff set): use the first-yield limit or the buckling curve, which take the effective section")
	errBeamOpen     = errors.New("column: the ultimate beam-column limit has no fibre section for an angle, channel or tee (their bending and twisting interact): use the first-yield limit or the curve model")
	errBeamBending  = errors.New("column: beam-column bending needs finite end moments and lateral load and a positive, finite axial Load that they go with")
	errBeamNoPeak   = errors.New("column: beam-column ultimate analysis did not converge to a peak load; try more elements or check the member's inputs")
)

// BeamColumn returns the capacity of the member by the numerical
// beam-column model: 2-node Euler-Bernoulli (Hermite cubic) beam elements
// along the member with the consistent geometric stiffness of a constant
// axial force (second-order theory of moderate rotations), rotational end
// springs, an initial bow (half-sine of amplitude m.Bow, or opt.Profile)
// and an end eccentricity m.Ecc in the same direction as the bow, both
// ends braced. A sway imperfection m.Sway (only without springs) adds the
// half-sine bow SwayBow. With axis Both both axes are evaluated and the weaker
// reported (a tie reports Minor).
//
// First yield (the default) is the elastic second-order load at which
// N/A + |M|max/W = fy, found by Brent's method on the load; the moment is
// taken from equilibrium, M(x) = N (e + y(x)) plus the linear end-spring
// moments. A straight, concentric member returns min(A fy, Ncr).
//
// Ultimate uses a fibre section of sec (after its ThicknessLoss) with
// elastic-perfectly-plastic steel (E, Fy of m) and the residual stress
// opt.Residual, two Gauss points per element (the spread-of-plasticity
// beam-column of e.g. Chen & Atsuta, Theory of Beam-Columns, vol. 1, in a
// displacement-based finite element form). The axial force is the applied
// load N at every section (no axial restraint), so each section's axial
// strain is condensed out. The equilibrium path is followed by Newton
// iteration, first under load control and, near the peak, under control
// of the lateral deflection at the node of largest elastic deflection;
// the peak is bracketed and refined by successive parabolic
// interpolation, to about 1e-5 of the load. A straight, concentric member
// is given a bow of L/10^6 so that the path has a peak. If the load is
// still rising when the deflection reaches L/10, or the search runs out of
// steps (this can happen for nearly perfect members whose path turns
// sharply at a bifurcation), the largest load found is returned.
//
// m.Props is used by the first-yield limit (A, I or R, W or C; AEff and
// WEff of a class 4 section, see Section.Classify); the ultimate limit
// takes its properties from the fibres of sec and refuses a class 4
// member (m.Props.AEff > 0): its fibres do not buckle locally.
// The model bends in one plane: with axis Both, a member whose lowest
// elastic critical load twists the section (CriticalLoad) is refused with
// ErrTwisting.
func BeamColumn(m *Member, sec Section, axis Axis, opt *BeamOptions) (Result, error) {
	w := bcGet()
	defer bcPut(w)
	return w.capacity(m, sec, axis, opt, nil)
}

// Trace is the response of a beam-column evaluation for a report picture:
// the load-deflection path at one point of the member and the deflected
// shape at the limit.
type Trace struct {
	// Result is the capacity, as BeamColumn returns it.
	Result Result
	// At is the position (mm from end 0) whose deflection Path records.
	At float64
	// Load (N) and Deflection (mm, lateral displacement added to the
	// initial bow) are the points of the path in order of deflection. For
	// the ultimate limit they include the refinement of the peak and a few
	// points after it; for first yield they rise to the capacity.
	Load, Deflection []float64
	// X (mm from end 0), Bow and Shape (mm) describe the member at the
	// limit: the initial offset from the chord (eccentricity excluded) and
	// the total offset (bow plus deflection).
	X, Bow, Shape []float64
}

// BeamColumnTrace evaluates BeamColumn and also returns the load-deflection
// path and the deflected shape at the limit of the governing axis. It
// allocates; use BeamColumn in loops.
func BeamColumnTrace(m *Member, sec Section, axis Axis, opt *BeamOptions) (*Trace, error) {
	w := bcGet()
	defer bcPut(w)
	r, err := w.capacity(m, sec, axis, opt, nil)
	if err != nil {
		return nil, err
	}
	tr := &Trace{Result: r}
	if _, err := w.capacity(m, sec, r.Axis, opt, tr); err != nil {
		return nil, err
	}
	tr.Result = r
	sort.Sort(bcPath{tr})
	return tr, nil
}

// bcPath sorts the points of a trace by the size of the deflection.
type bcPath struct{ t *Trace }

func (p bcPath) Len() int { return len(p.t.Load) }
func (p bcPath) Less(i, j int) bool {
	return math.Abs(p.t.Deflection[i]) < math.Abs(p.t.Deflection[j])
}
func (p bcPath) Swap(i, j int) {
	p.t.Load[i], p.t.Load[j] = p.t.Load[j], p.t.Load[i]
	p.t.Deflection[i], p.t.Deflection[j] = p.t.Deflection[j], p.t.Deflection[i]
}

// capacity checks the inputs and evaluates one or both axes; a non-nil tr
// (only with a single axis) records the path.
func (w *bcWork) capacity(m *Member, sec Section, axis Axis, opt *BeamOptions, tr *Trace) (Result, error) {
	var o BeamOptions
	if opt != nil {
		o = *opt
	}
	if err := bcCheck(m, axis, &o); err != nil {
		return Result{}, err
	}
	if axis != Both {
		n, gov, err := w.axis(m, sec, axis, &o, tr)
		return Result{N: n, Axis: axis, Governs: gov, Mode: flexuralMode(axis)}, err
	}
	if _, mode := CriticalLoad(m, Both); mode.Twists() {
		return Result{}, ErrTwisting
	}
	nMaj, gMaj, err := w.axis(m, sec, Major, &o, nil)
	if err != nil {
		return Result{}, err
	}
	nMin, gMin, err := w.axis(m, sec, Minor, &o, nil)
	if err != nil {
		return Result{}, err
	}
	if nMaj < nMin {
		return Result{N: nMaj, Axis: Major, Governs: gMaj, Mode: ModeFlexuralMajor}, nil
	}
	return Result{N: nMin, Axis: Minor, Governs: gMin, Mode: ModeFlexuralMinor}, nil
}

func bcFinite(x float64) bool { return !math.IsNaN(x) && !math.IsInf(x, 0) }

func bcPositive(x float64) bool { return x > 0 && x <= math.MaxFloat64 }

// bcCheck validates the member and options for axis; it does not allocate.
func bcCheck(m *Member, axis Axis, o *BeamOptions) error {
	if axis != Major && axis != Minor && axis != Both {
		return errBeamAxis
	}
	if !bcPositive(m.E) || !bcPositive(m.Fy) || !bcPositive(m.Length) || !bcPositive(m.Props.A) ||
		!bcFinite(m.Bow) || !bcFinite(m.Ecc) || !bcFinite(m.Sway) {
		return errBeamMember
	}
	if b := &o.Bending; !b.Zero() {
		switch {
		case b.Axis != Major && b.Axis != Minor:
			return ErrBendingAxis
		case !bcFinite(b.Top) || !bcFinite(b.Bottom) || !bcFinite(b.Lateral) || !bcPositive(o.Load):
			return errBeamBending
		case m.Sway != 0:
			return ErrBendingSway
		}
	}
	if o.Limit != FirstYieldLimit && o.Limit != UltimateLimit {
		return errBeamLimit
	}
	if o.Limit == UltimateLimit && m.Props.AEff > 0 {
		return errBeamClass4
	}
	if o.Residual < ResidualNone || o.Residual > ResidualColdFormed {
		return fmt.Errorf("column: beam-column residual stress pattern %d is not one of the Residual constants", int(o.Residual))
	}
	if o.Elements < 0 || o.Elements > 2000 || o.Fibres < 0 || o.Fibres > 5000 {
		return errBeamMesh
	}
	for _, p := range o.Profile {
		if !bcFinite(p) {
			return errBeamProfile
		}
	}
	lo, hi := axis, axis
	if axis == Both {
		lo, hi = Major, Minor
	}
	for a := lo; a <= hi; a++ {
		for _, k := range o.Springs[a] {
			if !(k >= 0) {
				return errBeamSpring
			}
		}
		if o.Springs[a] == [2]float64{} && !bcPositive(m.K[a]) {
			return errBeamAxisProp
		}
		if o.Springs[a] != [2]float64{} && m.Sway != 0 {
			return errBeamSway
		}
		if o.Limit == FirstYieldLimit {
			if !bcPositive(bcSecond(m, a)) || !bcPositive(bcModulus(m, a)) {
				return errBeamAxisProp
			}
		}
	}
	return nil
}

// bcSecond is the second moment of area about a from Props.I, or A R^2.
func bcSecond(m *Member, a Axis) float64 {
	if m.Props.I[a] > 0 {
		return m.Props.I[a]
	}
	return m.Props.A * m.Props.R[a] * m.Props.R[a]
}

// bcModulus is the elastic section modulus about a from Props.W, or I/C.
func bcModulus(m *Member, a Axis) float64 {
	if m.Props.W[a] > 0 {
		return m.Props.W[a]
	}
	if m.Props.C[a] > 0 {
		return bcSecond(m, a) / m.Props.C[a]
	}
	return 0
}
