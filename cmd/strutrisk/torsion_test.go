package main

import (
	"encoding/json"
	"math"
	"strings"
	"testing"

	"strutrisk/internal/column"
)

// shortAngle is a pinned equal angle L 100 x 100 x 10, 600 mm long, S355,
// checked by the EN 1993-1-1 curve b. Flexural-torsional buckling sets its
// critical load at about 40 % of the minor-axis Euler load.
const shortAngle = `title = "short equal angle"
[member]
length = 600
ends = "pinned-pinned"
[member.section]
shape = "angle"
depth = 100
width = 100
thickness = 10
root = 12
[material]
modulus = 210000
yield = { dist = "lognormal", mean = 355, cov = 0.07 }
[capacity]
model = "curve"
curve = "b"
[loads]
dead = { dist = "normal", mean = "250 kN", cov = 0.1 }
imposed = { dist = "gumbel", mean = "150 kN", cov = 0.3 }
`

// The short equal angle end to end: check --json gives the
// flexural-torsional critical load of EN 1993-1-3 eq. (6.35) (the
// quadratic of Timoshenko & Gere, eq. 5-27, for a monosymmetric section)
// with G = E/2.6, and the capacity chi A fy of EN 1993-1-1 eq. (6.49) at
// lam_T = sqrt(A fy / N_cr,TF) with alpha 0.34 (6.3.1.4): below the
// flexural minor-axis capacity the tool gave before, which passed.
func TestShortEqualAngleEndToEnd(t *testing.T) {
	code, out, errs := invoke(t, "check", "--json", writeStudy(t, shortAngle))
	if code != 0 {
		t.Fatalf("exit %d: %s", code, errs)
	}
	var doc struct {
		Nominal struct {
			Capacity     float64 `json:"capacity"`
			EulerLoad    float64 `json:"euler_load"`
			CriticalLoad float64 `json:"critical_load"`
			Mode         string  `json:"mode"`
			CapacityMode string  `json:"capacity_mode"`
			Axis         string  `json:"axis"`
		} `json:"nominal"`
	}
	if err := json.Unmarshal([]byte(out), &doc); err != nil {
		t.Fatal(err)
	}
	p, err := column.Section{Shape: column.ShapeAngle, Depth: 100, Width: 100, Thickness: 10, Root: 12}.Properties()
	if err != nil {
		t.Fatal(err)
	}
	e, g, l, fy := 210000.0, 210000/2.6, 600.0, 355.0
	i02 := p.R[0]*p.R[0] + p.R[1]*p.R[1] + p.S[0]*p.S[0] + p.S[1]*p.S[1]
	nt := (g*p.It + math.Pi*math.Pi*e*p.Iw/(l*l)) / i02
	ny := math.Pi * math.Pi * e * p.I[column.Major] / (l * l) // the symmetry axis
	nz := math.Pi * math.Pi * e * p.I[column.Minor] / (l * l)
	q := p.S[0] * p.S[0] / i02
	r := nt / ny
	nft := ny / (2 * (1 - q)) * (1 + r - math.Sqrt((1-r)*(1-r)+4*q*r))
	n := doc.Nominal
	if n.Mode != "flexural-torsional" || math.Abs(n.CriticalLoad-nft) > 5e-3*nft {
		t.Errorf("critical load %.6g N (%s), EN 1993-1-3 eq. 6.35 gives %.6g flexural-torsional", n.CriticalLoad, n.Mode, nft)
	}
	if math.Abs(n.EulerLoad-nz) > 1e-6*nz || n.Axis != "minor" {
		t.Errorf("euler_load %.6g (%s), want the flexural minor-axis load %.6g", n.EulerLoad, n.Axis, nz)
	}
	chi := func(lam float64) float64 { // EN 1993-1-1 eq. (6.49), curve b
		phi := 0.5 * (1 + 0.34*(lam-0.2) + lam*lam)
		return math.Min(1, 1/(phi+math.Sqrt(phi*phi-lam*lam)))
	}
	a := p.A
	want := a * fy * chi(math.Sqrt(a*fy/nft))
	flexural := a * fy * chi(math.Sqrt(a*fy/nz))
	if n.CapacityMode != "flexural-torsional" || math.Abs(n.Capacity-want) > 5e-3*want {
		t.Errorf("capacity %.6g (%s), want %.6g", n.Capacity, n.CapacityMode, want)
	}
	if !(n.Capacity < 0.92*flexural) {
		t.Errorf("capacity %.6g not below the flexural-only %.6g", n.Capacity, flexural)
	}
	// The text check says what governs.
	_, text, _ := invoke(t, "check", writeStudy(t, shortAngle))
	for _, w := range []string{"flexural-torsional buckling governs", "governing elastic critical load"} {
		if !strings.Contains(text, w) {
			t.Errorf("check text lacks %q:\n%s", w, text)
		}
	}
}

// A first-yield model on the same angle says that it stretches the
// formula to the twisting mode; a single checked axis that misses it says
// so too.
func TestTwistingWarnings(t *testing.T) {
	pr := strings.Replace(shortAngle, "model = \"curve\"\ncurve = \"b\"\n", "model = \"perry-robertson\"\n[imperfection]\nbow = \"L/1000\"\n", 1)
	axis := strings.Replace(shortAngle, "curve = \"b\"\n", "curve = \"b\"\naxis = \"minor\"\n", 1)
	beam := strings.Replace(strings.Replace(pr, "perry-robertson", "beam-column", 1), "length = 600", "length = 1100", 1)
	for _, c := range []struct{ study, want string }{
		{pr, "capacity.model: flexural-torsional buckling (1739 kN) governs the elastic critical load; the first-yield formula is applied"},
		{axis, "capacity.axis: minor alone is checked, but flexural-torsional buckling at 1739 kN comes before"},
		{beam, "capacity.model: flexural-torsional buckling at 1504 kN is within 25 % of the flexural critical load 1285 kN"},
	} {
		code, out, errs := invoke(t, "check", writeStudy(t, c.study))
		if code != 0 || !strings.Contains(out, c.want) {
			t.Errorf("exit %d, output lacks %q:\n%s%s", code, c.want, out, errs)
		}
	}
}
