package column_test

import (
	"fmt"

	"strutrisk/internal/column"
)

// A 4 m pinned IPE 300 in S235 bowed by L/1000 about its minor axis: the
// elastic first-yield load of the numerical model, the Perry-Robertson
// closed form it reproduces, and the ultimate load with spread of
// plasticity and hot-rolled residual stresses.
func ExampleBeamColumn() {
	sec := column.Section{Shape: column.ShapeI, Depth: 300, Width: 150, Flange: 10.7, Web: 7.1, Root: 15}
	p, err := sec.Properties()
	if err != nil {
		fmt.Println(err)
		return
	}
	m := &column.Member{Props: p, E: 210000, Fy: 235, Length: 4000, K: [2]float64{1, 1}, Bow: 4}

	fy, err := column.BeamColumn(m, sec, column.Minor, nil)
	if err != nil {
		fmt.Println(err)
		return
	}
	pr, err := column.PerryRobertson(m, column.Minor)
	if err != nil {
		fmt.Println(err)
		return
	}
	ult, err := column.BeamColumn(m, sec, column.Both, &column.BeamOptions{
		Limit:    column.UltimateLimit,
		Residual: column.ResidualHotRolled,
	})
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("first yield     %4.0f kN (Perry-Robertson %4.0f kN)\n", fy.N/1e3, pr.N/1e3)
	fmt.Printf("ultimate        %4.0f kN, %s axis\n", ult.N/1e3, ult.Axis)
	fmt.Printf("squash load     %4.0f kN\n", p.A*m.Fy/1e3)
	// Output:
	// first yield      596 kN (Perry-Robertson  596 kN)
	// ultimate         560 kN, minor axis
	// squash load     1265 kN
}
