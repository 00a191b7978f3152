package sim

import (
	"errors"
	"math"

	"gonum.org/v1/gonum/mat"
)

// kriging is a Gaussian-process model of a limit state in standard normal
// space: ordinary Kriging, a constant mean beta estimated by generalised
// least squares plus a Gaussian process with the anisotropic Gaussian
// (squared-exponential) correlation
//
//	R(u, v) = exp(-sum_j theta_j (u_j - v_j)^2),  theta_j = 1/(2 l_j^2),
//
// and a nugget tau on the diagonal for the numerical noise of the model.
// The length scales l_j and the nugget maximise the concentrated
// likelihood, -n ln sigma^2 - ln det R with sigma^2 = r' R^-1 r / n and r
// = y - beta (e.g. Rasmussen and Williams, Gaussian Processes for Machine
// Learning, 2006, ch. 2 and 5; Echard, Gayton and Lemaire, Structural
// Safety 33, 2011, use the same model through DACE). The prediction at u
// is mu = beta + r(u)' R^-1 r and its variance the ordinary-Kriging one,
// sigma^2 (1 - r(u)' R^-1 r(u) + (1 - 1' R^-1 r(u))^2 / 1' R^-1 1), which
// counts the uncertainty of beta: far from the training points the
// prediction reverts to beta with the whole process variance, so the
// learning function sends the model there rather than trusting it.
type kriging struct {
	dim   int
	x     []float64 // training points, row-major, n x dim
	y     []float64 // limit-state values
	logL  []float64 // ln of the length scales, then ln tau
	beta  float64   // the constant mean
	sf2   float64   // process variance sigma^2
	l     []float64 // lower Cholesky factor of R, n x n row-major
	alpha []float64 // R^-1 (y - beta)
	c     []float64 // L^-1 1
	cc    float64   // 1' R^-1 1
	theta []float64
	tau   float64
}

// kriging bounds: length scales between 0.05 and 50 in standard normal
// units, nugget between 1e-10 and 1e-2 of the process variance.
const (
	krigMinLogL = -3.0 // ln 0.05
	krigMaxLogL = 3.9  // ln 50
	krigMinLogT = -23.0
	krigMaxLogT = -4.6
)

func newKriging(dim int) *kriging {
	k := &kriging{dim: dim, logL: make([]float64, dim+1), theta: make([]float64, dim)}
	k.logL[dim] = -13.8 // tau 1e-6
	return k
}

// n returns the number of training points.
func (k *kriging) n() int { return len(k.y) }

// add appends a training point.
func (k *kriging) add(u []float64, g float64) {
	k.x = append(k.x, u...)
	k.y = append(k.y, g)
}

// fit refits the factorisation; with hyper set it first re-estimates
// the length scales and the nugget, starting from the current ones (at
// most evals likelihood evaluations).
func (k *kriging) fit(hyper bool, evals int) error {
	if k.n() < k.dim+2 {
		return errors.New("sim: kriging needs at least dim+2 points")
	}
	if hyper {
		k.tune(evals)
	}
	_, err := k.factor(k.logL)
	return err
}

// tune maximises the concentrated likelihood over the ln length scales
// and ln nugget by a compass (pattern) search from the current values:
// each parameter in turn moves by +-step while that improves the
// likelihood, and the step halves when no move does, from 1 down to 1/16
// (at most evals likelihood evaluations). gonum's optimize would pull in
// a module the project does not carry; the search is deterministic.
func (k *kriging) tune(evals int) {
	p := append([]float64(nil), k.logL...)
	obj := func() float64 {
		evals--
		for j, v := range p {
			lo, hi := krigMinLogL, krigMaxLogL
			if j == k.dim {
				lo, hi = krigMinLogT, krigMaxLogT
			}
			if v < lo || v > hi {
				return math.Inf(1)
			}
		}
		nll, err := k.factor(p)
		if err != nil {
			return math.Inf(1)
		}
		return nll
	}
	best := obj()
	for step := 1.0; step >= 1.0/16 && evals > 0; step /= 2 {
		for moved := true; moved && evals > 0; {
			moved = false
			for j := range p {
				for _, dir := range [2]float64{1, -1} {
					p[j] += dir * step
					if f := obj(); f < best {
						best, moved = f, true
						break
					}
					p[j] -= dir * step
				}
			}
		}
	}
	if !math.IsInf(best, 1) {
		copy(k.logL, p)
	}
}

// factor sets theta and tau from p, factorises R, and returns the negative
// concentrated log-likelihood n ln sigma^2 + ln det R; it sets sf2 and
// alpha.
func (k *kriging) factor(p []float64) (float64, error) {
	n, d := k.n(), k.dim
	for j := 0; j < d; j++ {
		l := math.Exp(p[j])
		k.theta[j] = 1 / (2 * l * l)
	}
	k.tau = math.Exp(p[d])
	r := mat.NewSymDense(n, nil)
	for i := 0; i < n; i++ {
		r.SetSym(i, i, 1+k.tau)
		for j := 0; j < i; j++ {
			r.SetSym(i, j, k.corr(k.x[i*d:(i+1)*d], k.x[j*d:(j+1)*d]))
		}
	}
	var ch mat.Cholesky
	if ok := ch.Factorize(r); !ok {
		return 0, errors.New("sim: kriging correlation matrix is not positive definite")
	}
	var lt mat.TriDense
	ch.LTo(&lt)
	k.l = k.l[:0]
	for i := 0; i < n; i++ {
		for j := 0; j < n; j++ {
			k.l = append(k.l, lt.At(i, j))
		}
	}
	one := make([]float64, n)
	for i := range one {
		one[i] = 1
	}
	k.c = append(k.c[:0], one...)
	k.lower(k.c, one)
	z := make([]float64, n)
	k.lower(z, k.y)
	var cz float64
	k.cc = 0
	for i, v := range k.c {
		cz += v * z[i]
		k.cc += v * v
	}
	k.beta = cz / k.cc
	var q float64
	for i := range z {
		z[i] -= k.beta * k.c[i]
		q += z[i] * z[i]
	}
	k.sf2 = math.Max(q/float64(n), 1e-300)
	k.alpha = append(k.alpha[:0], z...)
	k.upper(k.alpha)
	return float64(n)*math.Log(k.sf2) + ch.LogDet(), nil
}

// corr returns R(u, v) without the nugget.
func (k *kriging) corr(u, v []float64) float64 {
	var s float64
	for j, t := range k.theta {
		d := u[j] - v[j]
		s += t * d * d
	}
	return math.Exp(-s)
}

// lower solves L z = b.
func (k *kriging) lower(z, b []float64) {
	n := len(b)
	for i := 0; i < n; i++ {
		s := b[i]
		row := k.l[i*n : i*n+i]
		for j, v := range row {
			s -= v * z[j]
		}
		z[i] = s / k.l[i*n+i]
	}
}

// upper solves L' a = a in place.
func (k *kriging) upper(a []float64) {
	n := len(a)
	for i := n - 1; i >= 0; i-- {
		s := a[i]
		for j := i + 1; j < n; j++ {
			s -= k.l[j*n+i] * a[j]
		}
		a[i] = s / k.l[i*n+i]
	}
}

// krigScratch is the scratch memory of one goroutine's predictions.
type krigScratch struct{ r, z []float64 }

func (k *kriging) scratch() *krigScratch {
	return &krigScratch{r: make([]float64, k.n()), z: make([]float64, k.n())}
}

// predict returns the mean and the standard deviation of the prediction
// at u. ws must come from scratch after the last fit. It does not
// allocate.
func (k *kriging) predict(u []float64, ws *krigScratch) (mu, sd float64) {
	n, d := k.n(), k.dim
	r, z := ws.r[:n], ws.z[:n]
	mu = k.beta
	for i := 0; i < n; i++ {
		r[i] = k.corr(u, k.x[i*d:(i+1)*d])
		mu += r[i] * k.alpha[i]
	}
	k.lower(z, r)
	var q, cz float64
	for i, v := range z {
		q += v * v
		cz += k.c[i] * v
	}
	t := 1 - cz
	return mu, math.Sqrt(k.sf2 * math.Max(0, 1-q+t*t/k.cc))
}
