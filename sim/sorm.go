package sim

import (
	"errors"
	"fmt"
	"math"

	"gonum.org/v1/gonum/mat"
)

// Breitung returns the second-order estimate of the failure probability
// at the design point p of m (a point of FORM(m, ...)):
//
//	pf ≈ Phi(-beta) prod_i (1 + beta kappa_i)^(-1/2)
//
// where kappa_i are the principal curvatures of the limit-state surface
// at the design point, positive when the surface bends away from the
// origin (K. Breitung, "Asymptotic approximations for multinormal
// integrals", Journal of Engineering Mechanics 110(3), 1984, 357-366).
// The curvatures come from a central finite-difference Hessian in
// standard normal space (2n^2 + 1 evaluations of g). It is a diagnostic:
// a value far from Phi(-beta) says the limit state is curved and FORM's
// pf is not to be trusted. An error is returned when some beta kappa_i <=
// -1, where the formula does not apply.
func Breitung(m *Model, p DesignPoint) (float64, error) {
	if m == nil || m.G == nil {
		return 0, errors.New("sim: Breitung needs a Model with a limit state G")
	}
	t, err := NewTransform(m)
	if err != nil {
		return 0, err
	}
	if len(p.U) != t.Dim() {
		return 0, fmt.Errorf("sim: the design point has %d coordinates, the model %d", len(p.U), t.Dim())
	}
	pf, _, err := sormBreitung(modelSpace(m, t), p)
	return pf, err
}

// sormBreitung is Breitung's formula in standard normal space; it also
// returns the principal curvatures.
func sormBreitung(sp *uSpace, p DesignPoint) (float64, []float64, error) {
	g := sp.newG()
	n := sp.dim
	u := append([]float64(nil), p.U...)
	h := 1e-3 * math.Max(1, formNorm(u))
	g0 := g(u)
	grad := make([]float64, n)
	hess := mat.NewSymDense(n, nil)
	at := func(i int, di float64, j int, dj float64) float64 {
		w := append([]float64(nil), u...)
		w[i] += di
		w[j] += dj
		return g(w)
	}
	for i := 0; i < n; i++ {
		gp, gm := at(i, h, i, 0), at(i, -h, i, 0)
		grad[i] = (gp - gm) / (2 * h)
		hess.SetSym(i, i, (gp-2*g0+gm)/(h*h))
		for j := 0; j < i; j++ {
			v := (at(i, h, j, h) - at(i, h, j, -h) - at(i, -h, j, h) + at(i, -h, j, -h)) / (4 * h * h)
			hess.SetSym(i, j, v)
		}
	}
	gn := formNorm(grad)
	if gn == 0 || math.IsNaN(gn) {
		return math.NaN(), nil, errors.New("sim: zero or undefined gradient at the design point")
	}
	if n == 1 {
		return formTail(p.Beta), nil, nil
	}
	// Orthonormal basis of the tangent plane (Gram-Schmidt on the unit
	// vectors, dropping the one most aligned with the gradient).
	e := make([]float64, n)
	for i := range e {
		e[i] = grad[i] / gn
	}
	skip := 0
	for i := range e {
		if math.Abs(e[i]) > math.Abs(e[skip]) {
			skip = i
		}
	}
	basis := [][]float64{e}
	for k := 0; k < n; k++ {
		if k == skip {
			continue
		}
		v := make([]float64, n)
		v[k] = 1
		for _, b := range basis {
			d := formDot(v, b)
			for i := range v {
				v[i] -= d * b[i]
			}
		}
		nv := formNorm(v)
		for i := range v {
			v[i] /= nv
		}
		basis = append(basis, v)
	}
	q := mat.NewDense(n, n-1, nil)
	for c, b := range basis[1:] {
		for i := range b {
			q.Set(i, c, b[i])
		}
	}
	// Curvature matrix Q^T H Q / |grad|: g grows towards the safe side,
	// so positive curvature of g bends the surface away from the origin.
	var qh mat.Dense
	qh.Mul(q.T(), hess)
	var b mat.Dense
	b.Mul(&qh, q)
	bs := mat.NewSymDense(n-1, nil)
	for i := 0; i < n-1; i++ {
		for j := 0; j <= i; j++ {
			bs.SetSym(i, j, 0.5*(b.At(i, j)+b.At(j, i))/gn)
		}
	}
	var eig mat.EigenSym
	if !eig.Factorize(bs, false) {
		return math.NaN(), nil, errors.New("sim: curvature eigen-decomposition failed")
	}
	kappa := eig.Values(nil)
	pf := formTail(p.Beta)
	for _, k := range kappa {
		f := 1 + p.Beta*k
		if f <= 0 {
			return math.NaN(), kappa, fmt.Errorf("sim: Breitung's formula does not apply: beta*kappa = %.3g <= -1", p.Beta*k)
		}
		pf /= math.Sqrt(f)
	}
	return pf, kappa, nil
}
