package sim

import "math/bits"

// sobolPoly lists a primitive polynomial of degree s over GF(2),
// x^s + a_1 x^(s-1) + ... + a_(s-1) x + 1 with a = a_1...a_(s-1) as bits,
// and the initial direction numbers m_1..m_s (odd, m_k < 2^k), for
// dimensions 2.. of the Sobol' sequence: the first entries of Joe and Kuo
// (2008), "Constructing Sobol sequences with better two-dimensional
// projections", SIAM J. Sci. Comput. 30(5), file new-joe-kuo-6.21201
// (from memory; TestSobolPolynomials checks that each polynomial is
// primitive and each m_k is valid, which is what the net property needs).
var sobolPoly = []struct {
	s int
	a uint32
	m []uint32
}{
	{1, 0, []uint32{1}},
	{2, 1, []uint32{1, 3}},
	{3, 1, []uint32{1, 3, 1}},
	{3, 2, []uint32{1, 1, 1}},
	{4, 1, []uint32{1, 1, 3, 3}},
	{4, 4, []uint32{1, 3, 5, 13}},
	{5, 2, []uint32{1, 1, 5, 5, 17}},
	{5, 4, []uint32{1, 1, 5, 5, 5}},
	{5, 7, []uint32{1, 1, 7, 11, 19}},
	{5, 11, []uint32{1, 1, 5, 1, 1}},
	{5, 13, []uint32{1, 1, 1, 3, 11}},
	{5, 14, []uint32{1, 3, 5, 5, 31}},
	{6, 1, []uint32{1, 3, 3, 9, 7, 49}},
	{6, 13, []uint32{1, 1, 1, 15, 21, 21}},
	{6, 16, []uint32{1, 3, 1, 13, 27, 49}},
	{6, 19, []uint32{1, 1, 1, 15, 7, 5}},
	{6, 22, []uint32{1, 3, 1, 15, 13, 25}},
	{6, 25, []uint32{1, 1, 5, 5, 19, 61}},
	{7, 1, []uint32{1, 3, 7, 11, 23, 15, 103}},
	{7, 4, []uint32{1, 3, 7, 13, 13, 15, 69}},
}

// sobolMaxDim is the number of Sobol' dimensions available; further
// dimensions are filled with pseudo-random numbers.
var sobolMaxDim = len(sobolPoly) + 1

// sobolDirections returns the 32 direction numbers of each of the first
// dim dimensions (Bratley and Fox 1988, ACM TOMS 14(1), algorithm 659).
func sobolDirections(dim int) [][32]uint32 {
	v := make([][32]uint32, dim)
	for k := 0; k < 32; k++ {
		if dim > 0 {
			v[0][k] = 1 << (31 - k) // van der Corput in base 2
		}
	}
	for j := 1; j < dim; j++ {
		p := sobolPoly[j-1]
		s := p.s
		for k := 0; k < 32; k++ {
			if k < s {
				v[j][k] = p.m[k] << (31 - k)
				continue
			}
			x := v[j][k-s] ^ (v[j][k-s] >> s)
			for i := 1; i < s; i++ {
				if (p.a>>(s-1-i))&1 == 1 {
					x ^= v[j][k-i]
				}
			}
			v[j][k] = x
		}
	}
	return v
}

// sobolAt returns the 32-bit coordinate of point index i (Gray-code order)
// of a dimension with direction numbers v.
func sobolAt(v *[32]uint32, i uint32) uint32 {
	g := i ^ (i >> 1)
	x := uint32(0)
	for g != 0 {
		k := bits.TrailingZeros32(g)
		x ^= v[k]
		g &= g - 1
	}
	return x
}

// owenScramble applies a hash-based nested uniform scramble to a 32-bit
// coordinate: each digit is permuted depending only on the digits before
// it, as in Owen's scrambling. The permutation is the one of Laine and
// Karras (2011) applied to the bit-reversed value, following Burley (2020),
// "Practical hash-based Owen scrambling", JCGT 9(4). With a uniformly random
// seed every scrambled point is uniform, so the estimator is unbiased.
func owenScramble(x, seed uint32) uint32 {
	x = bits.Reverse32(x)
	x += seed
	x ^= x * 0x6c50b47c
	x ^= x * 0xb82f1e52
	x ^= x * 0xc7afe638
	x ^= x * 0x8d22f6e6
	return bits.Reverse32(x)
}

// toUnit maps a 32-bit coordinate to the middle of its cell in (0, 1).
func toUnit(x uint32) float64 { return (float64(x) + 0.5) * (1.0 / (1 << 32)) }
