package study

import (
	"fmt"
	"runtime"
	"strings"
	"testing"
)

// variantsStudy is the base study with n variants, each setting the bow.
func variantsStudy(n int) []byte {
	var b strings.Builder
	b.WriteString(base)
	for i := 0; i < n; i++ {
		fmt.Fprintf(&b, "[[variant]]\nname = \"v%d\"\nset = { \"imperfection.bow\" = %d }\n", i, 1+i%5)
	}
	return []byte(b.String())
}

// TestCasesCheckedInLinearWork: checking n variants costs work in
// proportion to n. Each case used to decode the whole file again, so four
// times the variants took sixteen times the work (issue 10, item 6: 10,000
// variants took 40 minutes). Work is measured as bytes allocated, which
// does not depend on timing.
func TestCasesCheckedInLinearWork(t *testing.T) {
	alloc := func(n int) uint64 {
		data := variantsStudy(n)
		var a, b runtime.MemStats
		runtime.ReadMemStats(&a)
		if _, err := Parse("v.toml", data); err != nil {
			t.Fatal(err)
		}
		runtime.ReadMemStats(&b)
		return b.TotalAlloc - a.TotalAlloc
	}
	small, large := alloc(200), alloc(800)
	if r := float64(large) / float64(small); r > 6 {
		t.Errorf("4 times the variants allocated %.1f times as much: not linear", r)
	}
}

// TestCaseCap: more cases than MaxCases are refused, naming the cap, and
// a derived case still reports problems at its own lines.
func TestCaseCap(t *testing.T) {
	_, err := Parse("v.toml", variantsStudy(MaxCases+1))
	if err == nil || !strings.Contains(err.Error(), "more than the 10000 cases") {
		t.Errorf("%d variants: %v, want the cap named", MaxCases+1, err)
	}
	values := "[sweep]\nparameter = \"member.length\"\nvalues = [" + strings.Repeat("3000, ", MaxCases) + "3000]\n"
	_, err = Parse("s.toml", []byte(base+values))
	if err == nil || !strings.Contains(err.Error(), "sweep.values: 10001 values are more than the 10000 cases") {
		t.Errorf("%d swept values: %v, want the cap named", MaxCases+1, err)
	}
	// The study and 100 variants at 100 values: 101 x 101 - 1 cases.
	sweep := "[sweep]\nparameter = \"member.length\"\nfrom = 2000\nto = 3000\nsteps = 100\n"
	data := append([]byte(base+sweep), variantsStudy(100)[len(base):]...)
	_, err = Parse("s.toml", data)
	if err == nil || !strings.Contains(err.Error(), "10200 cases (the study and 100 variants, at 100 swept values) are more than the 10000") {
		t.Errorf("100 variants at 100 values: %v, want the cap named", err)
	}
}
