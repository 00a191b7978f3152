package sim_test

import (
	"context"
	"fmt"
	"log"
	"math"

	"strutrisk/sim"
)

// The Ishigami function (Ishigami & Homma, 1990) with a = 7, b = 0.1 has
// exact indices S = (0.314, 0.442, 0) and ST = (0.558, 0.442, 0.244).
func ExampleSobol() {
	u, err := sim.NewUniform(-math.Pi, math.Pi)
	if err != nil {
		log.Fatal(err)
	}
	m := &sim.Model{
		Vars:    []sim.Variable{{Name: "x1", Dist: u}, {Name: "x2", Dist: u}, {Name: "x3", Dist: u}},
		Outputs: []string{"f"},
		G: func(x, out []float64) float64 {
			s := math.Sin(x[1])
			out[0] = math.Sin(x[0]) + 7*s*s + 0.1*math.Pow(x[2], 4)*math.Sin(x[0])
			return out[0]
		},
	}
	idx, err := sim.Sobol(context.Background(), m, &sim.SobolSettings{Samples: 100000, Seed: 1, Output: 0})
	if err != nil {
		log.Fatal(err)
	}
	for _, ix := range idx {
		fmt.Printf("%s: first %.2f, total %.2f\n", ix.Variable, ix.First, ix.Total)
	}
	// Output:
	// x1: first 0.31, total 0.56
	// x2: first 0.44, total 0.44
	// x3: first 0.00, total 0.24
}
