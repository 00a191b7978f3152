package analysis

import (
	"fmt"
	"math"
	"strings"
	"testing"

	"gonum.org/v1/gonum/stat/distuv"
)

// TestSystemLooks checks the blocks after which the joint sample is
// looked at: batches of 1, 1, 2, 4, 8, 16, 16, ... blocks.
func TestSystemLooks(t *testing.T) {
	want := []int{1, 2, 4, 8, 16, 32, 48, 64}
	b := 0
	for i, w := range want {
		b = nextLook(b)
		if b != w {
			t.Fatalf("look %d after %d blocks, want %d", i, b, w)
		}
	}
}

// TestSystemResolved checks the stopping rule on counts: the system pf
// to the target CoV, sqrt((1 - p) / (p n)) (binomial), from at least 100
// failures, and the largest share k/F to it, sqrt((1 - k/F) / k), before
// systemBatch blocks.
func TestSystemResolved(t *testing.T) {
	cases := []struct {
		name             string
		n, failures, top int64
		blocks           int
		want             bool
	}{
		{"pf 0.95 and a share of 0.5 after a block", 1000, 950, 475, 1, true},
		{"pf CoV 0.053 above 0.05", 1000, 260, 260, 1, false}, // sqrt(0.74/260) = 0.053
		{"pf CoV 0.048", 1000, 300, 300, 1, true},             // sqrt(0.7/300) = 0.048
		{"pf CoV 0.0014", 1000, 998, 998, 1, true},            // sqrt(0.002/998)
		{"few failures though the CoV is met", 100, 99, 99, 1, false},
		{"largest share 0.05 from 50 of 1000 failures", 1000, 1000, 50, 1, false},  // sqrt(0.95/50) = 0.14
		{"largest share 0.05 from 400 of 8000 failures", 8000, 8000, 400, 8, true}, // sqrt(0.95/400) = 0.049
		{"small shares after systemBatch blocks", 16000, 16000, 50, 16, true},
		{"no target", 16000, 16000, 16000, 16, false},
	}
	for _, c := range cases {
		counts := &systemCounts{n: c.n, failures: c.failures, members: []int64{c.top, c.top / 2}}
		target := 0.05
		if c.name == "no target" {
			target = 0
		}
		if got := resolved(counts, target, c.blocks); got != c.want {
			t.Errorf("%s: resolved %v, want %v (pf CoV %.3g)", c.name, got, c.want, counts.cov())
		}
	}
}

// TestSystemSharesStop checks the stop on the shares with 20 identical
// members that share nothing, each pf p the integral of stocky's
// lognormal CDF over the normal load (Simpson, as TestSystemIndependent):
// the system pf 1 - (1 - p)^20 is resolved after one block, but a share,
// p / (1 - (1 - p)^20) (a member's failure is a system failure), near
// 0.09 (k >= 364 failures of the member for a CoV of 0.05), is not
// (about 70 after one block): the sample goes on, and stops before
// systemBatch blocks with every share within its interval.
func TestSystemSharesStop(t *testing.T) {
	const n, mean = 20, 2300e3
	var b strings.Builder
	b.WriteString("name, loads.axial.mean (kN)\n")
	for i := range n {
		b.WriteString(fmt.Sprintf("M%d, 2300\n", i))
	}
	text := strings.Replace(rsStudy(""), "target_cov = 0.03", "target_cov = 0.05", 1)
	inv := runSystemStudy(t, text, b.String(), 2)
	sigma := 0.15 * mean
	f := func(z float64) float64 { return distuv.UnitNormal.Prob(z) * rsPf(mean+sigma*z) }
	const lo, hi, k = -10.0, 10.0, 4000
	h := (hi - lo) / k
	sum := f(lo) + f(hi)
	for i := 1; i < k; i++ {
		sum += float64(2+2*(i%2)) * f(lo+float64(i)*h)
	}
	p := sum * h / 3
	sysPf := 1 - math.Pow(1-p, n)
	sys := inv.System
	if !within(sysPf, sys.Pf, sys.PfCI) {
		t.Errorf("system pf %.4g [%.4g, %.4g], want 1 - (1 - p)^20 = %.4g", sys.Pf, sys.PfCI[0], sys.PfCI[1], sysPf)
	}
	if sys.Samples <= systemBlock || sys.Samples >= systemBatch*systemBlock {
		t.Errorf("%d joint samples: want more than one block (the shares are not resolved there) and fewer than %d", sys.Samples, systemBatch*systemBlock)
	}
	share := p / sysPf
	F := sys.Pf * float64(sys.Samples)
	for _, m := range inv.Members {
		// Four binomial standard errors of a share given F failures.
		if m.Share == nil || math.Abs(*m.Share-share) > 4*math.Sqrt(share*(1-share)/F) {
			t.Errorf("member %s: share %v, want %.4g", m.Name, m.Share, share)
		}
	}
}
