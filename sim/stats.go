package sim

import "math"

// Bins of the histograms kept for every output.
const (
	// histBins is the number of bins of OutputStats.Hist, spread over the
	// range of the pilot sample widened by a tenth on each side.
	histBins = 50
	// fineSub fine bins make one bin of OutputStats.Hist; the fine grid,
	// used for the quantiles, extends fineExt histogram bins beyond it on
	// each side (about 0.4 of the pilot range).
	fineSub  = 40
	fineExt  = 17
	fineBins = (histBins + 2*fineExt) * fineSub
)

// statsLayout fixes the bins of one output's histograms. It is set from a
// pilot sample so that it is the same for every block (deterministic
// results) and never changes afterwards (constant memory). Each value is
// binned once, on the fine grid; the histogram of OutputStats is summed
// from it.
type statsLayout struct {
	shift     float64 // subtracted before summing moments
	lo, width float64 // histogram
	flo, finv float64 // fine grid: start and inverse width
}

// newLayout returns the layout for values seen in a pilot sample.
func newLayout(vals []float64) statsLayout {
	lo, hi, sum, n := math.Inf(1), math.Inf(-1), 0.0, 0
	for _, v := range vals {
		if math.IsNaN(v) || math.IsInf(v, 0) {
			continue
		}
		lo, hi = math.Min(lo, v), math.Max(hi, v)
		sum += v
		n++
	}
	if n == 0 {
		lo, hi = 0, 1
	}
	span := hi - lo
	if span <= 0 || span < 1e-9*math.Abs(hi) {
		span = math.Max(1e-6*math.Abs(hi), 1e-12)
		lo, hi = lo-span/2, hi+span/2
	}
	l := statsLayout{}
	if n > 0 {
		l.shift = sum / float64(n)
	}
	l.lo = lo - 0.1*span
	l.width = 1.2 * span / histBins
	l.flo = l.lo - fineExt*l.width
	l.finv = fineSub / l.width
	return l
}

// streamStats accumulates one output over a block in constant memory.
type streamStats struct {
	n        int64
	nan      int64
	s1, s2   float64 // sums of (v - shift) and its square
	min, max float64
	fine     []float64
	fUnder   float64
	fOver    float64
	// pad keeps the hot fields of two workers' accumulators off a shared
	// cache line.
	pad [128]byte
}

func newStreamStats() *streamStats {
	return &streamStats{fine: make([]float64, fineBins)}
}

func (s *streamStats) reset() {
	fine := s.fine
	*s = streamStats{}
	s.fine, s.min, s.max = fine, math.Inf(1), math.Inf(-1)
	clear(s.fine)
}

// add records v. It does not allocate.
func (s *streamStats) add(l *statsLayout, v float64) {
	if math.IsNaN(v) {
		s.nan++
		return
	}
	s.n++
	d := v - l.shift
	s.s1 += d
	s.s2 += d * d
	if v < s.min {
		s.min = v
	}
	if v > s.max {
		s.max = v
	}
	if i := (v - l.flo) * l.finv; i < 0 {
		s.fUnder++
	} else if i >= fineBins {
		s.fOver++
	} else {
		s.fine[int(i)]++
	}
}

// merge adds o to s. Counts add exactly; the moment sums are added in the
// order of the calls, which Run keeps in block order.
func (s *streamStats) merge(o *streamStats) {
	s.n += o.n
	s.nan += o.nan
	s.s1 += o.s1
	s.s2 += o.s2
	s.min = math.Min(s.min, o.min)
	s.max = math.Max(s.max, o.max)
	for i, c := range o.fine {
		s.fine[i] += c
	}
	s.fUnder += o.fUnder
	s.fOver += o.fOver
}

// quantile returns the p-quantile by linear interpolation inside the fine
// bin holding it; beyond the fine range it returns Min or Max.
func (s *streamStats) quantile(l *statsLayout, p float64) float64 {
	target := p * float64(s.n)
	c := s.fUnder
	if target <= c {
		return s.min
	}
	for i, k := range s.fine {
		if c+k >= target && k > 0 {
			v := l.flo + (float64(i)+(target-c)/k)/l.finv
			return math.Min(s.max, math.Max(s.min, v))
		}
		c += k
	}
	return s.max
}

// result returns the summary of the accumulated values.
func (s *streamStats) result(name string, l *statsLayout) OutputStats {
	o := OutputStats{Name: name, N: s.n, Min: s.min, Max: s.max}
	if s.n == 0 {
		o.Mean, o.SD, o.Min, o.Max = math.NaN(), math.NaN(), math.NaN(), math.NaN()
	} else {
		fn := float64(s.n)
		m := s.s1 / fn
		o.Mean = l.shift + m
		if s.n > 1 {
			o.SD = math.Sqrt(math.Max(0, (s.s2-fn*m*m)/(fn-1)))
		}
	}
	o.Quantiles = make([]float64, len(QuantileLevels))
	for i, p := range QuantileLevels {
		if s.n == 0 {
			o.Quantiles[i] = math.NaN()
			continue
		}
		o.Quantiles[i] = s.quantile(l, p)
	}
	o.Hist = Histogram{Lo: l.lo, Width: l.width, Counts: make([]float64, histBins), Under: s.fUnder, Over: s.fOver}
	for j, c := range s.fine {
		switch k := j/fineSub - fineExt; {
		case k < 0:
			o.Hist.Under += c
		case k >= histBins:
			o.Hist.Over += c
		default:
			o.Hist.Counts[k] += c
		}
	}
	return o
}
