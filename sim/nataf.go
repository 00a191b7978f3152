package sim

import (
	"fmt"
	"math"
	"sync"

	"gonum.org/v1/gonum/mat"
)

// ghNodes is the number of Gauss-Hermite nodes per dimension used by
// natafRho.
const ghNodes = 48

var (
	ghOnce sync.Once
	ghX    []float64 // nodes of probabilists' Gauss-Hermite quadrature
	ghW    []float64 // weights, summing to 1 (weight function = N(0,1) density)
)

// gaussHermite returns the nodes and weights of the n-point quadrature
// against the standard normal density, by the Golub and Welsch (1969)
// method: the nodes are the eigenvalues of the Jacobi matrix of the
// probabilists' Hermite polynomials (off-diagonal sqrt(k)), the weights the
// squared first components of its normalised eigenvectors.
func gaussHermite(n int) (x, w []float64) {
	j := mat.NewSymDense(n, nil)
	for k := 1; k < n; k++ {
		j.SetSym(k-1, k, math.Sqrt(float64(k)))
	}
	var es mat.EigenSym
	if !es.Factorize(j, true) {
		panic("sim: Gauss-Hermite eigen decomposition failed")
	}
	x = es.Values(nil)
	var v mat.Dense
	es.VectorsTo(&v)
	w = make([]float64, n)
	for k := range w {
		w[k] = v.At(0, k) * v.At(0, k)
	}
	return x, w
}

func ghInit() { ghX, ghW = gaussHermite(ghNodes) }

// natafRho returns the correlation rho0 of two standard normals Z1, Z2 such
// that X1 = F1^-1(Phi(Z1)) and X2 = F2^-1(Phi(Z2)) have correlation rho
// (Nataf's model; Liu and Der Kiureghian 1986, Probabilistic Engineering
// Mechanics 1(2), give the defining integral, evaluated here by quadrature
// instead of their fitted approximations).
func natafRho(d1, d2 Dist, rho float64) (float64, error) {
	_, n1 := d1.(Normal)
	_, n2 := d2.(Normal)
	if n1 && n2 {
		return rho, nil
	}
	ghOnce.Do(ghInit)
	n := len(ghX)
	x1 := make([]float64, n)
	var m1, m2, v1, v2 float64
	for k, z := range ghX {
		x1[k] = d1.FromStdNormal(z)
		m1 += ghW[k] * x1[k]
		m2 += ghW[k] * d2.FromStdNormal(z)
	}
	for k, z := range ghX {
		a, b := x1[k]-m1, d2.FromStdNormal(z)-m2
		v1 += ghW[k] * a * a
		v2 += ghW[k] * b * b
	}
	s := math.Sqrt(v1 * v2)
	corr := func(r0 float64) float64 {
		c := math.Sqrt(math.Max(0, 1-r0*r0))
		sum := 0.0
		for k, z1 := range ghX {
			a := x1[k] - m1
			inner := 0.0
			for l, z2 := range ghX {
				inner += ghW[l] * (d2.FromStdNormal(r0*z1+c*z2) - m2)
			}
			sum += ghW[k] * a * inner
		}
		return sum / s
	}
	lo, hi := -1.0, 1.0
	flo, fhi := corr(lo)-rho, corr(hi)-rho
	if flo > 0 || fhi < 0 {
		return 0, fmt.Errorf("rho %v cannot be reached with these marginals (attainable range [%.4f, %.4f])", rho, flo+rho, fhi+rho)
	}
	// Illinois regula falsi on the monotone function corr(r0) - rho.
	x := 0.0
	side := 0
	for i := 0; i < 100; i++ {
		x = (lo*fhi - hi*flo) / (fhi - flo)
		fx := corr(x) - rho
		if math.Abs(fx) < 1e-12 || hi-lo < 1e-12 {
			break
		}
		if fx*fhi > 0 {
			hi, fhi = x, fx
			if side == 1 {
				flo /= 2
			}
			side = 1
		} else {
			lo, flo = x, fx
			if side == -1 {
				fhi /= 2
			}
			side = -1
		}
	}
	return x, nil
}
