package analysis

import (
	"os"
	"path/filepath"
	"testing"
)

// writeStudy writes a study file into a fresh folder and returns its path.
func writeStudy(t *testing.T, text string) string {
	t.Helper()
	p := filepath.Join(t.TempDir(), "study.toml")
	if err := os.WriteFile(p, []byte(text), 0o644); err != nil {
		t.Fatal(err)
	}
	return p
}

// mustLoad loads the study text or stops the test.
func mustLoad(t *testing.T, text string) *Loaded {
	t.Helper()
	l, err := Load(writeStudy(t, text))
	if err != nil {
		t.Fatalf("load: %v", err)
	}
	return l
}

// good is a valid study: a pinned solid rectangle with a random yield
// and two random loads (the same as the command's tests).
const good = `title = "test strut"
[member]
length = 2000
ends = "pinned-pinned"
[member.section]
shape = "rect"
depth = 100
width = 50
[material]
modulus = 200000
yield = { dist = "lognormal", mean = 250, cov = 0.1 }
[imperfection]
bow = 2
[loads]
dead = { dist = "normal", mean = "100 kN", cov = 0.1 }
imposed = { dist = "gumbel", mean = "80 kN", cov = 0.3 }
[target]
beta = 3.8
`

// stocky is a short solid square strut on the buckling-curve model: its
// relative slenderness (L/r)/(pi sqrt(E/fy)) = 10.39/(pi sqrt(205000/fy))
// is 0.127 at the mean yield and stays below 0.2 up to fy = 748 MPa (nine
// standard deviations of the yield's log), so chi = 1 (EN 1993-1-1:2005
// 6.3.1.2(4)) and the capacity is R = A fy x model factor: a product of
// lognormals, itself lognormal. Against a lognormal load S the reliability
// index is exact in closed form (Melchers & Beck, Structural Reliability
// Analysis and Prediction, 3rd ed., 2018, chapter 3, lognormal R and S;
// chapter from memory):
//
//	beta = ln[(muR/muS) sqrt((1+VS^2)/(1+VR^2))] / sqrt(ln[(1+VR^2)(1+VS^2)])
//
// with 1 + VR^2 = (1 + 0.10^2)(1 + 0.05^2), muR = 100 x 100 x 300 x 1 N,
// muS = 1.5e6 N, VS = 0.20: beta = 3.108297, pf = Phi(-beta) = 9.40844e-4
// (computed from the formula).
const stocky = `title = "stocky strut, lognormal R and S"
[member]
length = 300
ends = "pinned-pinned"
[member.section]
shape = "rect"
depth = 100
width = 100
[material]
modulus = 205000
yield = { dist = "lognormal", mean = 300, cov = 0.10 }
[capacity]
model = "curve"
curve = "b"
model_factor = { dist = "lognormal", mean = 1.0, cov = 0.05 }
[loads]
axial = { dist = "lognormal", mean = "1500 kN", cov = 0.20 }
[target]
beta = 3.8
[analysis]
samples = 2_000_000
target_cov = 0.04
seed = 7
[sensitivity]
sobol = { samples = 1000 }
`

// beamGood is the good study on the numerical beam-column at first yield.
var beamGood = good + "[capacity]\nmodel = \"beam-column\"\nlimit = \"first-yield\"\n"
