package column

import (
	"math"
	"testing"
)

// TestTimberKc checks k_c of EN 1995-1-1:2004 eqs. (6.25) to (6.29):
// k = 0.5 (1 + beta_c (lam - 0.3) + lam^2), k_c = 1 / (k + sqrt(k^2 -
// lam^2)), and k_c = 1 for lam <= 0.3 (6.3.2(2)). The value of k, worked by
// hand from eq. (6.27), is shown beside each k_c.
func TestTimberKc(t *testing.T) {
	cases := []struct {
		curve  string
		lam, k float64 // k is shown, not used: eq. (6.27)
		kc     float64
	}{
		{"solid", 0.3, 0.545, 1},         // lam_rel <= 0.3, eq. (6.25)
		{"solid", 0.5, 0.645, 0.950153},  // 0.5 (1 + 0.2*0.2 + 0.25)
		{"solid", 1, 1.07, 0.689343},     // 0.5 (1 + 0.2*0.7 + 1)
		{"solid", 2, 2.67, 0.225283},     // 0.5 (1 + 0.2*1.7 + 4)
		{"glulam", 0.3, 0.545, 1},        //
		{"glulam", 0.5, 0.635, 0.974241}, // 0.5 (1 + 0.1*0.2 + 0.25)
		{"glulam", 1, 1.035, 0.768120},   // 0.5 (1 + 0.1*0.7 + 1)
		{"glulam", 2, 2.585, 0.236813},   // 0.5 (1 + 0.1*1.7 + 4)
	}
	for _, c := range cases {
		p, err := MaterialCurve(Timber, c.curve)
		if err != nil {
			t.Fatal(err)
		}
		if k := 0.5 * (1 + p.Alpha[Major]*(c.lam-p.Lambda0) + c.lam*c.lam); math.Abs(k-c.k) > 1e-12 {
			t.Errorf("%s lam %g: k = %g, eq. (6.27) gives %g", c.curve, c.lam, k, c.k)
		}
		kc := ReductionFactor(c.lam, p.Alpha[Major], p.Lambda0)
		if math.Abs(kc-c.kc) > 1e-6 {
			t.Errorf("%s lam %g: k_c = %.6f, want %.6f", c.curve, c.lam, kc, c.kc)
		}
		// k_c from eq. (6.25) with k of the table, independently.
		if c.lam > 0.3 {
			if want := 1 / (c.k + math.Sqrt(c.k*c.k-c.lam*c.lam)); math.Abs(kc-want) > 1e-12 {
				t.Errorf("%s lam %g: k_c = %g, eq. (6.25) with k = %g gives %g", c.curve, c.lam, kc, c.k, want)
			}
		}
	}
}

// TestMetalCurves checks chi of EN 1993-1-4:2006 5.4.2 (eq. 5.2, Table
// 5.2) and EN 1999-1-1:2007 6.3.1.2 (eq. 6.49, Table 6.6) at a few relative
// slendernesses: Phi = 0.5 (1 + alpha (lam - lam0) + lam^2) (shown) and
// chi = 1 / (Phi + sqrt(Phi^2 - lam^2)).
func TestMetalCurves(t *testing.T) {
	cases := []struct {
		kind      Kind
		curve     string
		axis      Axis
		alpha, l0 float64 // Table 5.2 / 6.6 (from memory)
		lam, phi  float64
		chi       float64
	}{
		{Stainless, "hollow", Major, 0.49, 0.40, 0.4, 0.58, 1},
		{Stainless, "hollow", Minor, 0.49, 0.40, 1.0, 1.147, 0.585209},
		{Stainless, "cold-formed-open", Major, 0.49, 0.40, 1.5, 1.8945, 0.327685},
		{Stainless, "welded-open", Major, 0.49, 0.20, 1.0, 1.196, 0.539939},
		{Stainless, "welded-open", Minor, 0.76, 0.20, 0.5, 0.739, 0.779320},
		{Stainless, "welded-open", Minor, 0.76, 0.20, 1.5, 2.119, 0.276570},
		{Aluminium, "A", Major, 0.20, 0.10, 0.5, 0.665, 0.906261},
		{Aluminium, "A", Minor, 0.20, 0.10, 1.0, 1.09, 0.656295},
		{Aluminium, "B", Major, 0.32, 0.00, 0.4, 0.644, 0.870539},
		{Aluminium, "B", Minor, 0.32, 0.00, 1.5, 1.865, 0.336332},
	}
	for _, c := range cases {
		p, err := MaterialCurve(c.kind, c.curve)
		if err != nil {
			t.Fatal(err)
		}
		if p.Alpha[c.axis] != c.alpha || p.Lambda0 != c.l0 {
			t.Errorf("%s %s %s: alpha %g lambda_0 %g, want %g %g", c.kind, c.curve, c.axis, p.Alpha[c.axis], p.Lambda0, c.alpha, c.l0)
		}
		if phi := 0.5 * (1 + c.alpha*(c.lam-c.l0) + c.lam*c.lam); math.Abs(phi-c.phi) > 1e-12 {
			t.Errorf("%s %s lam %g: Phi %g, shown %g", c.kind, c.curve, c.lam, phi, c.phi)
		}
		chi := ReductionFactor(c.lam, p.Alpha[c.axis], p.Lambda0)
		if math.Abs(chi-c.chi) > 1e-6 {
			t.Errorf("%s %s %s lam %g: chi %.6f, want %.6f", c.kind, c.curve, c.axis, c.lam, chi, c.chi)
		}
	}
}

// TestMaterialCurveNames checks the names each material takes and that a
// curve of another material is refused.
func TestMaterialCurveNames(t *testing.T) {
	if _, err := MaterialCurve(Timber, "b"); err == nil {
		t.Error("timber took the steel curve b")
	}
	if _, err := MaterialCurve(Steel, "solid"); err == nil {
		t.Error("steel took the timber curve solid")
	}
	if p, err := MaterialCurve(Steel, "c"); err != nil || p.Alpha != [2]float64{0.49, 0.49} || p.Lambda0 != 0.2 {
		t.Errorf("steel c: %v %v, want alpha 0.49 (EN 1993-1-1 Table 6.1), lambda_0 0.2", p, err)
	}
	for _, k := range []Kind{Steel, Stainless, Aluminium, Timber} {
		if n := MaterialCurveNames(k); len(n) == 0 {
			t.Errorf("%s has no curves", k)
		}
		if got, err := ParseKind(k.String()); err != nil || got != k {
			t.Errorf("ParseKind(%q) = %v, %v", k.String(), got, err)
		}
	}
}

// TestCurvePlateau checks that the curve model reads the material's plateau:
// a timber rectangle at lam_rel = 0.3 is at full strength (EN 1995-1-1
// eq. 6.25), a steel one with the same alpha is not (plateau 0.2).
func TestCurvePlateau(t *testing.T) {
	p, err := Section{Shape: ShapeRect, Depth: 200, Width: 200}.Properties()
	if err != nil {
		t.Fatal(err)
	}
	m := Member{Props: p, E: 11000, Fy: 21, K: [2]float64{1, 1}, Alpha: [2]float64{0.2, 0.2}}
	// lam_rel = (L/r) / (pi sqrt(E/f)) = 0.3
	m.Length = 0.3 * math.Pi * math.Sqrt(m.E/m.Fy) * p.R[Minor]
	m.Kind, m.Lambda0 = Timber, 0.3
	r, err := Curve(&m, Both)
	if err != nil {
		t.Fatal(err)
	}
	if want := p.A * m.Fy; math.Abs(r.N-want) > 1e-9*want {
		t.Errorf("timber at lam 0.3: N %g, want A f = %g", r.N, want)
	}
	m.Kind = Steel
	r, _ = Curve(&m, Both)
	if want := p.A * m.Fy * ReductionFactor(0.3, 0.2, 0.2); !(r.N < p.A*m.Fy) || math.Abs(r.N-want) > 1e-9*want {
		t.Errorf("steel at lam 0.3: N %g, want %g below A fy", r.N, want)
	}
}

// TestKMod checks k_mod and k_def against EN 1995-1-1:2004 Tables 3.1
// (solid timber, glulam, LVL) and 3.2 (solid timber, glulam).
func TestKMod(t *testing.T) {
	cases := []struct {
		service int
		d       Duration
		want    float64
	}{
		{1, Permanent, 0.60}, {1, LongTerm, 0.70}, {1, MediumTerm, 0.80}, {1, ShortTerm, 0.90}, {1, Instantaneous, 1.10},
		{2, Permanent, 0.60}, {2, MediumTerm, 0.80}, {2, Instantaneous, 1.10},
		{3, Permanent, 0.50}, {3, LongTerm, 0.55}, {3, MediumTerm, 0.65}, {3, ShortTerm, 0.70}, {3, Instantaneous, 0.90},
	}
	for _, c := range cases {
		if got, err := KMod(c.service, c.d); err != nil || got != c.want {
			t.Errorf("KMod(%d, %s) = %g, %v; want %g", c.service, c.d, got, err, c.want)
		}
	}
	for s, want := range map[int]float64{1: 0.6, 2: 0.8, 3: 2.0} {
		if got, err := KDef(s); err != nil || got != want {
			t.Errorf("KDef(%d) = %g, %v; want %g", s, got, err, want)
		}
	}
	if _, err := KMod(4, Permanent); err == nil {
		t.Error("service class 4 accepted")
	}
	if _, err := ParseDuration("medum"); err == nil {
		t.Error("a misspelt duration was accepted")
	}
	for _, n := range DurationNames() {
		if d, err := ParseDuration(n); err != nil || d.String() != n {
			t.Errorf("ParseDuration(%q) = %v, %v", n, d, err)
		}
	}
	// EN 1995-1-1 2.3.2.2 eq. (2.15): E_fin = E / (1 + psi k_def).
	if got := CreepModulus(11000, 0.6, 1); math.Abs(got-6875) > 1e-9 {
		t.Errorf("CreepModulus = %g, want 11000/1.6 = 6875", got)
	}
}
