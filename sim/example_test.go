package sim_test

import (
	"context"
	"fmt"
	"log"

	"strutrisk/sim"
)

// A user's own limit state with three random inputs: a steel tie of
// section area A (mm2) and yield strength fy (MPa) under a tension T (N)
// fails when the resistance fy*A is below T.
func Example() {
	fy, err := sim.NewLognormal(300, 21) // MPa, cov 0.07
	if err != nil {
		log.Fatal(err)
	}
	area, err := sim.NewNormal(1000, 30) // mm2
	if err != nil {
		log.Fatal(err)
	}
	tension, err := sim.NewGumbel(150e3, 30e3) // N
	if err != nil {
		log.Fatal(err)
	}
	m := &sim.Model{
		Vars: []sim.Variable{
			{Name: "fy", Dist: fy, Unit: "MPa"},
			{Name: "area", Dist: area, Unit: "mm2"},
			{Name: "tension", Dist: tension, Unit: "N"},
		},
		G: func(x, out []float64) float64 { return x[0]*x[1] - x[2] },
	}
	res, err := sim.Run(context.Background(), m, &sim.Settings{Method: sim.MonteCarlo, Samples: 2_000_000, Seed: 1})
	if err != nil {
		log.Fatal(err)
	}
	fmt.Printf("pf = %.1e, beta = %.2f\n", res.Pf, res.Beta)
	fmt.Printf("95%% interval of beta: %.2f to %.2f\n", res.BetaCI[0], res.BetaCI[1])
	// Output:
	// pf = 1.4e-03, beta = 2.99
	// 95% interval of beta: 2.97 to 3.00
}
