package column

// Symmetric banded matrices of half-bandwidth 3 (two degrees of freedom per
// node of a beam): a[4*i+d] holds A[i][i-d], d = 0..3. bcFactor overwrites
// it with the LDL^T factors (a[4*i] = D[i], a[4*i+d] = L[i][i-d]) without
// pivoting, which is the plain Gaussian elimination of a symmetric band
// (e.g. Golub & Van Loan, Matrix Computations, §4.3). The number of
// negative pivots is the number of negative eigenvalues (Sylvester's law
// of inertia), which the elastic model uses to tell that a load exceeds
// the critical load.

const bcBand = 4

// bcFactor factorises the band matrix a of order n in place and returns
// the number of negative pivots; ok is false if a pivot is zero.
func bcFactor(a []float64, n int) (neg int, ok bool) {
	for i := 0; i < n && i < 3; i++ {
		ri := a[bcBand*i : bcBand*i+bcBand]
		for k := 0; k < i; k++ {
			s := ri[i-k]
			rk := a[bcBand*k : bcBand*k+bcBand]
			for m := 0; m < k; m++ {
				s -= ri[i-m] * a[bcBand*m] * rk[k-m]
			}
			ri[i-k] = s / rk[0]
		}
		s := ri[0]
		for m := 0; m < i; m++ {
			l := ri[i-m]
			s -= l * l * a[bcBand*m]
		}
		if s == 0 || s != s {
			return neg, false
		}
		if s < 0 {
			neg++
		}
		ri[0] = s
	}
	// Rows with a full band, unrolled: L[i][i-3], L[i][i-2], L[i][i-1], D[i].
	for i := 3; i < n; i++ {
		r3 := a[bcBand*(i-3) : bcBand*(i-3)+bcBand]
		r2 := a[bcBand*(i-2) : bcBand*(i-2)+bcBand]
		r1 := a[bcBand*(i-1) : bcBand*(i-1)+bcBand]
		ri := a[bcBand*i : bcBand*i+bcBand]
		d3, d2, d1 := r3[0], r2[0], r1[0]
		l3 := ri[3] / d3
		l2 := (ri[2] - l3*d3*r2[1]) / d2
		l1 := (ri[1] - l3*d3*r1[2] - l2*d2*r1[1]) / d1
		s := ri[0] - l3*l3*d3 - l2*l2*d2 - l1*l1*d1
		ri[3], ri[2], ri[1] = l3, l2, l1
		if s == 0 || s != s {
			return neg, false
		}
		if s < 0 {
			neg++
		}
		ri[0] = s
	}
	return neg, true
}

// bcSolve solves (L D L^T) x = b in place of b with the factors of bcFactor.
func bcSolve(a []float64, n int, b []float64) {
	for i := 0; i < n; i++ {
		s := b[i]
		m0 := i - 3
		if m0 < 0 {
			m0 = 0
		}
		for m := m0; m < i; m++ {
			s -= a[bcBand*i+i-m] * b[m]
		}
		b[i] = s
	}
	for i := 0; i < n; i++ {
		b[i] /= a[bcBand*i]
	}
	for i := n - 1; i >= 0; i-- {
		s := b[i]
		for j := i + 1; j <= i+3 && j < n; j++ {
			s -= a[bcBand*j+j-i] * b[j]
		}
		b[i] = s
	}
}

// bcAdd4 adds the symmetric 4x4 element matrix s*e (row-major) at the
// degrees of freedom d0..d0+3 of the band a.
func bcAdd4(a []float64, d0 int, e *[16]float64, s float64) {
	for r := 0; r < 4; r++ {
		row := a[bcBand*(d0+r):]
		for c := 0; c <= r; c++ {
			row[r-c] += s * e[4*r+c]
		}
	}
}

// bcConstrain makes degree of freedom c of the band a of order n an
// identity row and column (a prescribed zero).
func bcConstrain(a []float64, n, c int) {
	for d := 0; d < bcBand; d++ {
		a[bcBand*c+d] = 0
		if c+d < n && d > 0 {
			a[bcBand*(c+d)+d] = 0
		}
	}
	a[bcBand*c] = 1
}
