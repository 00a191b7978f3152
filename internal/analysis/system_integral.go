package analysis

import (
	"fmt"
	"math"

	"gonum.org/v1/gonum/integrate/quad"
)

// linearMember is a member's margin linearised at its design point in
// standard normal space: Z = alpha·U, failure when Z < -Beta. Only the
// components of alpha on the shared normals matter between members: given
// the shared normals s, Z is normal with mean A·s and standard deviation
// SD = sqrt(1 - |A|^2), independently of every other member, so
//
//	P(member survives | s) = Phi((Beta + A·s) / SD).
type linearMember struct {
	Beta float64
	// Idx are the indices of the shared normals the member takes, A its
	// components of alpha on them.
	Idx []int
	A   []float64
	SD  float64
}

// minSD keeps a member whose margin is all shared normals (SD = 0, its
// survival a step in s) finite.
const minSD = 1e-12

// newLinearMember returns the member of index beta whose unit direction
// has the components a on the shared normals idx; the rest of the unit
// length is the member's own.
func newLinearMember(beta float64, idx []int, a []float64) linearMember {
	ss := 0.0
	for _, x := range a {
		ss += x * x
	}
	if ss > 1 { // rounding, or an equivalent plane a touch long
		f := 1 / math.Sqrt(ss)
		for k := range a {
			a[k] *= f
		}
		ss = 1
	}
	return linearMember{Beta: beta, Idx: idx, A: a, SD: math.Max(math.Sqrt(1-ss), minSD)}
}

// logSurvival is the log of the probability that every member survives
// given the shared normals s: the sum of log Phi((Beta + A·s)/SD).
func logSurvival(ms []linearMember, s []float64) float64 {
	l := 0.0
	for i := range ms {
		m := &ms[i]
		x := m.Beta
		for k, j := range m.Idx {
			x += m.A[k] * s[j]
		}
		l += logPhi(x / m.SD)
	}
	return l
}

// logPhi is log Phi(x), accurate in both tails: log1p of the upper tail
// for x > 0, and the asymptotic series where the lower tail comes near
// underflow (below -30; lowerTailLog).
func logPhi(x float64) float64 {
	if x > 0 {
		q := 0.5 * math.Erfc(x/math.Sqrt2)
		if q < 1e-4 { // log1p(-q) by its series, to 3e-13 relative
			return -q * (1 + q*(0.5+q/3))
		}
		return math.Log1p(-q)
	}
	if x > -30 {
		return math.Log(0.5 * math.Erfc(-x/math.Sqrt2))
	}
	return lowerTailLog(x)
}

// lowerTailLog is log Phi(x) for x far below zero by the asymptotic
// series Phi(x) = phi(x)/|x| (1 - 1/x^2 + 3/x^4 - 15/x^6 + ...)
// (Abramowitz & Stegun 26.2.12); below -30 the next term is under 1e-10.
func lowerTailLog(x float64) float64 {
	r := 1 / (x * x)
	return -x*x/2 - math.Log(-x) - 0.5*math.Log(2*math.Pi) + math.Log1p(r*(-1+r*(3-15*r)))
}

// failGiven is P(some member fails | s) = 1 - exp(logSurvival), by expm1
// so that a tiny probability keeps its digits.
func failGiven(ms []linearMember, s []float64) float64 {
	return -math.Expm1(logSurvival(ms, s))
}

// seriesIntegral is the first-order probability that at least one of
// the members fails, E[P(some member fails | S)] over the nShared
// standard normals S, with an estimate of the integration's absolute
// error and a sentence on how it was computed.
type seriesIntegral struct {
	Pf, Err float64
	Method  string
}

// linearSeriesPf integrates the members' conditional failure over the
// shared normals: exactly with none, by composite Gauss-Legendre
// quadrature with one (error: the change from n to 2n panels), else by
// sampling the shared normals given one member's failure (sampleSeries;
// error: the standard error).
func linearSeriesPf(ms []linearMember, nShared int, seed uint64, workers int) seriesIntegral {
	used := usedShared(ms, nShared)
	switch used {
	case 0:
		return seriesIntegral{Pf: failGiven(ms, nil), Method: "no shared normal: 1 - prod Phi(beta_i), exact"}
	case 1:
		return quadSeries(ms, nShared)
	}
	return sampleSeries(ms, nShared, used, seed, workers)
}

// usedShared counts the shared normals some member has a non-zero
// component on.
func usedShared(ms []linearMember, nShared int) int {
	seen := make([]bool, nShared)
	n := 0
	for _, m := range ms {
		for k, j := range m.Idx {
			if m.A[k] != 0 && !seen[j] {
				seen[j] = true
				n++
			}
		}
	}
	return n
}

// quadSpan bounds the quadrature over one shared normal: phi(10) is
// 8e-23, so the part left out is below 2e-23 of probability.
const quadSpan = 10.0

// quadSeries integrates over the one shared normal that matters by
// composite 8-point Gauss-Legendre on [-10, 10], from 32 panels,
// doubling them until two counts agree to 1e-8 relative or 2048 panels
// (a member whose margin is nearly all the shared normal makes a steep
// integrand); the finer value is returned, the difference is the error.
func quadSeries(ms []linearMember, nShared int) seriesIntegral {
	s := make([]float64, nShared)
	j := -1
	for _, m := range ms {
		for k, i := range m.Idx {
			if m.A[k] != 0 {
				j = i
			}
		}
	}
	x, w := make([]float64, 8), make([]float64, 8)
	integral := func(panels int) float64 {
		h := 2 * quadSpan / float64(panels)
		sum := 0.0
		for p := range panels {
			lo := -quadSpan + float64(p)*h
			quad.Legendre{}.FixedLocations(x, w, lo, lo+h)
			for k := range x {
				s[j] = x[k]
				sum += w[k] * math.Exp(-x[k]*x[k]/2) * failGiven(ms, s)
			}
		}
		return sum / math.Sqrt(2*math.Pi)
	}
	n := 32
	coarse := integral(n)
	for {
		n *= 2
		fine := integral(n)
		if err := math.Abs(fine - coarse); err <= 1e-8*fine || n >= 2048 {
			return seriesIntegral{Pf: fine, Err: err,
				Method: fmt.Sprintf("one shared normal: composite Gauss-Legendre quadrature over it (%d panels of 8 points on [-10, 10])", n)}
		}
		coarse = fine
	}
}
