package sim_test

import (
	"fmt"
	"log"
	"math"

	"strutrisk/sim"
)

// A tie of area 2000 mm2 with a lognormal yield strength carries a normal
// dead load and a Gumbel imposed load; it fails when the load exceeds
// fy*A.
func ExampleFORM() {
	fy, err := sim.NewLognormal(355, 25) // MPa
	if err != nil {
		log.Fatal(err)
	}
	dead, err := sim.NewNormal(300e3, 30e3) // N
	if err != nil {
		log.Fatal(err)
	}
	imposed, err := sim.NewGumbel(150e3, 45e3) // N
	if err != nil {
		log.Fatal(err)
	}
	const area = 2000.0 // mm2
	m := &sim.Model{
		Vars: []sim.Variable{
			{Name: "fy", Dist: fy, Unit: "MPa"},
			{Name: "dead", Dist: dead, Unit: "N"},
			{Name: "imposed", Dist: imposed, Unit: "N"},
		},
		G: func(x, _ []float64) float64 { return x[0]*area - x[1] - x[2] },
	}
	r, err := sim.FORM(m, nil)
	if err != nil {
		log.Fatal(err)
	}
	fmt.Printf("converged: %v, design points: %d\n", r.Converged, len(r.Points))
	fmt.Printf("beta = %.2f, pf = %.1e\n", r.Beta, r.Pf)
	p := r.Points[0]
	fmt.Printf("design point: fy %.0f MPa, dead %.0f kN, imposed %.0f kN\n", p.X[0], p.X[1]/1e3, p.X[2]/1e3)
	fmt.Printf("importance:   fy %.2f, dead %.2f, imposed %.2f\n", p.Importance[0], p.Importance[1], p.Importance[2])
	// Output:
	// converged: true, design points: 1
	// beta = 3.05, pf = 1.2e-03
	// design point: fy 326 MPa, dead 323 kN, imposed 329 kN
	// importance:   fy 0.15, dead 0.06, imposed 0.79
}

// A load effect amplified by an imperfection e that is as likely to either
// side: failure happens at two mirrored design points, and FORM combines
// them as a series system (one point alone would give about half the
// probability).
func ExampleFORM_twoDesignPoints() {
	r, _ := sim.NewNormal(300, 30)
	s, _ := sim.NewNormal(150, 15)
	e, _ := sim.NewNormal(0, 0.3)
	m := &sim.Model{
		Vars: []sim.Variable{{Name: "R", Dist: r}, {Name: "S", Dist: s}, {Name: "e", Dist: e}},
		G: func(x, _ []float64) float64 {
			bow := x[2]
			if bow < 0 {
				bow = -bow
			}
			return x[0] - x[1]*(1+bow)
		},
	}
	res, err := sim.FORM(m, nil)
	if err != nil {
		log.Fatal(err)
	}
	p, q := res.Points[0], res.Points[1]
	if math.Abs(p.X[2]+q.X[2]) < 1e-3 {
		fmt.Printf("design points: beta %.3f and %.3f, mirrored at e = ±%.3f\n", p.Beta, q.Beta, math.Abs(p.X[2]))
	}
	fmt.Printf("one point: pf = %.2e\n", sim.PfFromBeta(res.Points[0].Beta))
	fmt.Printf("system:    pf = %.2e, beta = %.3f\n", res.Pf, res.Beta)
	// Output:
	// design points: beta 2.538 and 2.538, mirrored at e = ±0.601
	// one point: pf = 5.58e-03
	// system:    pf = 1.12e-02, beta = 2.285
}
