package main

import (
	"fmt"
	"os"
	"runtime"
	"strconv"
	"strings"
	"testing"

	"strutrisk/internal/analysis"
)

// TestHostileStudyFiles: huge, endless and deeply nested study files end
// with exit 2 and a message naming the limit, not with the runtime's
// out-of-memory crash (issue 10, item 5).
func TestHostileStudyFiles(t *testing.T) {
	cases := map[string]struct{ path, want string }{
		"nested arrays": {writeStudy(t, "x = "+strings.Repeat("[", 100000)+strings.Repeat("]", 100000)+"\n"), "study.toml:1: nested deeper than 6 levels"},
		"deep header":   {writeStudy(t, good+"["+strings.Repeat("a.", 20000)+"a]\n"), "study.toml:19: nested deeper than 6 levels"},
		"inline tables": {writeStudy(t, good+"x = "+strings.Repeat("{a = ", 50000)+"1"+strings.Repeat("}", 50000)+"\n"), "study.toml:19: nested deeper"},
		"too large":     {writeStudy(t, good+"# "+strings.Repeat("x", 5<<20)+"\n"), "larger than 4194304 bytes (4 MiB)"},
	}
	if _, err := os.Stat("/dev/zero"); err == nil {
		cases["endless"] = struct{ path, want string }{"/dev/zero", "(4 MiB)"}
	}
	for name, c := range cases {
		for _, cmd := range []string{"check", "run"} {
			code, _, errs := invoke(t, cmd, c.path, "--out", t.TempDir())
			if cmd == "check" {
				code, _, errs = invoke(t, cmd, c.path)
			}
			if code != exitInput || !strings.Contains(errs, c.want) || strings.Contains(errs, "goroutine") {
				t.Errorf("%s %s: exit %d, stderr %.300q; want exit 2 and %q", cmd, name, code, errs, c.want)
			}
		}
	}
}

// TestWorkersCapped: --workers beyond 16 per core (at least 64) is bad
// input naming the cap, before the study is read (issue 10, item 8: a
// million workers took 3 GB).
func TestWorkersCapped(t *testing.T) {
	study := writeStudy(t, good)
	for _, n := range []string{"1000000", strconv.Itoa(analysis.MaxWorkers() + 1), "0"} {
		code, _, errs := invoke(t, "run", study, "--workers", n, "--out", t.TempDir())
		want := "must be between 1 and " + strconv.Itoa(analysis.MaxWorkers())
		if code != exitInput || !strings.Contains(errs, want) {
			t.Errorf("--workers %s: exit %d, stderr %q; want exit 2 and %q", n, code, errs, want)
		}
	}
	if analysis.MaxWorkers() < 64 || analysis.MaxWorkers() < 16*runtime.NumCPU() {
		t.Errorf("cap %d below 64 or 16 per core", analysis.MaxWorkers())
	}
}

// TestManyCases: check reads thousands of variants (each case used to
// decode the whole file again: 10,000 variants took 40 minutes), and
// refuses more cases than the cap, naming it, with exit 2 (issue 10,
// item 6).
func TestManyCases(t *testing.T) {
	t.Parallel() // sets no hook: runs beside the other slow tests
	variants := func(n int) string {
		var b strings.Builder
		b.WriteString(good)
		for i := 0; i < n; i++ {
			fmt.Fprintf(&b, "[[variant]]\nname = \"v%d\"\nset = { \"imperfection.bow\" = %d }\n", i, 1+i%5)
		}
		return b.String()
	}
	if code, _, errs := invoke(t, "check", writeStudy(t, variants(3000))); code != exitOK {
		t.Errorf("3000 variants: exit %d, stderr %.300s", code, errs)
	}
	for name, c := range map[string]struct{ study, want string }{
		"variants": {variants(10001), "study.toml:19: variant: 10001 variants are more than the 10000 cases a study may run"},
		"values": {good + "[sweep]\nparameter = \"member.length\"\nvalues = [" + strings.Repeat("2000,", 700000) + "2000]\n",
			"study.toml:21: sweep.values: 700001 values are more than the 10000 cases a study may run"},
	} {
		code, _, errs := invoke(t, "check", writeStudy(t, c.study))
		if code != exitInput || !strings.Contains(errs, c.want) {
			t.Errorf("%s: exit %d, stderr %.300q; want exit 2 and %q", name, code, errs, c.want)
		}
	}
}

// TestManyProblemsCounted: a file of thousands of problems lists the first
// fifty and counts them all.
func TestManyProblemsCounted(t *testing.T) {
	var b strings.Builder
	b.WriteString(good)
	for i := 0; i < 3000; i++ {
		fmt.Fprintf(&b, "[nonsense%d]\n", i)
	}
	code, _, errs := invoke(t, "check", writeStudy(t, b.String()))
	if code != exitInput || strings.Count(errs, "unknown key") != 50 ||
		!strings.Contains(errs, "2950 more problems not listed") || !strings.Contains(errs, "3000 problems in") {
		t.Errorf("exit %d, %d listed, stderr ends %q", code, strings.Count(errs, "unknown key"), errs[max(0, len(errs)-300):])
	}
}
