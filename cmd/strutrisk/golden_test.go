package main

import (
	"bytes"
	"encoding/json"
	"flag"
	"os"
	"path/filepath"
	"strconv"
	"strings"
	"testing"
)

// The demo regression test: every demo study runs with its own seed and its
// results.json must equal the stored copy in testdata/golden, number for
// number. Update the stored copies only when a change moves the numbers on
// purpose:
//
//	go test ./cmd/strutrisk -run TestDemoGolden -update
//
// and say in the commit message why they moved (DEVELOPERS.md, "Demo
// regression test").
var (
	update    = flag.Bool("update", false, "rewrite the stored demo result documents in testdata/golden")
	slowDemos = flag.Bool("slowdemos", false, "also run the demo studies that take more than a few seconds")
)

// slowDemo lists the demos too slow for every test run (over about five
// seconds): they run with -slowdemos or -update. None at present:
// imperfection-comparison, the one demo with a sweep and variants, runs
// its numerical beam-column variant by the surrogate method in seconds.
var slowDemo = map[string]bool{}

// demoFlags are extra flags of a demo's run: the benchmark study's ten
// million samples are cut to one million, its model is the same.
var demoFlags = map[string][]string{"reference-strut": {"--samples", "1000000"}}

// goldenIgnored are the fields of the result document that may differ
// between two runs of the same study and seed: the version of the tool.
var goldenIgnored = []string{"tool_version"}

func TestDemoGolden(t *testing.T) {
	files, _ := filepath.Glob(filepath.Join("..", "..", "studies", "*.toml"))
	bench, _ := filepath.Glob(filepath.Join("..", "..", "studies", "bench", "*.toml"))
	if len(files) == 0 || len(bench) == 0 {
		t.Fatal("no demo studies found")
	}
	for _, f := range append(files, bench...) {
		name := strings.TrimSuffix(filepath.Base(f), ".toml")
		t.Run(name, func(t *testing.T) {
			if slowDemo[name] && !*slowDemos && !*update {
				t.Skip("slow demo: run with -slowdemos")
			}
			// The demos run side by side (-parallel at a time): each
			// writes its own folder, and results do not depend on the
			// workers each run gets.
			t.Parallel()
			got := goldenRun(t, f, demoFlags[name]...)
			path := filepath.Join("testdata", "golden", name+".json")
			if *update {
				if err := os.MkdirAll(filepath.Dir(path), 0o755); err != nil {
					t.Fatal(err)
				}
				if err := os.WriteFile(path, got, 0o644); err != nil {
					t.Fatal(err)
				}
				return
			}
			want, err := os.ReadFile(path)
			if err != nil {
				t.Fatalf("%v (write the stored copies with -update)", err)
			}
			if !bytes.Equal(got, want) {
				t.Errorf("%s: results.json differs from %s (if on purpose, rerun with -update and say why in the commit):\n%s", f, path, firstDiff(want, got, 6))
			}
		})
	}
}

// goldenRun runs study f with its own settings and the flags, and returns its results.json
// with the ignored fields removed, numbers kept as their JSON text.
func goldenRun(t *testing.T, f string, flags ...string) []byte {
	t.Helper()
	out := filepath.Join(t.TempDir(), "out")
	code, _, errs := invoke(t, append([]string{"run", f, "--out", out}, flags...)...)
	if code != exitOK {
		t.Fatalf("%s: exit %d\n%s", f, code, errs)
	}
	raw, err := os.ReadFile(filepath.Join(out, "results.json"))
	if err != nil {
		t.Fatal(err)
	}
	dec := json.NewDecoder(bytes.NewReader(raw))
	dec.UseNumber() // compare numbers as written, bit for bit
	var doc map[string]any
	if err := dec.Decode(&doc); err != nil {
		t.Fatalf("%s: results.json: %v", f, err)
	}
	for _, k := range goldenIgnored {
		if _, ok := doc[k]; !ok {
			t.Errorf("%s: results.json has no %q: update goldenIgnored", f, k)
		}
		delete(doc, k)
	}
	b, err := json.MarshalIndent(doc, "", "  ")
	if err != nil {
		t.Fatal(err)
	}
	return append(b, '\n')
}

// firstDiff shows up to n lines where want and got first differ.
func firstDiff(want, got []byte, n int) string {
	w, g := strings.Split(string(want), "\n"), strings.Split(string(got), "\n")
	var b strings.Builder
	for i := 0; i < len(w) || i < len(g); i++ {
		var wl, gl string
		if i < len(w) {
			wl = w[i]
		}
		if i < len(g) {
			gl = g[i]
		}
		if wl == gl {
			continue
		}
		b.WriteString("line " + strconv.Itoa(i+1) + ":\n  want " + wl + "\n  got  " + gl + "\n")
		if n--; n == 0 {
			break
		}
	}
	return b.String()
}
