package report

import (
	"regexp"
	"strings"
	"testing"
)

// Every picture's caption says what it shows and in which units, and
// every column head of a table of numbers in the HTML carries its unit.
func TestCaptionsAndHeadsGiveUnits(t *testing.T) {
	t.Parallel()
	b := demoBundle()
	figs, skipped := figures(b)
	if len(skipped) > 0 {
		t.Fatalf("pictures skipped: %v", skipped)
	}
	unit := regexp.MustCompile(`\b(kN|mm|MPa|m)\b|dimensionless|1/kN`)
	for _, f := range figs {
		if len(f.Caption) < 40 {
			t.Errorf("picture %s: caption %q too short to say what it shows", f.Name, f.Caption)
		}
		if !unit.MatchString(f.Caption) {
			t.Errorf("picture %s: caption %q names no unit", f.Name, f.Caption)
		}
	}
	out, err := HTML(b)
	if err != nil {
		t.Fatal(err)
	}
	html := string(out)
	for _, head := range []string{
		"<th>CoV (–)</th>", "<th>β at low (–)</th>", "<th>first order (–)</th>", "<th>total (–)</th>",
		"<th>importance α² (–)</th>", "<th>Spearman ρ (–)</th>", "<th>pf (–)</th>", "<th>β (–)</th>",
		"<th>95% interval of pf (–)</th>", "<th>member length (mm)</th>", "<th>unit of the mean or median</th>",
	} {
		if !strings.Contains(html, head) {
			t.Errorf("the HTML lacks the column head %s", head)
		}
	}
	// Column heads that stand for a number but name no unit.
	for _, bare := range []string{"<th>pf</th>", "<th>β</th>", "<th>CoV</th>", "<th>first order</th>", "<th>Spearman ρ</th>", "<th>95% interval</th>"} {
		if strings.Contains(html, bare) {
			t.Errorf("the HTML has a column head without a unit: %s", bare)
		}
	}
}

func TestUnitText(t *testing.T) {
	t.Parallel()
	for _, c := range []struct{ in, want string }{
		{"", "–"}, {"mm", "mm"}, {"mm4", "mm⁴"}, {"mm3", "mm³"}, {"mm^2", "mm²"}, {"kN", "kN"}, {"MPa", "MPa"},
	} {
		if got := unitText(c.in); got != c.want {
			t.Errorf("unitText(%q) = %q, want %q", c.in, got, c.want)
		}
	}
}
