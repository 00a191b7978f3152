package study

import (
	"os"
	"path/filepath"
	"strings"
	"testing"

	"github.com/BurntSushi/toml"
)

// FuzzLoad feeds arbitrary bytes to the study loader: it must never panic,
// and a study it accepts must build and evaluate at nominal values without
// panicking. Crashers found are kept in testdata/fuzz/FuzzLoad.
func FuzzLoad(f *testing.F) {
	files, _ := filepath.Glob(filepath.Join("..", "..", "studies", "*.toml"))
	for _, name := range files {
		if b, err := os.ReadFile(name); err == nil {
			f.Add(b)
		}
	}
	f.Add([]byte(base))
	f.Add([]byte(`units = "kip-in"` + "\n" + base + "[[correlation]]\npair = [\"a\", \"b\"]\nrho = 0.5\n"))
	f.Add([]byte("[member]\nlength = \"L/0\"\n"))
	// Open sections and custom torsion keys (twisting.go).
	for _, sec := range []string{
		"shape = \"angle\"\ndepth = 100\nwidth = 60\nthickness = 8\nroot = 10\n",
		"shape = \"tee\"\ndepth = 8\nwidth = 100\nflange = 8\nweb = 6\n",
		"shape = \"channel\"\ndepth = 200\nwidth = 75\nflange = 11\nweb = 8\nthickness_loss = 6\n",
		"shape = \"custom\"\narea = 5000\ni_major = 4e6\ni_minor = 1e6\nc_major = 50\nc_minor = 25\nit = 1e4\niw = \"1 cm6\"\ny0 = -30\nz0 = 1e308\n",
	} {
		f.Add([]byte(strings.Replace(base, "shape = \"CHS\"\ndiameter = 168.3\nthickness = 8\n", sec, 1)))
	}
	f.Add([]byte(strings.NewReplacer(`ends = "pinned-pinned"`, `ends = "fixed-free"`, `bow = "L/1000"`, "bow = \"Lcr/1000\"\nsway = \"1/200\"\neccentricity = \"Lcr/500\"").Replace(base) + "[capacity]\nimperfection = \"equivalent\"\n"))
	f.Add([]byte("x = { dist = \"normal\", mean = nan, sd = inf }\n"))
	// The size and nesting limits (limits.go, nesting.go).
	for _, in := range deepInputs() {
		f.Add([]byte(in))
	}
	f.Add([]byte("x = [[[[[[1]]]]]]\n"))
	f.Add([]byte("[a.b.c.d.e]\nf = 1\n"))
	f.Add([]byte("a = \"\"\"\n[[[[[[[[\n\"\"\"\nb = '''[{[{'''\n"))
	f.Fuzz(func(t *testing.T, data []byte) {
		st, err := Parse("fuzz.toml", data)
		if err != nil {
			if _, ok := err.(*Error); !ok {
				t.Fatalf("error of type %T, want *Error", err)
			}
			return
		}
		md, err := Build(st)
		if err != nil {
			return
		}
		if _, err := md.Nominal(); err != nil {
			return
		}
		x := make([]float64, len(md.Sim.Vars))
		for i, v := range md.Sim.Vars {
			x[i] = v.Dist.Quantile(0.5)
		}
		out := make([]float64, 2)
		md.Sim.G(x, out)
	})
}

// FuzzNesting checks the nesting pre-scan against the TOML decoder: a file
// the pre-scan lets through decodes to values at most about MaxDepth deep
// (an array of tables adds a level the pre-scan does not count, so twice
// MaxDepth bounds it), so the decoder never recurses without bound.
func FuzzNesting(f *testing.F) {
	for _, in := range deepInputs() {
		f.Add([]byte(in))
	}
	f.Add([]byte(base))
	f.Add([]byte("x = [[1, [2]], {a = {b = [3]}}]\n[[v]]\n[[v.w]]\nk = 1\n"))
	f.Add([]byte("a = \"\"\"\n[[[[[[[[\n\"\"\"\nb = '''[{[{'''\nc = 'x[' # [[[\n"))
	f.Fuzz(func(t *testing.T, data []byte) {
		if len(data) > 1<<16 || nestingProblem("f", data) != nil {
			return
		}
		var raw map[string]any
		if _, err := toml.Decode(string(data), &raw); err != nil {
			return
		}
		if d := valueDepth(raw); d > 2*MaxDepth+1 {
			t.Fatalf("the pre-scan passed a file that decodes %d levels deep", d)
		}
	})
}

// valueDepth is the number of key path parts of the deepest value of v.
func valueDepth(v any) int {
	deepest := 0
	switch x := v.(type) {
	case map[string]any:
		for _, e := range x {
			deepest = max(deepest, 1+valueDepth(e))
		}
	case []map[string]any:
		for _, e := range x {
			deepest = max(deepest, 1+valueDepth(e))
		}
	case []any:
		for _, e := range x {
			deepest = max(deepest, 1+valueDepth(e))
		}
	}
	return deepest
}
