package sim_test

import (
	"fmt"
	"math"

	"strutrisk/sim"
)

// Rank correlation sees through any increasing transformation.
func ExampleSpearman() {
	x := []float64{1, 2, 3, 4, 5, 6}
	y := make([]float64, len(x))
	for i, v := range x {
		y[i] = math.Exp(v) // increasing, far from linear
	}
	fmt.Printf("Spearman %.3f\n", sim.Spearman(x, y))
	// Output:
	// Spearman 1.000
}
