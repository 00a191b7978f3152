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

// A limit state that is linear in one input, g = h(x) - c*x[j], lets Run
// integrate that input exactly and draw the others by randomised
// quasi-Monte Carlo: here the same tie with the tension integrated.
func ExampleLinear() {
	fy, _ := sim.NewLognormal(300, 21)
	area, _ := sim.NewNormal(1000, 30)
	tension, _ := sim.NewGumbel(150e3, 30e3)
	m := &sim.Model{
		Vars: []sim.Variable{{Name: "fy", Dist: fy}, {Name: "area", Dist: area}, {Name: "tension", Dist: tension}},
		G:    func(x, out []float64) float64 { return x[0]*x[1] - x[2] },
		Linear: &sim.Linear{Index: 2, Split: func(x []float64) (h, c float64) {
			return x[0] * x[1], 1 // g = fy*area - 1*tension
		}},
	}
	res, err := sim.Run(context.Background(), m, &sim.Settings{Method: sim.ConditionalQMC, Samples: 65536, Seed: 1})
	if err != nil {
		log.Fatal(err)
	}
	fmt.Printf("pf = %.2e, beta = %.3f, %d evaluations, cov below 1%%: %v\n", res.Pf, res.Beta, res.Evaluations, res.PfCoV < 0.01)
	// Output:
	// pf = 1.44e-03, beta = 2.981, 65536 evaluations, cov below 1%: true
}
