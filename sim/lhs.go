package sim

// latinPermutations fills perm[j][:n] with independent random permutations
// of 0..n-1 (Fisher-Yates), one per dimension: sample i of a Latin
// hypercube of size n then falls in stratum perm[j][i] of dimension j
// (McKay, Beckman and Conover 1979, Technometrics 21(2)). Run stratifies
// each block of samples on its own.
func latinPermutations(perm [][]int32, n int, r *randRand) {
	for _, p := range perm {
		p = p[:n]
		for i := range p {
			p[i] = int32(i)
		}
		for i := n - 1; i > 0; i-- {
			k := r.IntN(i + 1)
			p[i], p[k] = p[k], p[i]
		}
	}
}
