package main

import (
	"bytes"
	"image/png"
	"os"
	"path/filepath"
	"strings"
	"testing"
)

// TestInventoryPictures checks that a study with an inventory draws its
// members ranked by beta and against a column of the inventory, as PNG
// and SVG files and in the HTML report, and that a study without one
// draws neither.
func TestInventoryPictures(t *testing.T) {
	pics := []string{"inventory-ranked", "inventory-against"}
	cases := []struct {
		study string
		flags []string
		want  bool
	}{
		{"../../studies/building-inventory.toml", nil, true},
		{"../../studies/eccentric-strut.toml", []string{"--samples", "20000", "--method", "monte-carlo"}, false},
	}
	for _, c := range cases {
		out := filepath.Join(t.TempDir(), "out")
		code, _, errs := invoke(t, append([]string{"run", c.study, "--out", out}, c.flags...)...)
		if code != exitOK {
			t.Fatalf("%s: exit %d\n%s", c.study, code, errs)
		}
		html, err := os.ReadFile(filepath.Join(out, "report.html"))
		if err != nil {
			t.Fatal(err)
		}
		for _, p := range pics {
			raw, err := os.ReadFile(filepath.Join(out, p+".png"))
			if !c.want {
				if err == nil {
					t.Errorf("%s: %s.png drawn for a study without an inventory", c.study, p)
				}
				if strings.Contains(string(html), `id="fig-`+p+`"`) {
					t.Errorf("%s: report.html shows %s for a study without an inventory", c.study, p)
				}
				continue
			}
			if err != nil {
				t.Errorf("%s: %s.png not written: %v", c.study, p, err)
				continue
			}
			img, err := png.Decode(bytes.NewReader(raw))
			if err != nil {
				t.Errorf("%s: %s.png: %v", c.study, p, err)
			} else if b := img.Bounds(); b.Dx() < 900 || b.Dy() < 300 {
				t.Errorf("%s: %s.png is %dx%d, want at least 900x300", c.study, p, b.Dx(), b.Dy())
			}
			if _, err := os.Stat(filepath.Join(out, p+".svg")); err != nil {
				t.Errorf("%s: %s.svg not written: %v", c.study, p, err)
			}
			if !strings.Contains(string(html), `id="fig-`+p+`"`) {
				t.Errorf("%s: report.html does not show %s", c.study, p)
			}
		}
	}
}
