package sim

// Shardable reports whether method m can be split into shards: its plan
// of evaluations is fixed by the seed and the budget, not by its earlier
// results (monte-carlo, latin-hypercube, conditional-qmc).
func Shardable(m Method) bool {
	return m == MonteCarlo || m == LatinHypercube || m == ConditionalQMC
}
