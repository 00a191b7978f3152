package sim_test

import (
	"fmt"
	"log"

	"strutrisk/sim"
)

// A steel tie: resistance fy*A (N) against a tension T (N). Each input is
// swung between its 5% and 95% fractiles with the others at their medians.
func ExampleTornado() {
	fy, err := sim.NewNormal(300, 21) // MPa
	if err != nil {
		log.Fatal(err)
	}
	area, err := sim.NewNormal(1000, 30) // mm2
	if err != nil {
		log.Fatal(err)
	}
	tension, err := sim.NewNormal(150e3, 30e3) // N
	if err != nil {
		log.Fatal(err)
	}
	m := &sim.Model{
		Vars: []sim.Variable{{Name: "fy", Dist: fy}, {Name: "area", Dist: area}, {Name: "tension", Dist: tension}},
		G:    func(x, _ []float64) float64 { return x[0]*x[1] - x[2] },
	}
	base, rows, err := sim.Tornado(m, &sim.TornadoSettings{Output: -1})
	if err != nil {
		log.Fatal(err)
	}
	fmt.Printf("margin at medians: %.0f kN\n", base/1e3)
	for _, r := range rows {
		fmt.Printf("%-8s %6.0f to %6.0f: margin %4.0f to %4.0f kN\n", r.Variable, r.LowValue, r.HighValue, r.Low/1e3, r.High/1e3)
	}
	// Output:
	// margin at medians: 150 kN
	// tension  100654 to 199346: margin  199 to  101 kN
	// fy          265 to    335: margin  115 to  185 kN
	// area        951 to   1049: margin  135 to  165 kN
}
