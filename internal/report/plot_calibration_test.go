package report

import (
	"fmt"
	"strings"
	"testing"

	"strutrisk/internal/assess"
)

// calibrationDoc is a calibration of n cases, the k-th at beta 3 + k/4
// (and 0.3 lower at the initial value when initial is set).
func calibrationDoc(n int, initial, atBound bool) *Document {
	c := &assess.Calibration{Factor: "gamma_m1", Value: 1.1, Low: 1, High: 1.3, TargetBeta: 3.8, AtBound: atBound, Worst: "case 0"}
	for k := 0; k < n; k++ {
		cc := assess.CalibratedCase{Case: fmt.Sprintf("case %d", k), Beta: 3 + float64(k)/4, Weight: 1}
		if initial {
			b := cc.Beta - 0.3
			cc.BetaInitial = &b
			c.Initial = 1
		}
		c.Cases = append(c.Cases, cc)
	}
	c.Cases[0].Weight = 2
	return &Document{Calibration: c}
}

// TestCalibrationFigure: the picture is drawn with a calibration only,
// names the weight beside a case, shows the initial value when the
// calibration has it and says when the value is no calibration.
func TestCalibrationFigure(t *testing.T) {
	if calibrationFigure(&Bundle{Doc: &Document{}}) != nil {
		t.Error("a calibration picture without a calibration")
	}
	for _, c := range []struct {
		name             string
		n                int
		initial, atBound bool
		want, not        []string
	}{
		{"initial", 3, true, false, []string{"case 0 (weight 2)", "the study's", "(calibrated)"}, []string{"no calibration"}},
		{"no initial", 3, false, false, []string{"(calibrated)"}, []string{"the study's"}},
		{"at bound", 40, true, true, []string{"no calibration", "case 39"}, []string{"(calibrated)"}},
	} {
		f := calibrationFigure(&Bundle{Doc: calibrationDoc(c.n, c.initial, c.atBound)})
		if f == nil {
			t.Fatalf("%s: no picture", c.name)
		}
		svg, err := f.render("svg")
		if err != nil {
			t.Fatalf("%s: %v", c.name, err)
		}
		text := string(svg) + f.Caption
		for _, s := range c.want {
			if !strings.Contains(text, s) {
				t.Errorf("%s: the picture lacks %q", c.name, s)
			}
		}
		for _, s := range c.not {
			if strings.Contains(text, s) {
				t.Errorf("%s: the picture has %q", c.name, s)
			}
		}
	}
}

// TestCalibrationReports: the HTML and Markdown reports carry a section
// with the facts, the picture (HTML) and the table of cases, and the
// summary a row per case; a value at an end of the range is flagged.
func TestCalibrationReports(t *testing.T) {
	for _, atBound := range []bool{false, true} {
		b := &Bundle{Doc: calibrationDoc(3, true, atBound)}
		html, err := HTML(b)
		if err != nil {
			t.Fatal(err)
		}
		md, sum := Markdown(b), SummaryText(b)
		// case 1: beta 3.25 at the value, 2.95 at the initial 1.000, target 3.8.
		for _, c := range []struct{ where, text, want string }{
			{"html", string(html), `<section id="calibration">`},
			{"html", string(html), `<figure id="fig-calibration">`},
			{"html", string(html), `<td>case 1</td><td class="n">1</td><td class="n">3.25</td><td class="n">−0.55</td><td class="n">2.95</td>`},
			{"html", string(html), `<td>worst</td>`},
			{"markdown", md, "## Calibration of gamma_m1"},
			{"markdown", md, "| case 1 | 1 | 3.25 | −0.55 | 2.95 |  |"},
			{"markdown", md, "| case 0 | 2 | 3.00 | −0.80 | 2.70 | worst |"},
			{"summary", sum, "    case 2                             1      3.50        -0.30            3.20\n"},
		} {
			if !strings.Contains(c.text, c.want) {
				t.Errorf("at bound %v: the %s lacks %q", atBound, c.where, c.want)
			}
		}
		flagged := strings.Contains(string(html), `class="verdict undecided">no calibration`) &&
			strings.Contains(md, "at an end of the range, no calibration")
		if flagged != atBound {
			t.Errorf("at bound %v: the reports flag the value as no calibration: %v", atBound, flagged)
		}
	}
}
