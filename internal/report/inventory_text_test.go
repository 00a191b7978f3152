package report

import (
	"fmt"
	"math"
	"strings"
	"testing"
)

// invMember is a member with a result: beta with the interval [lo, hi],
// a verdict and a status.
func invMember(name string, beta, lo, hi float64, verdict, status string) Member {
	rf := 1 + (beta-3.8)/4
	return Member{Name: name, Beta: Index(beta), BetaCI: [2]Index{Index(lo), Index(hi)},
		Pf: 1e-4, Verdict: verdict, Status: status, ReserveFactor: &rf,
		GoverningAxis: "minor", Mode: "flexural-minor"}
}

// demoInventory is the shape of the building demo's inventory (values
// of its stored result, rounded): two members not met, one undecided,
// five met, a system sampled jointly.
func demoInventory() *Document {
	cov := 0.069
	return &Document{Title: "inv", TargetBeta: ptr(3.8), Inventory: &Inventory{
		File: "building-inventory.csv",
		Members: []Member{
			invMember("F1-C3", 3.758, 3.748, 3.770, "not met", "converged"),
			invMember("G-B3", 3.779, 3.759, 3.800, "not met", "converged"),
			invMember("G-C3", 3.797, 3.782, 3.813, "undecided", "converged"),
			invMember("F1-B3", 4.57, 4.55, 4.58, "met", "converged"),
			invMember("G-B2", 4.62, 4.60, 4.64, "met", "converged"),
			invMember("G-C2", 4.83, 4.81, 4.85, "met", "converged"),
			invMember("F1-C2", 5.08, 5.07, 5.10, "met", "converged"),
			invMember("F1-B2", 5.26, 5.25, 5.28, "met", "converged"),
		},
		System: &System{Pf: 2.13e-4, PfCI: [2]float64{1.86e-4, 2.44e-4}, Beta: 3.52, PfCoV: &cov,
			Samples: 1000000, Status: "budget reached", ExpectedFailures: 2.43e-4, PfIfIndependent: 2.42e-4,
			Method: "joint sampling"},
	}}
}

func TestInventorySummaryText(t *testing.T) {
	t.Parallel()
	got := SummaryText(&Bundle{Doc: demoInventory()})
	for _, s := range []string{
		"inventory          8 members (building-inventory.csv)",
		"system pf          2.13e-4   95 % interval [1.86e-4, 2.44e-4]",
		"system beta        3.52",
		"expected failures  2.43e-4",
		"if independent     2.42e-4",
		"budget reached, cov of pf 0.069",
		"2 not met, 1 undecided against the target beta 3.80",
		"F1-C3    3.76  [3.75, 3.77]     not met      0.990  flexural-minor",
		"G-C3     3.80  [3.78, 3.81]     undecided    0.999  flexural-minor  the interval of beta straddles the target",
		"5 other members meet the target: every member is in inventory.csv.",
	} {
		if !strings.Contains(got, s) {
			t.Errorf("summary lacks %q:\n%s", s, got)
		}
	}
	// The members that meet the target are counted, not listed.
	if strings.Contains(got, "F1-B2") {
		t.Errorf("summary lists a member that meets the target:\n%s", got)
	}
	// The HTML report and Markdown carry the same facts.
	html, err := htmlReport(&Bundle{Doc: demoInventory()}, nil, nil)
	if err != nil {
		t.Fatal(err)
	}
	for _, s := range []string{`<section id="inventory">`, "<th>system pf (at least one member fails)</th><td>2.13e-4, 95% interval 1.86e-4 to 2.44e-4</td>",
		`<td>F1-C3</td><td class="n">3.76</td><td class="n">[3.75, 3.77]</td><td class="not-met">not met</td>`,
		`<td class="undecided">undecided</td>`, "<td>the interval of β straddles the target</td>", "5 other members meet the target"} {
		if !strings.Contains(string(html), s) {
			t.Errorf("HTML lacks %q", s)
		}
	}
	md := Markdown(&Bundle{Doc: demoInventory()})
	for _, s := range []string{"## Inventory", "| system pf (at least one member fails) | 2.13e-4, 95% interval 1.86e-4 to 2.44e-4 |",
		"| G-B3 | 3.78 | \\[3.76, 3.80\\] | not met | 0.995 | flexural-minor |  |", "5 other members meet the target"} {
		if !strings.Contains(md, s) {
			t.Errorf("Markdown lacks %q:\n%s", s, md)
		}
	}
}

func TestInventoryLongListsTheWorst(t *testing.T) {
	t.Parallel()
	d := &Document{TargetBeta: ptr(3.8), Inventory: &Inventory{File: "many.csv"}}
	for i := range 200 {
		beta := 3.0 + 0.01*float64(i) // 80 members below 3.8
		v := "met"
		if beta < 3.79 {
			v = "not met"
		} else if beta < 3.81 {
			v = "undecided"
		}
		d.Inventory.Members = append(d.Inventory.Members, invMember(fmt.Sprintf("M%03d", i), beta, beta-0.01, beta+0.01, v, "converged"))
	}
	d.Inventory.Members = append(d.Inventory.Members, Member{Name: "BAD", Line: 203, Error: "member.length: must be positive"})
	got := SummaryText(&Bundle{Doc: d})
	for _, s := range []string{
		"79 not met, 2 undecided against the target beta 3.80",
		"M009     3.09", // the tenth worst
		"71 more not meeting the target or undecided, 119 other members meet the\n    target: every member is in inventory.csv.",
		"BAD: not run, line 203: member.length: must be positive",
	} {
		if !strings.Contains(got, s) {
			t.Errorf("summary lacks %q:\n%s", s, got)
		}
	}
	if strings.Contains(got, "M010") {
		t.Errorf("summary lists more than the worst ten:\n%s", got)
	}
}

func TestInventoryNoVerdictOnDoubt(t *testing.T) {
	t.Parallel()
	// A member whose estimate the engine does not trust is never given a
	// verdict, even by a document that carries one.
	d := &Document{TargetBeta: ptr(3.8), Inventory: &Inventory{Members: []Member{
		invMember("X", 4.5, 4.4, 4.6, "met", "design-point-unreliable"),
		invMember("Y", 4.6, 4.5, 4.7, "met", "converged"),
	}}}
	got := SummaryText(&Bundle{Doc: d})
	want := "X        4.50  [4.40, 4.60]     undecided    1.175  flexural-minor  estimate not trusted (design-point-unreliable)"
	if !strings.Contains(got, want) || !strings.Contains(got, "0 not met, 1 undecided") {
		t.Errorf("summary lacks %q:\n%s", want, got)
	}
}

func TestInventoryNoTarget(t *testing.T) {
	t.Parallel()
	d := &Document{Inventory: &Inventory{Members: []Member{
		invMember("A", 2.5, 2.4, 2.6, "", "converged"),
		invMember("B", math.Inf(1), 4.9, math.Inf(1), "", "converged"),
	}}}
	got := SummaryText(&Bundle{Doc: d})
	for _, s := range []string{"No target to judge by", "A        2.50  [2.40, 2.60]     -", "B         inf  [4.90, inf]"} {
		if !strings.Contains(got, s) {
			t.Errorf("summary lacks %q:\n%s", s, got)
		}
	}
	if strings.Contains(got, "met") {
		t.Errorf("a verdict without a target:\n%s", got)
	}
}

func TestInventorySystemBound(t *testing.T) {
	t.Parallel()
	// No joint sample failed: the system pf is only bounded, and beta
	// with it: Phi^-1(1e-6) = -4.7534 (standard normal tables).
	d := &Document{Inventory: &Inventory{System: &System{Pf: 0, PfCI: [2]float64{0, 1e-6}, Status: "no failures", Method: "joint sampling"}}}
	got := SummaryText(&Bundle{Doc: d})
	for _, s := range []string{"system pf          below 1e-6 (95% bound): no joint sample failed", "system beta        above 4.75"} {
		if !strings.Contains(got, s) {
			t.Errorf("summary lacks %q:\n%s", s, got)
		}
	}
	d.Inventory.System = nil
	if got := SummaryText(&Bundle{Doc: d}); !strings.Contains(got, "system pf          not estimated: see the warnings") {
		t.Errorf("no system:\n%s", got)
	}
}

func TestNormQuantile(t *testing.T) {
	t.Parallel()
	// Standard normal quantiles from tables (from memory).
	for _, c := range []struct{ p, want float64 }{{0.5, 0}, {0.025, -1.959964}, {0.05, -1.644854}, {1e-6, -4.753424}} {
		if got := normQuantile(c.p); math.Abs(got-c.want) > 1e-5 {
			t.Errorf("normQuantile(%g) = %.6f, want %.6f", c.p, got, c.want)
		}
	}
}
