package sim

import (
	"errors"
	"fmt"
	"math"
	"sort"
	"strings"
)

// PulseMax is the distribution of the largest value over a reference
// period of the sum of rectangular pulse processes, by the rule of Ferry
// Borges and Castanheta (Structural Safety, LNEC Lisbon, 1971; Melchers,
// Structural Reliability Analysis and Prediction, 2nd ed., 1999, 9.4,
// from memory): load j takes r_j independent values of equal duration in
// the period, the loads ordered so that r_1 <= r_2 <= ... and each r_j
// divides r_(j+1), so that every pulse of a slower load holds a whole
// number m_(j+1) = r_(j+1)/r_j of pulses of the next. The maximum of the
// sum is then
//
//	Y_k = max of m_k values of Q_k,  Y_j = max of m_j values of (Q_j + Y_(j+1)),
//
// with m_1 = r_1 and S = Y_1, whose CDF is the nested integral
//
//	F_S(s) = { ∫ f_1(x_1) { ∫ f_2(x_2) ... F_k(s - x_1 - ... - x_(k-1))^(m_k) ... dx_2 }^(m_2) dx_1 }^(m_1).
//
// PulseMax tabulates each level on a grid as z = Phi^-1(F) (the
// integrals by the trapezoidal rule over the standard normal of each
// pulse, each tail from its own integral), so both tails keep their
// relative accuracy; values between grid points are interpolated
// linearly in z. Build it with PulseMaximum.
type PulseMax struct {
	t        zTable
	mean, sd float64
	desc     string
}

// zTable holds z = Phi^-1(CDF) at lo + i h: the standard normal value
// of each grid point, computed from the tail on its side. A sum of
// normals has z linear in y, and z interpolates far better than the
// probabilities or their logarithms in either tail.
type zTable struct {
	lo, h float64
	z     []float64
}

// Grid sizes of PulseMax: points of each level's table, and nodes of the
// integral over each pulse's standard normal on [-pulseZ, pulseZ].
const (
	pulseGrid  = 2049
	pulseNodes = 721
	pulseZ     = 9.0
	zLimit     = 38.0 // |z| beyond which Phi underflows
)

// PulseMaximum returns the distribution of the maximum over a reference
// period of the sum of pulse processes: pulses[j] is the distribution of
// one pulse of load j, repetitions[j] its number of pulses in the period.
// Sorted by repetitions, each number must divide the next.
func PulseMaximum(pulses []Dist, repetitions []int) (Dist, error) {
	if len(pulses) == 0 || len(pulses) != len(repetitions) {
		return nil, errors.New("sim: pulse maximum: give one repetition number per pulse distribution, at least one")
	}
	idx := make([]int, len(pulses))
	for i := range idx {
		idx[i] = i
		if repetitions[i] < 1 {
			return nil, fmt.Errorf("sim: pulse maximum: repetitions %d must be 1 or more", repetitions[i])
		}
	}
	sort.SliceStable(idx, func(a, b int) bool { return repetitions[idx[a]] < repetitions[idx[b]] })
	ds := make([]Dist, len(idx))
	m := make([]float64, len(idx))
	var desc []string
	prev := 1
	for k, i := range idx {
		r := repetitions[i]
		if r%prev != 0 {
			return nil, fmt.Errorf("sim: pulse maximum: %d repetitions do not divide into %d: each number of repetitions must be a whole multiple of the next smaller one", prev, r)
		}
		ds[k], m[k] = pulses[i], float64(r/prev)
		prev = r
		desc = append(desc, fmt.Sprintf("%d x %s", r, pulses[i]))
	}
	d := PulseMax{desc: "maximum of the sum of pulses " + strings.Join(desc, " + ")}
	d.t = pulseLevels(ds, m)
	d.mean, d.sd = d.t.moments()
	if !finite(d.mean) || !finite(d.sd) {
		return nil, errors.New("sim: pulse maximum: the distribution has no finite mean and spread")
	}
	return d, nil
}

func finite(x float64) bool { return !math.IsNaN(x) && !math.IsInf(x, 0) }

// pulseLevels tabulates Y_1 from the fastest load outwards: each level's
// grid spans the sum of its pulses' lower tails to the sum of the maxima
// of all their repetitions' upper tails.
func pulseLevels(ds []Dist, m []float64) zTable {
	k := len(ds)
	lo, hi := make([]float64, k+1), make([]float64, k+1)
	for j := k - 1; j >= 0; j-- {
		// Load j's pulses in the period (the fastest load's within one
		// pulse of the next slower one, which is all its level holds).
		n := cumulative(m, j)
		if j == k-1 {
			n = m[j]
		}
		top, err := MaximumOf(ds[j], n)
		if err != nil {
			top = ds[j]
		}
		low := ds[j]
		if j == k-1 {
			low = top // the fastest load alone is its maximum
		}
		lo[j] = lo[j+1] + low.FromStdNormal(-pulseZ)
		hi[j] = hi[j+1] + top.FromStdNormal(pulseZ)
	}
	// The fastest load alone: its maximum over m_k pulses, exactly.
	inner := func(y float64) float64 { return maxZ(logCDFOf(ds[k-1], y), m[k-1]) }
	var t zTable
	for j := k - 2; j >= -1; j-- {
		lv, hv := lo[j+1], hi[j+1]
		t = tabulate(lv, hv, inner)
		if j < 0 {
			break
		}
		prevT := t
		dj, mj := ds[j], m[j]
		nodes, weights := pulseQuadrature(dj)
		inner = func(y float64) float64 {
			var c, s float64
			for i, q := range nodes {
				z := prevT.at(y - q)
				c += weights[i] * stdCDF(z)
				s += weights[i] * stdCDF(-z)
			}
			lnH := math.Log(c)
			if s < 0.5 {
				lnH = math.Log1p(-s)
			}
			return maxZ(lnH, mj)
		}
	}
	return t
}

// cumulative is the number of pulses of load j in the period: the
// product of m up to j.
func cumulative(m []float64, j int) float64 {
	n := 1.0
	for i := 0; i <= j; i++ {
		n *= m[i]
	}
	return n
}

// maxZ returns Phi^-1(G) of G = F^m from lnF = ln F, from the tail on
// its side, within +-zLimit.
func maxZ(lnF, m float64) float64 {
	l := m * lnF
	var z float64
	if l < -math.Ln2 {
		z = stdQuantile(math.Exp(l))
	} else {
		z = -stdQuantile(-math.Expm1(l))
	}
	return math.Max(-zLimit, math.Min(zLimit, z))
}

// logCDFOf returns ln F(y), from the survival in the upper tail.
func logCDFOf(d Dist, y float64) float64 {
	if s := d.Survival(y); s < 0.5 {
		return math.Log1p(-s)
	}
	return math.Log(d.CDF(y))
}

// pulseQuadrature returns the values of d at the trapezoidal nodes of the
// standard normal on [-pulseZ, pulseZ] and their weights phi(z) dz.
func pulseQuadrature(d Dist) (nodes, weights []float64) {
	h := 2 * pulseZ / (pulseNodes - 1)
	nodes, weights = make([]float64, pulseNodes), make([]float64, pulseNodes)
	for i := range nodes {
		z := -pulseZ + float64(i)*h
		nodes[i], weights[i] = d.FromStdNormal(z), phi(z)*h
	}
	weights[0] /= 2
	weights[pulseNodes-1] /= 2
	return nodes, weights
}

// tabulate evaluates f on pulseGrid points from lo to hi.
func tabulate(lo, hi float64, f func(y float64) float64) zTable {
	t := zTable{lo: lo, h: (hi - lo) / (pulseGrid - 1), z: make([]float64, pulseGrid)}
	for i := range t.z {
		t.z[i] = f(lo + float64(i)*t.h)
	}
	return t
}

// at interpolates z at y; beyond the grid the probability is all on one
// side.
func (t zTable) at(y float64) float64 {
	x := (y - t.lo) / t.h
	n := len(t.z) - 1
	switch {
	case !(x >= 0):
		return -zLimit
	case x >= float64(n):
		return zLimit
	}
	i := int(x)
	if i >= n {
		i = n - 1
	}
	f := x - float64(i)
	return t.z[i] + f*(t.z[i+1]-t.z[i])
}

// solve returns the y at which the interpolated z equals u.
func (t zTable) solve(u float64) float64 {
	n := len(t.z) - 1
	i := sort.Search(n+1, func(i int) bool { return t.z[i] >= u })
	switch {
	case i == 0:
		return t.lo
	case i > n:
		return t.lo + float64(n)*t.h
	}
	a, b := t.z[i-1], t.z[i]
	f := 0.0
	if b != a {
		f = (u - a) / (b - a)
	}
	return t.lo + (float64(i-1)+f)*t.h
}

// moments integrates the mean and standard deviation from the survival
// function (trapezoidal rule): E[Y] = lo + ∫ S, E[(Y - lo)^2] = ∫ 2 (y - lo) S.
func (t zTable) moments() (mean, sd float64) {
	var m1, m2 float64
	for i, z := range t.z {
		w := t.h
		if i == 0 || i == len(t.z)-1 {
			w /= 2
		}
		s := stdCDF(-z)
		y := float64(i) * t.h
		m1 += w * s
		m2 += w * 2 * y * s
	}
	return t.lo + m1, math.Sqrt(math.Max(m2-m1*m1, 0))
}

// CDF returns P(S <= x).
func (d PulseMax) CDF(x float64) float64 { return stdCDF(d.t.at(x)) }

// Survival returns P(S > x).
func (d PulseMax) Survival(x float64) float64 { return stdCDF(-d.t.at(x)) }

// Prob returns the density phi(z) dz/dx of the interpolated z.
func (d PulseMax) Prob(x float64) float64 {
	h := d.t.h
	dz := (d.t.at(x+h/2) - d.t.at(x-h/2)) / h
	return phi(d.t.at(x)) * math.Max(dz, 0)
}

// Quantile returns the x with CDF(x) = p.
func (d PulseMax) Quantile(p float64) float64 {
	if !(p >= 0 && p <= 1) {
		panic(badProb)
	}
	return d.t.solve(fromProbs(p, 1-p))
}

// FromStdNormal returns F^-1(Phi(u)).
func (d PulseMax) FromStdNormal(u float64) float64 { return d.t.solve(u) }

// ToStdNormal returns Phi^-1(F(x)).
func (d PulseMax) ToStdNormal(x float64) float64 { return d.t.at(x) }

// Mean returns the mean, integrated at construction.
func (d PulseMax) Mean() float64 { return d.mean }

// StdDev returns the standard deviation, integrated at construction.
func (d PulseMax) StdDev() float64 { return d.sd }

// String describes the distribution.
func (d PulseMax) String() string { return d.desc }
