package column_test

import (
	"fmt"
	"math"

	"strutrisk/internal/column"
)

// A UC 254x254x73 in S275, 5 m between pins, with an initial bow of
// L/1000 and the load 10 mm off the centroid.
func ExampleFirstYield() {
	sec := column.Section{Shape: column.ShapeI, Depth: 254.1, Width: 254.6, Flange: 14.2, Web: 8.6, Root: 12.7}
	p, err := sec.Properties()
	if err != nil {
		fmt.Println(err)
		return
	}
	m := column.Member{Props: p, E: 210000, Fy: 275, Length: 5000, K: [2]float64{1, 1}, Bow: 5}
	res, _ := column.PerryRobertson(&m, column.Both)
	fmt.Printf("bow only:      %.0f kN (%s axis, %s)\n", res.N/1e3, res.Axis, res.Governs)
	m.Ecc = 10
	res, _ = column.FirstYield(&m, column.Both)
	fmt.Printf("bow and e:     %.0f kN (%s axis)\n", res.N/1e3, res.Axis)
	fmt.Printf("squash, Euler: %.0f kN, %.0f kN\n", p.A*m.Fy/1e3, column.Euler(&m, column.Minor)/1e3)
	// Output:
	// bow only:      1881 kN (minor axis, first-yield)
	// bow and e:     1384 kN (minor axis)
	// squash, Euler: 2560 kN, 3240 kN
}

// Effective length factors of a braced member from its end restraints.
func ExampleSpringK() {
	for _, r := range [][2]float64{{0, 0}, {1, 1}, {10, 0}, {math.Inf(1), 0}, {math.Inf(1), math.Inf(1)}} {
		k, _ := column.SpringK(r[0], r[1])
		fmt.Printf("R = %v, %v: K = %.4f\n", r[0], r[1], k)
	}
	// Alignment chart, sidesway inhibited, GA = GB = 2: R = 2/G.
	k, _ := column.SpringK(2.0/2, 2.0/2)
	fmt.Printf("G = 2, 2: K = %.4f\n", k)
	// Output:
	// R = 0, 0: K = 1.0000
	// R = 1, 1: K = 0.8553
	// R = 10, 0: K = 0.7602
	// R = +Inf, 0: K = 0.6992
	// R = +Inf, +Inf: K = 0.5000
	// G = 2, 2: K = 0.8553
}
