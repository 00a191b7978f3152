package analysis

import (
	"math"
	"strings"
	"testing"

	"gonum.org/v1/gonum/stat/distuv"
)

// TestLogPhi checks log Phi in its tails: the asymptotic series against
// log of erfc where both hold (Abramowitz & Stegun 26.2.12), and the
// upper tail, where log Phi(x) = log1p(-Phi(-x)) is about -Phi(-x) and a
// plain log of Phi would give 0.
func TestLogPhi(t *testing.T) {
	for _, x := range []float64{-30, -33, -37} {
		want := math.Log(0.5 * math.Erfc(-x/math.Sqrt2))
		if got := lowerTailLog(x); math.Abs(got-want) > 1e-9 {
			t.Errorf("series at %g: %.15g, log erfc: %.15g", x, got, want)
		}
	}
	if got := logPhi(-40); !(got < -800 && got > -810) {
		t.Errorf("log Phi(-40) = %g, want about -804.6", got)
	}
	for _, x := range []float64{6, 8.5, 12} { // -Phi(-x) to 1e-9 relative
		want := -distuv.UnitNormal.CDF(-x)
		if got := logPhi(x); !relClose(got, want, 1e-6) {
			t.Errorf("log Phi(%g) = %.6g, want %.6g", x, got, want)
		}
	}
}

// TestLinearSeriesSampled checks the sampling over several shared
// normals on a rare system: members whose shared components are a1, a2
// on two normals are, by the rotation invariance of the standard normal,
// members with the one component sqrt(a1^2 + a2^2) on one normal, which
// the quadrature integrates; the sampled value must hold it within four
// standard errors and that error must be small (a plain sample of the
// shared normals would see almost nothing of a pf of 1e-9).
func TestLinearSeriesSampled(t *testing.T) {
	const n = 20
	var two, one []linearMember
	for i := range n {
		beta := 6.2 + 0.01*float64(i)
		two = append(two, newLinearMember(beta, []int{0, 1}, []float64{0.6, 0.5}))
		one = append(one, newLinearMember(beta, []int{0}, []float64{math.Hypot(0.6, 0.5)}))
	}
	want := linearSeriesPf(one, 1, 0, 1)
	got := linearSeriesPf(two, 2, 11, 2)
	t.Logf("quadrature %.6g (error %.2g), sampled %.6g (se %.2g)", want.Pf, want.Err, got.Pf, got.Err)
	if want.Pf > 1e-7 || want.Pf < 1e-11 {
		t.Fatalf("pf %.3g: not the rare system meant", want.Pf)
	}
	if math.Abs(got.Pf-want.Pf) > 4*got.Err || got.Err > 0.05*want.Pf {
		t.Errorf("sampled %.6g, standard error %.3g; quadrature %.6g", got.Pf, got.Err, want.Pf)
	}
	if again := linearSeriesPf(two, 2, 11, 1); again != got {
		t.Errorf("1 worker: %+v; 2 workers: %+v", again, got)
	}
}

// inventoryLinear is n members of an invented building: each takes the
// one normal shared by all, one of 10 batch normals and one of 4 floor
// normals, with indices from 3.5 to 4.5.
func inventoryLinear(n int) ([]linearMember, int) {
	ms := make([]linearMember, n)
	for i := range ms {
		beta := 3.5 + float64(i%101)/100
		ms[i] = newLinearMember(beta, []int{0, 1 + i%10, 11 + i%4}, []float64{0.3, 0.4, 0.5})
	}
	return ms, 15
}

// BenchmarkLinearSeries2000 integrates 2,000 members over 15 shared
// normals (the first-order system step of a 2,000-member inventory,
// FORM of the members aside).
func BenchmarkLinearSeries2000(b *testing.B) {
	ms, d := inventoryLinear(2000)
	for b.Loop() {
		linearSeriesPf(ms, d, 1, 2)
	}
}

// BenchmarkLinearSeries2000One integrates 2,000 members over one shared
// normal (the quadrature).
func BenchmarkLinearSeries2000One(b *testing.B) {
	ms, _ := inventoryLinear(2000)
	for i := range ms {
		ms[i] = newLinearMember(ms[i].Beta, []int{0}, []float64{0.6})
	}
	for b.Loop() {
		linearSeriesPf(ms, 1, 1, 2)
	}
}

// TestLinearSeriesStep checks members whose margins are all the one
// shared normal (a = 1): each fails when s < -beta_i, so the system
// fails when s < -min beta, pf = Phi(-3) exactly; the quadrature of the
// step is rough, and its stated error must cover the truth and be warned
// of above 1 %.
func TestLinearSeriesStep(t *testing.T) {
	ms := []linearMember{newLinearMember(3, []int{0}, []float64{1}), newLinearMember(3.3, []int{0}, []float64{1})}
	r := linearSeriesPf(ms, 1, 0, 1)
	want := distuv.UnitNormal.CDF(-3)
	if math.Abs(r.Pf-want) > r.Err || r.Err > 0.05*want {
		t.Errorf("pf %.6g, error %.2g; want %.6g", r.Pf, r.Err, want)
	}
	if w := r.errorWarning(); (r.Err > 0.01*r.Pf) != (w != "") {
		t.Errorf("error %.2g of pf %.3g: warning %q", r.Err, r.Pf, w)
	}
	if w := (&seriesIntegral{Pf: 1e-3, Err: 2e-5}).errorWarning(); !strings.Contains(w, "2 %") {
		t.Errorf("warning %q", w)
	}
}

// TestLinearSeriesSampledNotRare checks the sampling over several shared
// normals on a union that is not rare: 200 members each failing with
// probability Phi(-1.5) = 0.067 (their sum P = 13), which the members'
// shared components tie loosely. By the rotation invariance of the
// standard normal they are members with one component on one normal,
// which the quadrature integrates. The sampled value must hold it within
// four standard errors, lie within [0, 1], and have a standard error a
// plain sample of 2,048 would give (below 0.01): importance sampling of
// the union alone weights each sample up to P and gave 1.0001 +- 0.044 on
// the 2,000-member benchmark.
func TestLinearSeriesSampledNotRare(t *testing.T) {
	const n = 200
	var two, one []linearMember
	for i := range n {
		beta := 1.5 + 0.002*float64(i)
		two = append(two, newLinearMember(beta, []int{0, 1}, []float64{0.3, 0.4}))
		one = append(one, newLinearMember(beta, []int{0}, []float64{0.5}))
	}
	want := linearSeriesPf(one, 1, 0, 1)
	got := linearSeriesPf(two, 2, 5, 2)
	t.Logf("quadrature %.6g (error %.2g), sampled %.6g (se %.2g): %s", want.Pf, want.Err, got.Pf, got.Err, got.Method)
	if want.Pf < 0.5 || want.Pf > 0.9999 {
		t.Fatalf("pf %.4g: not the likely union meant", want.Pf)
	}
	if math.Abs(got.Pf-want.Pf) > 4*got.Err || got.Err > 0.01 || got.Pf > 1 {
		t.Errorf("sampled %.6g, standard error %.3g; quadrature %.6g", got.Pf, got.Err, want.Pf)
	}
}
