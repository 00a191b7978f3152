package sim

import (
	"math"
	"testing"
)

// TestBinomialIntervals compares with the worked examples of Newcombe
// (1998), "Two-sided confidence intervals for the single proportion:
// comparison of seven methods", Statistics in Medicine 17, Table I,
// methods 3 (Wilson score) and 5 (exact), 95 % (from memory; 4 digits).
func TestBinomialIntervals(t *testing.T) {
	t.Parallel()
	for _, c := range []struct {
		k, n                 int64
		wLo, wHi, cpLo, cpHi float64
	}{
		{81, 263, 0.2553, 0.3662, 0.2527, 0.3676},
		{15, 148, 0.0624, 0.1605, 0.0578, 0.1617},
		{0, 20, 0, 0.1611, 0, 0.1684},
		{1, 29, 0.0061, 0.1718, 0.0009, 0.1776},
	} {
		lo, hi := WilsonInterval(c.k, c.n, 0.95)
		if math.Abs(lo-c.wLo) > 6e-5 || math.Abs(hi-c.wHi) > 6e-5 {
			t.Errorf("Wilson %d/%d = [%.4f, %.4f], want [%v, %v]", c.k, c.n, lo, hi, c.wLo, c.wHi)
		}
		lo, hi = ClopperPearson(c.k, c.n, 0.95)
		if math.Abs(lo-c.cpLo) > 6e-5 || math.Abs(hi-c.cpHi) > 6e-5 {
			t.Errorf("Clopper-Pearson %d/%d = [%.4f, %.4f], want [%v, %v]", c.k, c.n, lo, hi, c.cpLo, c.cpHi)
		}
	}
}

// TestZeroFailureInterval checks the exact bound for no failures in n
// trials, 1 - (alpha/2)^(1/n), whose one-sided 95 % form is the "rule of
// three", about 3/n (Hanley and Lippman-Hand 1983, JAMA 249(13)).
func TestZeroFailureInterval(t *testing.T) {
	t.Parallel()
	ci := binomialInterval(0, 1_000_000, 0.90)
	if ci[0] != 0 || math.Abs(ci[1]*1e6-3) > 0.01 {
		t.Errorf("0 of 1e6 at 90%% two-sided: %v, want [0, about 3e-6]", ci)
	}
	if want := 1 - math.Pow(0.025, 1.0/50); math.Abs(binomialInterval(0, 50, 0.95)[1]-want) > 1e-15 {
		t.Errorf("0 of 50: %v, want %v", binomialInterval(0, 50, 0.95), want)
	}
	b := BetaInterval(ci)
	if !math.IsInf(b[1], 1) || math.Abs(b[0]-BetaFromPf(ci[1])) > 0 {
		t.Errorf("beta interval %v", b)
	}
}
