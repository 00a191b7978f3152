package sim

// SeriesPf returns the first-order failure probability of a series
// system of limit states with reliability indices beta and unit vectors
// alpha in one standard normal space (alpha[i] = -u*_i / beta_i, as in
// DesignPoint.Alpha): P(Z_1 > beta_1 or ... or Z_m > beta_m) for standard
// normals Z with correlation alpha_i · alpha_j (Ditlevsen and Madsen,
// Structural Reliability Methods, 1996, ch. 14, from memory). Two
// indices take an exact one-dimensional integral, three and four nested
// ones (to about 1e-8 of pf or better), more Genz's separation of
// variables.
func SeriesPf(beta []float64, alpha [][]float64) float64 {
	return formSeriesPf(beta, alpha)
}
