package sim

import (
	"math/bits"
	"testing"
)

// TestSobolPolynomials checks the direction-number table: each polynomial
// must be primitive over GF(2) (x has order 2^s - 1 modulo it) and each
// initial m_k odd and below 2^k (Bratley and Fox 1988).
func TestSobolPolynomials(t *testing.T) {
	t.Parallel()
	seen := map[[2]uint32]bool{}
	for j, p := range sobolPoly {
		poly := uint32(1)<<p.s | p.a<<1 | 1
		if seen[[2]uint32{uint32(p.s), poly}] {
			t.Errorf("dimension %d repeats a polynomial", j+2)
		}
		seen[[2]uint32{uint32(p.s), poly}] = true
		if !primitive(poly, p.s) {
			t.Errorf("dimension %d: polynomial %b is not primitive", j+2, poly)
		}
		for k, m := range p.m {
			if m%2 == 0 || m >= 1<<(k+1) {
				t.Errorf("dimension %d: m_%d = %d invalid", j+2, k+1, m)
			}
		}
	}
}

// primitive reports whether poly of degree s is primitive over GF(2).
func primitive(poly uint32, s int) bool {
	order := uint64(1)<<s - 1
	mulmod := func(a, b uint32) uint32 {
		r := uint32(0)
		for b != 0 {
			if b&1 == 1 {
				r ^= a
			}
			b >>= 1
			a <<= 1
			if a&(1<<s) != 0 {
				a ^= poly
			}
		}
		return r
	}
	pow := func(e uint64) uint32 {
		r, x := uint32(1), uint32(2)
		if s == 1 {
			x = 2 ^ poly
		}
		for ; e > 0; e >>= 1 {
			if e&1 == 1 {
				r = mulmod(r, x)
			}
			x = mulmod(x, x)
		}
		return r
	}
	if pow(order) != 1 {
		return false
	}
	for q := uint64(2); q <= order; q++ {
		if order%q == 0 && isPrime(q) && pow(order/q) == 1 {
			return false
		}
	}
	return true
}

func isPrime(q uint64) bool {
	for d := uint64(2); d*d <= q; d++ {
		if q%d == 0 {
			return false
		}
	}
	return q > 1
}

// TestSobolStratification checks the (0, m, 1)-net property of every
// scrambled dimension: the first 2^m points fall one in each interval
// [k/2^m, (k+1)/2^m); and of pairs of dimensions at coarse resolution,
// each of the 2^m boxes of side 2^-(m/2) holds exactly one point for
// m = 2 (t = 0 holds for the first two dimensions).
func TestSobolStratification(t *testing.T) {
	t.Parallel()
	const m = 10
	dirs := sobolDirections(sobolMaxDim)
	for j := range dirs {
		for _, seed := range []uint32{0, 12345, 0xdeadbeef} {
			var hit [1 << m]bool
			for i := uint32(0); i < 1<<m; i++ {
				x := owenScramble(sobolAt(&dirs[j], i), seed)
				k := x >> (32 - m)
				if hit[k] {
					t.Fatalf("dimension %d seed %d: interval %d hit twice", j+1, seed, k)
				}
				hit[k] = true
			}
		}
	}
	// Dimensions 1 and 2 form a (0, m, 2)-net: 2^m points, one per
	// elementary box of 2^a x 2^(m-a) strata.
	for a := 0; a <= m; a++ {
		seen := map[[2]uint32]bool{}
		for i := uint32(0); i < 1<<m; i++ {
			x := owenScramble(sobolAt(&dirs[0], i), 7) >> (32 - a)
			y := owenScramble(sobolAt(&dirs[1], i), 99) >> (32 - (m - a))
			if a == 0 {
				x = 0
			}
			if a == m {
				y = 0
			}
			if seen[[2]uint32{x, y}] {
				t.Fatalf("boxes 2^%d x 2^%d: box (%d, %d) hit twice", a, m-a, x, y)
			}
			seen[[2]uint32{x, y}] = true
		}
	}
	_ = bits.Len
}
