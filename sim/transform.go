package sim

import (
	"fmt"
	"math"
)

// Transform maps standard normal space u to the physical space x of a Model
// through the Gaussian copula (Nataf): correlated normals are obtained from
// independent ones by the Cholesky factor of the normal-space correlation,
// then each is mapped through its marginal. It is safe for concurrent use.
//
// The normal-space correlation of each correlated pair is found so that the
// variables themselves have the requested correlation: the correlation of
// the pair under the copula is computed by two-dimensional Gauss-Hermite
// quadrature (48 x 48 nodes), and the normal-space coefficient is its root
// by bracketed regula falsi (the Illinois variant). This is exact, up to
// quadrature error, for any marginals; two normal marginals keep their
// coefficient unchanged.
type Transform struct {
	vars []Variable
	// chol is the lower Cholesky factor of the normal-space correlation,
	// row-major n x n; nil when all variables are independent.
	chol []float64
	// first[i] is the first column with a non-zero entry in row i of chol.
	first []int
	// corr[i] marks a variable that is correlated with another.
	corr []bool
	// rho0 is the normal-space correlation matrix (row-major), nil when
	// independent.
	rho0  []float64
	draws []drawer
}

// NewTransform builds the transformation of m, checking its variables and
// correlations.
func NewTransform(m *Model) (*Transform, error) {
	if m == nil {
		return nil, fmt.Errorf("sim: nil model")
	}
	n := len(m.Vars)
	if n == 0 {
		return nil, fmt.Errorf("sim: the model has no variables")
	}
	index := make(map[string]int, n)
	t := &Transform{vars: m.Vars, corr: make([]bool, n), draws: make([]drawer, n)}
	for i, v := range m.Vars {
		if v.Name == "" {
			return nil, fmt.Errorf("sim: variable %d has no name", i)
		}
		if _, dup := index[v.Name]; dup {
			return nil, fmt.Errorf("sim: variable %q is defined twice", v.Name)
		}
		if v.Dist == nil {
			return nil, fmt.Errorf("sim: variable %q has no distribution", v.Name)
		}
		index[v.Name] = i
		if d, ok := v.Dist.(drawer); ok {
			t.draws[i] = d
		} else {
			t.draws[i] = quantileDrawer{v.Dist}
		}
	}
	if len(m.Corr) == 0 {
		return t, nil
	}
	rho := make([]float64, n*n)
	for i := 0; i < n; i++ {
		rho[i*n+i] = 1
	}
	seen := make(map[[2]int]bool)
	for _, c := range m.Corr {
		i, ok := index[c.A]
		if !ok {
			return nil, fmt.Errorf("sim: correlation names unknown variable %q", c.A)
		}
		j, ok := index[c.B]
		if !ok {
			return nil, fmt.Errorf("sim: correlation names unknown variable %q", c.B)
		}
		if i == j {
			return nil, fmt.Errorf("sim: correlation of %q with itself", c.A)
		}
		if i > j {
			i, j = j, i
		}
		if seen[[2]int{i, j}] {
			return nil, fmt.Errorf("sim: correlation of %q and %q is given twice", c.A, c.B)
		}
		seen[[2]int{i, j}] = true
		if !(c.Rho > -1 && c.Rho < 1) {
			return nil, fmt.Errorf("sim: correlation of %q and %q must be in (-1, 1), got %v", c.A, c.B, c.Rho)
		}
		if c.Rho == 0 {
			continue
		}
		for _, k := range []int{i, j} {
			if _, ok := m.Vars[k].Dist.(Fixed); ok {
				return nil, fmt.Errorf("sim: variable %q is fixed and cannot be correlated", m.Vars[k].Name)
			}
		}
		r0, err := natafRho(m.Vars[i].Dist, m.Vars[j].Dist, c.Rho)
		if err != nil {
			return nil, fmt.Errorf("sim: correlation of %q and %q: %v", c.A, c.B, err)
		}
		rho[i*n+j], rho[j*n+i] = r0, r0
		t.corr[i], t.corr[j] = true, true
	}
	any := false
	for _, c := range t.corr {
		any = any || c
	}
	if !any {
		return t, nil
	}
	L, bad := cholesky(rho, n)
	if bad >= 0 {
		var with []string
		for k := 0; k < bad; k++ {
			if rho[bad*n+k] != 0 {
				with = append(with, m.Vars[k].Name)
			}
		}
		return nil, fmt.Errorf("sim: the correlation matrix is not positive definite in normal space: the correlations of %q with %q are inconsistent", m.Vars[bad].Name, with)
	}
	t.chol, t.rho0 = L, rho
	t.first = make([]int, n)
	for i := 0; i < n; i++ {
		t.first[i] = i
		for k := 0; k < i; k++ {
			if L[i*n+k] != 0 {
				t.first[i] = k
				break
			}
		}
	}
	return t, nil
}

// cholesky returns the lower factor of the symmetric n x n matrix a, or the
// index of the first row where a is found not to be positive definite.
func cholesky(a []float64, n int) ([]float64, int) {
	L := make([]float64, n*n)
	for i := 0; i < n; i++ {
		for j := 0; j <= i; j++ {
			s := a[i*n+j]
			for k := 0; k < j; k++ {
				s -= L[i*n+k] * L[j*n+k]
			}
			if i == j {
				if s <= 1e-12 {
					return nil, i
				}
				L[i*n+i] = math.Sqrt(s)
			} else {
				L[i*n+j] = s / L[j*n+j]
			}
		}
	}
	return L, -1
}

// Dim returns the number of random variables.
func (t *Transform) Dim() int { return len(t.vars) }

// Vars returns the variables of the transformation (not a copy).
func (t *Transform) Vars() []Variable { return t.vars }

// NormalCorrelation returns the normal-space correlation between variables
// i and j.
func (t *Transform) NormalCorrelation(i, j int) float64 {
	if i == j {
		return 1
	}
	if t.rho0 == nil {
		return 0
	}
	return t.rho0[i*len(t.vars)+j]
}

// Correlated reports whether variable i is correlated with another one.
func (t *Transform) Correlated(i int) bool { return t.corr[i] }

// ToX stores in x the physical point of the standard normal point u.
func (t *Transform) ToX(x, u []float64) {
	n := len(t.vars)
	if t.chol == nil {
		for i, v := range t.vars {
			x[i] = v.Dist.FromStdNormal(u[i])
		}
		return
	}
	for i, v := range t.vars {
		z := u[i]
		if t.corr[i] {
			z = 0
			row := t.chol[i*n : i*n+i+1]
			for k := t.first[i]; k <= i; k++ {
				z += row[k] * u[k]
			}
		}
		x[i] = v.Dist.FromStdNormal(z)
	}
}

// ToU stores in u the standard normal point of the physical point x.
func (t *Transform) ToU(u, x []float64) {
	n := len(t.vars)
	for i, v := range t.vars {
		z := v.Dist.ToStdNormal(x[i])
		if t.chol != nil && t.corr[i] {
			row := t.chol[i*n : i*n+i+1]
			for k := t.first[i]; k < i; k++ {
				z -= row[k] * u[k]
			}
			z /= row[i]
		}
		u[i] = z
	}
}

// correlate replaces the independent standard normals z of the correlated
// variables by L z, in place (rows from the last, which only read earlier
// entries).
func (t *Transform) correlate(z []float64) {
	if t.chol == nil {
		return
	}
	n := len(t.vars)
	for i := n - 1; i >= 0; i-- {
		if !t.corr[i] {
			continue
		}
		s := 0.0
		row := t.chol[i*n : i*n+i+1]
		for k := t.first[i]; k <= i; k++ {
			s += row[k] * z[k]
		}
		z[i] = s
	}
}

// quantileDrawer draws a Dist that is not one of this package's by
// inversion.
type quantileDrawer struct{ d Dist }

func (q quantileDrawer) draw(r *randRand) float64 { return q.d.Quantile(uniformOpen(r)) }

// drawX stores in x a random point of the model drawn from r; z is a
// scratch slice of Dim values. Independent variables are drawn by their
// fastest exact method, correlated ones through the copula.
func (t *Transform) drawX(x, z []float64, r *randRand) {
	if t.chol == nil {
		for i, d := range t.draws {
			x[i] = d.draw(r)
		}
		return
	}
	for i, d := range t.draws {
		if t.corr[i] {
			z[i] = r.NormFloat64()
		} else {
			x[i] = d.draw(r)
		}
	}
	t.correlate(z)
	for i, v := range t.vars {
		if t.corr[i] {
			x[i] = v.Dist.FromStdNormal(z[i])
		}
	}
}

// fromUniform stores in x the point whose independent uniform coordinates
// (before the copula) are p, all in (0, 1); z is scratch. Variable skip
// (an uncorrelated one, or -1 for none) is left as it is.
func (t *Transform) fromUniform(x, p, z []float64, skip int) {
	if t.chol == nil {
		for i, v := range t.vars {
			if i != skip {
				x[i] = v.Dist.Quantile(p[i])
			}
		}
		return
	}
	for i, v := range t.vars {
		if i == skip {
			continue
		}
		if t.corr[i] {
			z[i] = stdQuantile(p[i])
		} else {
			x[i] = v.Dist.Quantile(p[i])
		}
	}
	t.correlate(z)
	for i, v := range t.vars {
		if t.corr[i] {
			x[i] = v.Dist.FromStdNormal(z[i])
		}
	}
}
