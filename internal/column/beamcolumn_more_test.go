package column

import (
	"errors"
	"math"
	"testing"
)

// A measured profile sampled from the half-sine bow gives the half-sine
// result; the chord through the end offsets is not part of the bow, and
// the eccentricity follows the profile's direction. Check values:
// Perry-Robertson and the first-yield load of the same member with Bow.
func TestBeamColumnProfile(t *testing.T) {
	m := bcTestMember(5000, 0, 0)
	want := bcPerry(m.Props.A, m.Props.W[Minor], m.E, m.Fy, 5000, m.Props.I[Minor], 5)
	for _, c := range []struct {
		name       string
		n          int
		sign, tilt float64
		tol        float64
	}{
		{"41 points", 41, 1, 0, 1e-5},
		{"41 points, tilted chord", 41, 1, 7, 1e-5},
		{"41 points, other side", 41, -1, 0, 1e-5},
		{"9 points", 9, 1, -3, 1e-3}, // the spline of 9 samples of a sine is within 1e-3
	} {
		p := make([]float64, c.n)
		for i := range p {
			t := float64(i) / float64(c.n-1)
			p[i] = c.sign*5*math.Sin(math.Pi*t) + c.tilt*t + 2
		}
		got, err := BeamColumn(m, Section{}, Minor, &BeamOptions{Profile: p})
		if err != nil {
			t.Fatal(err)
		}
		if rel := math.Abs(got.N/want - 1); rel > c.tol {
			t.Errorf("%s: N = %.7g, Perry-Robertson %.7g, rel %.2g", c.name, got.N, want, rel)
		}
	}
	// With an eccentricity, the profile on either side gives the same load.
	m.Ecc = 10
	p := make([]float64, 21)
	var n [2]float64
	for k, sign := range []float64{1, -1} {
		for i := range p {
			p[i] = sign * 5 * math.Sin(math.Pi*float64(i)/20)
		}
		r, err := BeamColumn(m, Section{}, Minor, &BeamOptions{Profile: p})
		if err != nil {
			t.Fatal(err)
		}
		n[k] = r.N
	}
	if math.Abs(n[0]/n[1]-1) > 1e-12 {
		t.Errorf("eccentricity with a profile on either side: %.10g and %.10g", n[0], n[1])
	}
	// An S-shaped profile excites the second mode only, which a pinned
	// member resists up to its first critical load: first yield then lies
	// above the half-sine result.
	for i := range p {
		p[i] = 5 * math.Sin(2*math.Pi*float64(i)/20)
	}
	m.Ecc = 0
	r, err := BeamColumn(m, Section{}, Minor, &BeamOptions{Profile: p})
	if err != nil {
		t.Fatal(err)
	}
	if !(r.N > want) {
		t.Errorf("S-shaped profile: N = %.6g, not above the half-sine result %.6g", r.N, want)
	}
}

// With axis Both the weaker axis is reported, and a tie reports Minor;
// a straight concentric member reaches min(A fy, Ncr) (Euler 1744).
func TestBeamColumnAxes(t *testing.T) {
	m := bcTestMember(5000, 5, 0)
	r, err := BeamColumn(m, Section{}, Both, nil)
	if err != nil {
		t.Fatal(err)
	}
	min, _ := BeamColumn(m, Section{}, Minor, nil)
	maj, _ := BeamColumn(m, Section{}, Major, nil)
	if r != min || !(maj.N > min.N) {
		t.Errorf("Both: %+v, minor %+v, major %+v", r, min, maj)
	}
	chs := Section{Shape: ShapeCHS, Diameter: 168.3, Thickness: 6.3}
	p, err := chs.Properties()
	if err != nil {
		t.Fatal(err)
	}
	mc := &Member{Props: p, E: 210000, Fy: 355, Length: 4000, K: [2]float64{1, 1}, Bow: 4}
	for _, lim := range []BeamLimit{FirstYieldLimit, UltimateLimit} {
		r, err := BeamColumn(mc, chs, Both, &BeamOptions{Limit: lim, Residual: ResidualColdFormed})
		if err != nil {
			t.Fatal(err)
		}
		if r.Axis != Minor {
			t.Errorf("%v: a tie reports %v, want minor", lim, r.Axis)
		}
	}
	for _, c := range []struct {
		length float64
		gov    string
	}{{1000, GovernsSquash}, {12000, GovernsElasticBuckling}} {
		m := bcTestMember(c.length, 0, 0)
		r, err := BeamColumn(m, Section{}, Minor, nil)
		if err != nil {
			t.Fatal(err)
		}
		ncr := math.Pi * math.Pi * m.E * m.Props.I[Minor] / (c.length * c.length)
		want := math.Min(ncr, m.Props.A*m.Fy)
		if math.Abs(r.N/want-1) > 1e-6 || r.Governs != c.gov {
			t.Errorf("straight L = %g: %+v, want %.7g (%s)", c.length, r, want, c.gov)
		}
	}
}

func TestBeamColumnNames(t *testing.T) {
	for _, l := range []BeamLimit{FirstYieldLimit, UltimateLimit} {
		got, err := ParseBeamLimit(l.String())
		if err != nil || got != l {
			t.Errorf("ParseBeamLimit(%q) = %v, %v", l.String(), got, err)
		}
	}
	for _, r := range []Residual{ResidualNone, ResidualHotRolled, ResidualWelded, ResidualColdFormed} {
		got, err := ParseResidual(r.String())
		if err != nil || got != r {
			t.Errorf("ParseResidual(%q) = %v, %v", r.String(), got, err)
		}
	}
	want := []string{"first-yield", "ultimate", "none", "hot-rolled", "welded", "cold-formed"}
	got := []string{FirstYieldLimit.String(), UltimateLimit.String(), ResidualNone.String(),
		ResidualHotRolled.String(), ResidualWelded.String(), ResidualColdFormed.String()}
	for i := range want {
		if got[i] != want[i] {
			t.Errorf("name %d: %q, want %q", i, got[i], want[i])
		}
	}
	if _, err := ParseBeamLimit("plastic"); err == nil {
		t.Error("ParseBeamLimit accepted \"plastic\"")
	}
	if _, err := ParseResidual("rolled"); err == nil {
		t.Error("ParseResidual accepted \"rolled\"")
	}
}

func TestBeamColumnErrors(t *testing.T) {
	ipe := bcIPE300
	p, err := ipe.Properties()
	if err != nil {
		t.Fatal(err)
	}
	good := Member{Props: p, E: 210000, Fy: 235, Length: 4000, K: [2]float64{1, 1}, Bow: 4}
	ult := BeamOptions{Limit: UltimateLimit}
	for _, c := range []struct {
		name string
		edit func(m *Member, s *Section, a *Axis, o *BeamOptions)
		want error
	}{
		{"axis", func(m *Member, s *Section, a *Axis, o *BeamOptions) { *a = 3 }, errBeamAxis},
		{"length", func(m *Member, s *Section, a *Axis, o *BeamOptions) { m.Length = 0 }, errBeamMember},
		{"NaN bow", func(m *Member, s *Section, a *Axis, o *BeamOptions) { m.Bow = math.NaN() }, errBeamMember},
		{"negative spring", func(m *Member, s *Section, a *Axis, o *BeamOptions) { o.Springs[Minor][1] = -1 }, errBeamSpring},
		{"NaN spring", func(m *Member, s *Section, a *Axis, o *BeamOptions) { o.Springs[Major][0] = math.NaN() }, errBeamSpring},
		{"profile", func(m *Member, s *Section, a *Axis, o *BeamOptions) { o.Profile = []float64{0, math.Inf(1), 0} }, errBeamProfile},
		{"elements", func(m *Member, s *Section, a *Axis, o *BeamOptions) { o.Elements = -2 }, errBeamMesh},
		{"limit", func(m *Member, s *Section, a *Axis, o *BeamOptions) { o.Limit = 7 }, errBeamLimit},
		{"pinned K", func(m *Member, s *Section, a *Axis, o *BeamOptions) { m.K[Minor] = 0 }, errBeamAxisProp},
		{"custom ultimate", func(m *Member, s *Section, a *Axis, o *BeamOptions) {
			*o = ult
			*s = Section{Shape: ShapeCustom, Area: 100, IMajor: 1e4, IMinor: 1e4, CMajor: 5, CMinor: 5}
		}, errBeamCustom},
		{"cold-formed I", func(m *Member, s *Section, a *Axis, o *BeamOptions) { *o = ult; o.Residual = ResidualColdFormed }, nil},
		{"hot-rolled RHS", func(m *Member, s *Section, a *Axis, o *BeamOptions) {
			*o = ult
			o.Residual = ResidualHotRolled
			*s = Section{Shape: ShapeRHS, Depth: 200, Width: 100, Thickness: 8}
		}, nil},
		{"welded round", func(m *Member, s *Section, a *Axis, o *BeamOptions) {
			*o = ult
			o.Residual = ResidualWelded
			*s = Section{Shape: ShapeRound, Diameter: 40}
		}, nil},
	} {
		m, s, a, o := good, ipe, Both, BeamOptions{}
		c.edit(&m, &s, &a, &o)
		_, err := BeamColumn(&m, s, a, &o)
		if err == nil || c.want != nil && !errors.Is(err, c.want) {
			t.Errorf("%s: error %v, want %v", c.name, err, c.want)
		}
	}
}

// The fibre sections reproduce the area and second moments of
// Section.Properties (the closed forms of Roark's Formulas for Stress and
// Strain, Table A.1), and every residual stress pattern is
// self-equilibrated: no axial force and no moment about either axis.
func TestBeamColumnFibres(t *testing.T) {
	rhs := Section{Shape: ShapeRHS, Depth: 200, Width: 100, Thickness: 8}
	for _, c := range []struct {
		sec  Section
		res  Residual
		peak float64 // largest |residual stress| / fy
	}{
		{bcIPE300, ResidualHotRolled, 0.3},
		{Section{Shape: ShapeI, Depth: 254.1, Width: 254.6, Flange: 14.2, Web: 8.6, Root: 12.7}, ResidualHotRolled, 0.5},
		{bcIPE300, ResidualWelded, 1},
		{rhs, ResidualWelded, 1},
		{rhs, ResidualColdFormed, 0.25},
		{Section{Shape: ShapeRHS, Depth: 100, Width: 200, Thickness: 8}, ResidualNone, 0},
		{Section{Shape: ShapeCHS, Diameter: 168.3, Thickness: 6.3}, ResidualColdFormed, 0.25},
		{Section{Shape: ShapeRect, Depth: 40, Width: 60}, ResidualNone, 0},
		{Section{Shape: ShapeRound, Diameter: 50}, ResidualNone, 0},
	} {
		p, err := c.sec.Properties()
		if err != nil {
			t.Fatal(err)
		}
		const fy = 355
		for _, a := range []Axis{Major, Minor} {
			var pl bcPlastic
			if _, err := pl.fibres(c.sec, a, c.res, 50, fy); err != nil {
				t.Fatal(err)
			}
			var area, second, force, moment, peak float64
			for k := range pl.fa {
				area += pl.fa[k]
				second += pl.fa[k] * pl.fz[k] * pl.fz[k]
				force += pl.fa[k] * pl.fr[k]
				moment += pl.fa[k] * pl.fr[k] * pl.fz[k]
				peak = math.Max(peak, math.Abs(pl.fr[k]))
			}
			if math.Abs(area/p.A-1) > 1e-9 || math.Abs(second/p.I[a]-1) > 5e-4 {
				t.Errorf("%v %v: fibre A %.6g I %.6g, Properties %.6g %.6g", c.sec.Shape, a, area, second, p.A, p.I[a])
			}
			if math.Abs(force) > 1e-9*p.A*fy || math.Abs(moment) > 1e-9*p.A*fy*p.C[a] {
				t.Errorf("%v %v %v: residual stresses not in equilibrium: N %.3g, M %.3g", c.sec.Shape, a, c.res, force, moment)
			}
			// The discrete pattern takes its values at cell centres, so
			// its peak lies a little inside the continuous one (or a
			// little beyond where a plate's pattern is shifted to balance).
			if peak > c.peak*fy*1.05 || peak < 0.8*c.peak*fy {
				t.Errorf("%v %v %v: peak residual stress %.4g fy, pattern %.4g fy", c.sec.Shape, a, c.res, peak/fy, c.peak)
			}
		}
	}
}

// The trace ends at the capacity, and its shape is the bow plus the
// deflection, zero at the braced ends.
func TestBeamColumnTrace(t *testing.T) {
	m := bcMemberAt(t, bcIPE300, Minor, 1.0)
	for _, o := range []*BeamOptions{{}, {Limit: UltimateLimit, Residual: ResidualHotRolled}} {
		tr, err := BeamColumnTrace(m, bcIPE300, Both, o)
		if err != nil {
			t.Fatal(err)
		}
		r, err := BeamColumn(m, bcIPE300, Both, o)
		if err != nil {
			t.Fatal(err)
		}
		top := 0.0
		for _, p := range tr.Load {
			top = math.Max(top, p)
		}
		n := len(tr.X)
		if tr.Result != r || math.Abs(top/r.N-1) > 1e-9 || len(tr.Load) != len(tr.Deflection) || len(tr.Load) < 5 ||
			n != DefaultBeamElements+1 || len(tr.Shape) != n || len(tr.Bow) != n ||
			tr.Shape[0] != 0 || tr.Shape[n-1] != 0 || math.Abs(tr.X[n-1]-m.Length) > 1e-9 ||
			math.Abs(tr.At-m.Length/2) > 1e-9 || !(tr.Shape[n/2] > tr.Bow[n/2]) {
			t.Errorf("%v: trace %+v, result %+v", o.Limit, tr, r)
		}
	}
}

// One evaluation allocates nothing once the workspace pool is warm.
func TestBeamColumnAllocs(t *testing.T) {
	if bcRace {
		t.Skip("the race detector makes sync.Pool drop workspaces")
	}
	m := bcMemberAt(t, bcIPE300, Minor, 1.0)
	for _, o := range []*BeamOptions{{}, {Limit: UltimateLimit, Residual: ResidualHotRolled}} {
		allocs := testing.AllocsPerRun(20, func() {
			if _, err := BeamColumn(m, bcIPE300, Both, o); err != nil {
				t.Fatal(err)
			}
		})
		if allocs > 0 {
			t.Errorf("%v: %g allocations per evaluation", o.Limit, allocs)
		}
	}
}

// Evaluations in parallel goroutines (each takes its own pooled
// workspace) give the serial results bit for bit.
func TestBeamColumnConcurrent(t *testing.T) {
	const n = 8
	var want [n]float64
	eval := func(k int) float64 {
		m := bcMemberAt(t, bcIPE300, Minor, 0.4+0.15*float64(k))
		r, err := BeamColumn(m, bcIPE300, Both, &BeamOptions{Limit: BeamLimit(k % 2), Residual: ResidualHotRolled})
		if err != nil {
			t.Error(err)
		}
		return r.N
	}
	for k := range want {
		want[k] = eval(k)
	}
	var got [n]float64
	done := make(chan int)
	for k := range got {
		go func() { got[k] = eval(k); done <- k }()
	}
	for range got {
		<-done
	}
	if got != want {
		t.Errorf("parallel %v, serial %v", got, want)
	}
}
