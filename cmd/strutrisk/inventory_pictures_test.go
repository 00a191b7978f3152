package main

import (
	"bytes"
	"image/png"
	"os"
	"path/filepath"
	"strings"
	"testing"
)

// TestInventoryPictures checks that a study with an inventory (the demo
// on a smaller budget) draws its members ranked by beta and against a
// column of the inventory, as PNG and SVG files and in the HTML report,
// and that a study without one draws neither.
func TestInventoryPictures(t *testing.T) {
	pics := []string{"inventory-ranked", "inventory-against"}
	cases := []struct {
		study string
		flags []string
		want  bool
	}{
		{cheapInventory(t, "30_000", nil), nil, true},
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

// TestInventoryPlotAgainst checks [inventory] plot_against (on the demo
// with a smaller budget): a numeric column named is the one beta is drawn
// against; a column the file does not have, or one that is not numeric,
// is a study-file error naming the key (exit 2).
func TestInventoryPlotAgainst(t *testing.T) {
	cases := []struct {
		column string
		code   int
		want   string // in the SVG when drawn, else in stderr
	}{
		{"member.section.thickness_loss", exitOK, "against member.section.thickness_loss"},
		{"member.section.thickness_los", exitInput, `did you mean "member.section.thickness_loss"`},
		{"floor", exitInput, "is not a number"},
	}
	for _, c := range cases {
		study := cheapInventory(t, "30_000", func(s string) string {
			return withoutPlotAgainst(s) + "plot_against = \"" + c.column + "\"\n"
		})
		dir := filepath.Dir(study)
		out := filepath.Join(dir, "out")
		code, _, errs := invoke(t, "run", study, "--out", out)
		if code != c.code {
			t.Fatalf("plot_against = %q: exit %d, want %d\n%s", c.column, code, c.code, errs)
		}
		if code != exitOK {
			if !strings.Contains(errs, c.want) || !strings.Contains(errs, "inventory.plot_against") {
				t.Errorf("plot_against = %q: message %q does not say %q and name the key", c.column, errs, c.want)
			}
			continue
		}
		svg, err := os.ReadFile(filepath.Join(out, "inventory-against.svg"))
		if err != nil {
			t.Fatal(err)
		}
		if !strings.Contains(string(svg), c.want) {
			t.Errorf("plot_against = %q: the picture is not drawn against it", c.column)
		}
	}
}

// withoutPlotAgainst is the study text without its own plot_against line
// (the demo names one), so that a test can give another.
func withoutPlotAgainst(text string) string {
	var keep []string
	for _, l := range strings.Split(text, "\n") {
		if !strings.HasPrefix(strings.TrimSpace(l), "plot_against") {
			keep = append(keep, l)
		}
	}
	return strings.Join(keep, "\n")
}
