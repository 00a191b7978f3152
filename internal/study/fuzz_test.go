package study

import (
	"os"
	"path/filepath"
	"testing"
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
	f.Add([]byte("x = { dist = \"normal\", mean = nan, sd = inf }\n"))
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
