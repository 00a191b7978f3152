package analysis

import (
	"math"
	"os"
	"path/filepath"
	"strings"
	"testing"
)

// invCheckStudy is a solid square column, 100 x 100 mm, fixed yield 275
// MPa, buckling curve c, a permanent load only; the inventory sets the
// length and the dead load per member; its last row cannot be built.
const invCheckStudy = `
title = "inventory check"
[member]
length = "2 m"
ends = "pinned-pinned"
[member.section]
shape = "rect"
depth = "100 mm"
width = "100 mm"
[material]
modulus = "210 GPa"
yield = "275 MPa"
[capacity]
model = "curve"
curve = "c"
[loads]
dead = { dist = "normal", mean = "1000 kN", cov = 0.1 }
[inventory]
file = "members.csv"
`

const invCheckCSV = `name, member.length (mm), loads.dead.mean (kN)
short, 2000, 1000
long, 4000, 1000
`

// chiEC3 is the buckling reduction factor of EN 1993-1-1 6.3.1.2 (6.49)
// for relative slenderness lam and imperfection factor alpha.
func chiEC3(lam, alpha float64) float64 {
	phi := 0.5 * (1 + alpha*(lam-0.2) + lam*lam)
	return math.Min(1, 1/(phi+math.Sqrt(phi*phi-lam*lam)))
}

func TestInventoryCheck(t *testing.T) {
	dir := t.TempDir()
	if err := os.WriteFile(filepath.Join(dir, "members.csv"), []byte(invCheckCSV), 0o644); err != nil {
		t.Fatal(err)
	}
	p := filepath.Join(dir, "study.toml")
	if err := os.WriteFile(p, []byte(invCheckStudy), 0o644); err != nil {
		t.Fatal(err)
	}
	l, err := Load(p)
	if err != nil {
		t.Fatal(err)
	}
	ic := l.CheckDocument().InventoryCheck
	if ic == nil || len(ic.Members) != 2 {
		t.Fatalf("inventory check %+v, want 2 members", ic)
	}
	// Closed form: A = 1e4 mm2, i = 100/sqrt(12) mm; lambda_1 = 93.9 eps,
	// eps = sqrt(235/fy) (EN 1993-1-1 6.3.1.3); curve c, alpha 0.49
	// (Table 6.1); N_b,Rd = chi A fy / gamma_M1 with gamma_M1 = 1;
	// N_Ed = 1.35 G_k (EN 1990 6.10), G_k the mean of the permanent load.
	const fy, area, alpha = 275.0, 1e4, 0.49
	r := 100 / math.Sqrt(12)
	lambda1 := 93.9 * math.Sqrt(235/fy)
	for i, length := range []float64{2000, 4000} {
		m := ic.Members[i]
		slender := length / r
		lam := slender / lambda1
		nrd := chiEC3(lam, alpha) * area * fy
		ned := 1.35 * 1000e3
		if m.Error != "" || m.CodeCheck == nil {
			t.Fatalf("%s: error %q, code check %v (%s)", m.Name, m.Error, m.CodeCheck, m.CodeCheckNotMade)
		}
		for _, c := range []struct {
			what      string
			got, want float64
		}{
			{"K L / r", m.Slenderness, slender},
			{"relative slenderness", m.RelativeSlenderness, lam},
			{"N_b,Rd", m.CodeCheck.Resistance, nrd},
			{"N_Ed", m.CodeCheck.DesignLoad, ned},
			{"utilisation", m.CodeCheck.Utilisation, ned / nrd},
		} {
			if math.Abs(c.got-c.want) > 2e-3*math.Abs(c.want) {
				t.Errorf("%s: %s %g, want %g", m.Name, c.what, c.got, c.want)
			}
		}
		want := "satisfied"
		if ned > nrd {
			want = "not satisfied"
		}
		if m.CodeCheckVerdict != want {
			t.Errorf("%s: verdict %q, want %q (N_Ed %g, N_Rd %g)", m.Name, m.CodeCheckVerdict, want, ned, nrd)
		}
	}
	text := l.CheckText()
	for _, s := range []string{"Inventory members.csv: 2 members", "short", "NOT satisfied", "code check: satisfied 1, NOT satisfied 1 (long)"} {
		if !strings.Contains(text, s) {
			t.Errorf("check text lacks %q:\n%s", s, text)
		}
	}
}
