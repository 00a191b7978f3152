package main

import (
	"encoding/csv"
	"math"
	"os"
	"path/filepath"
	"strconv"
	"strings"
	"testing"
)

// TestSweepRelativeSlenderness: a sweep over the length gives sweep.csv a
// column of the study's nominal relative slenderness, naming its axis, and
// the report tabulates the curve of every variant with it.
//
// The stocky strut (run_test.go) is a 100 x 100 mm solid square, pinned,
// E = 205000 MPa, nominal fy = 300 MPa: i = 100/sqrt(12) about either axis
// (a tie reports the minor axis) and relative slenderness L / (i pi
// sqrt(E/fy)) (EN 1993-1-1:2005 6.3.1.3, eq. 6.50, K = 1).
func TestSweepRelativeSlenderness(t *testing.T) {
	dir := t.TempDir()
	text := strings.Replace(stocky, "sobol = { samples = 1000 }", "sobol = false\ntornado = false", 1) +
		"[sweep]\nparameter = \"member.length\"\nfrom = 100\nto = 400\nsteps = 4\n" +
		"[[variant]]\nname = \"curve c\"\nset = { \"capacity.curve\" = \"c\" }\n"
	code, _, errs := invoke(t, "run", writeStudy(t, text), "--out", dir, "--samples", "20000")
	if code != 0 {
		t.Fatalf("exit %d\n%s", code, errs)
	}
	f, err := os.Open(filepath.Join(dir, "sweep.csv"))
	if err != nil {
		t.Fatal(err)
	}
	defer f.Close()
	rows, err := csv.NewReader(f).ReadAll()
	if err != nil {
		t.Fatal(err)
	}
	head := rows[0]
	col := len(head) - 1
	if head[col] != "relative_slenderness (nominal, minor axis)" {
		t.Fatalf("sweep.csv head %q has no relative slenderness column naming its axis", head)
	}
	lambda1 := math.Pi * math.Sqrt(205000.0/300)
	i := 100 / math.Sqrt(12)
	series := map[string]int{}
	for _, r := range rows[1:] {
		series[r[0]]++
		L, err := strconv.ParseFloat(r[1], 64)
		if err != nil {
			t.Fatal(err)
		}
		got, err := strconv.ParseFloat(r[col], 64)
		if err != nil {
			t.Fatalf("row %q: relative slenderness %q: %v", r, r[col], err)
		}
		if want := L / (i * lambda1); math.Abs(got-want) > 6e-5 {
			t.Errorf("length %g: relative slenderness %s, want %.4f", L, r[col], want)
		}
	}
	if len(series) != 2 || series["curve c"] != 4 {
		t.Errorf("sweep.csv curves %v, want the study and the variant at 4 lengths each", series)
	}
	for _, name := range []string{"report.html", "summary.md"} {
		b, err := os.ReadFile(filepath.Join(dir, name))
		if err != nil {
			t.Fatal(err)
		}
		for _, want := range []string{"curve c: β (–)", "relative slenderness λ (minor axis, –)", "0.169"} {
			if !strings.Contains(string(b), want) {
				t.Errorf("%s lacks %q in the table of every curve", name, want)
			}
		}
	}
}
