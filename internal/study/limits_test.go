package study

import (
	"fmt"
	"os"
	"path/filepath"
	"runtime"
	"strings"
	"testing"
)

// TestFileSizeLimit: a file over MaxFileSize is refused before it is read
// whole, naming the limit; /dev/zero fails at once instead of exhausting
// memory.
func TestFileSizeLimit(t *testing.T) {
	big := filepath.Join(t.TempDir(), "big.toml")
	data := []byte(base + "# " + strings.Repeat("x", MaxFileSize) + "\n")
	if err := os.WriteFile(big, data, 0o644); err != nil {
		t.Fatal(err)
	}
	names := []string{big}
	if _, err := os.Stat("/dev/zero"); err == nil {
		names = append(names, "/dev/zero")
	}
	for _, name := range names {
		_, err := Load(name)
		if err == nil || !strings.Contains(err.Error(), "4 MiB") {
			t.Errorf("Load(%s): %v, want the 4 MiB limit named", name, err)
		}
	}
	if _, err := Parse("big.toml", data); err == nil || !strings.Contains(err.Error(), "4 MiB") {
		t.Errorf("Parse of %d bytes: %v, want the 4 MiB limit named", len(data), err)
	}
	// Just under the limit is read (and here fails only on its content).
	ok := []byte(base + "# " + strings.Repeat("x", MaxFileSize-len(base)-3) + "\n")
	if _, err := Parse("ok.toml", ok); err != nil {
		t.Errorf("Parse of %d bytes: %v", len(ok), err)
	}
}

// deep builds the adversarial nestings of issue 10, item 5.
func deepInputs() map[string]string {
	return map[string]string{
		"arrays":                  "x = " + strings.Repeat("[", 100000) + strings.Repeat("]", 100000) + "\n",
		"header":                  "[" + strings.Repeat("a.", 20000) + "a]\nk = 1\n",
		"inline tables":           "x = " + strings.Repeat("{a = ", 50000) + "1" + strings.Repeat("}", 50000) + "\n",
		"dotted key":              strings.Repeat("a.", 5000) + "a = 1\n",
		"arrays of inline tables": "x = " + strings.Repeat("[{a = ", 20) + "1" + strings.Repeat("}]", 20) + "\n",
		"long key":                base + "[loads]\n\"" + strings.Repeat("w", 200) + "\" = 1\n",
		"long header":             "[" + strings.Repeat("b", 100) + "." + strings.Repeat("c", 100) + "]\n",
	}
}

// TestNestingLimit: deep or long key paths are refused before the TOML
// parser sees them, naming the line and the limit.
func TestNestingLimit(t *testing.T) {
	for name, in := range deepInputs() {
		_, err := Parse("deep.toml", []byte(in))
		e, ok := err.(*Error)
		if !ok || len(e.Problems) != 1 {
			t.Errorf("%s: %v, want one problem", name, err)
			continue
		}
		p := e.Problems[0]
		if !strings.Contains(p.Msg, "deeper than 6") && !strings.Contains(p.Msg, "longer than 128") || p.Line < 1 {
			t.Errorf("%s: %s, want the limit named at a line", name, p)
		}
	}
	// A real study's deepest paths stay well inside the limits.
	fine := base + `[[variant]]
name = "per axis"
set = { "member.k" = { major = { dist = "uniform", min = 0.7, max = 1.0 }, minor = 1.0 } }
[capacity]
profile = [0.0, 1.0, [2.0][0], 1.0, 0.0]
`
	_, err := Parse("fine.toml", []byte(fine))
	if err != nil && strings.Contains(err.Error(), "deeper") {
		t.Errorf("a study 5 levels deep: %v", err)
	}
	if pr := nestingProblem("f", []byte(strings.Repeat("[", MaxDepth-1)+"\n")); pr == nil {
		// A header of MaxDepth-1 brackets is invalid TOML but not deep.
	} else {
		t.Errorf("unclosed header: %v", pr)
	}
}

// TestLoaderAllocations: on adversarial files (many keys, tables, long
// lists, deep but allowed paths, many variants) the loader allocates about
// 100 times the file size at most, in all. The TOML decoder alone takes 40
// to 90 times on such files, and 120 times on a file made only of tiny
// tables ("[t1]\nk = 1\n"): the bound is 140 for that one. Before the
// limits, a flat file of unknown keys allocated 430 times its size and a
// 31-deep header 330 times.
func TestLoaderAllocations(t *testing.T) {
	if raceOn {
		// The race detector's shadow bookkeeping adds allocations of its
		// own; the plain test run (CI runs both) checks the bound.
		t.Skip("allocation ratios are measured without the race detector")
	}
	n := 20000
	keys := func(prefix string, sep string) string {
		var b strings.Builder
		b.WriteString(prefix)
		for i := 0; i < n; i++ {
			fmt.Fprintf(&b, "k%d = 1%s", i, sep)
		}
		return b.String()
	}
	inputs := map[string]string{
		"flat keys":      keys("", "\n"),
		"deep header":    keys("["+strings.Repeat("a.", MaxDepth-2)+"a]\n", "\n"),
		"long header":    keys("["+strings.Repeat("h", MaxKeyPath-12)+"]\n", "\n"),
		"inline table":   "x = {" + keys("", ", ") + "z = 1}\n",
		"one-line list":  "x = [" + strings.Repeat("1,", 3*n) + "1]\n",
		"list of lines":  "x = [" + strings.Repeat("1,\n", 3*n) + "1]\n",
		"tables":         tables(n),
		"array tables":   strings.Repeat("[[v]]\n", 3*n),
		"variants":       base + strings.Repeat("[[variant]]\nname = \"a\"\nset = { \"imperfection.bow\" = 1 }\n", 500),
		"deep but legal": "x = " + strings.Repeat("[", MaxDepth-1) + strings.Repeat("]", MaxDepth-1) + "\n",
	}
	for name, in := range inputs {
		data := []byte(in)
		var before, after runtime.MemStats
		runtime.ReadMemStats(&before)
		Parse("adversarial.toml", data)
		runtime.ReadMemStats(&after)
		ratio := float64(after.TotalAlloc-before.TotalAlloc) / float64(len(data))
		t.Logf("%-15s %8d bytes, %5.1f times", name, len(data), ratio)
		limit := 110.0
		if name == "tables" {
			limit = 140
		}
		if ratio > limit && len(data) > 1000 {
			t.Errorf("%s: %d bytes, the loader allocated %.0f times the size", name, len(data), ratio)
		}
	}
}

// tables writes n distinct tables of one key.
func tables(n int) string {
	var b strings.Builder
	for i := 0; i < n; i++ {
		fmt.Fprintf(&b, "[t%d]\nk = 1\n", i)
	}
	return b.String()
}

// TestProblemsCapped: a file of thousands of unknown keys lists the first
// problems and counts the rest.
func TestProblemsCapped(t *testing.T) {
	var b strings.Builder
	b.WriteString(base)
	for i := 0; i < 5000; i++ {
		fmt.Fprintf(&b, "[nonsense%d]\n", i)
	}
	_, err := Parse("many.toml", []byte(b.String()))
	e, ok := err.(*Error)
	if !ok {
		t.Fatalf("%v, want *Error", err)
	}
	if len(e.Problems) != maxProblems || e.Unlisted != 5000-maxProblems || !strings.Contains(e.Error(), "\n4950 more problems not listed") {
		t.Errorf("%d problems, %d unlisted; want %d listed and the rest counted", len(e.Problems), e.Unlisted, maxProblems)
	}
}

// TestEveryDimHasARange: each dimension has a range of magnitudes
// (ranges.go), so a new one is not read without bounds.
func TestEveryDimHasARange(t *testing.T) {
	for d := Dimensionless; d.String() != "dim(?)"; d++ {
		if _, ok := magnitude[d]; !ok {
			t.Errorf("dimension %s has no range in ranges.go", d)
		}
	}
}
