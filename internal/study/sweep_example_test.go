package study_test

import (
	"fmt"
	"log"

	"strutrisk/internal/study"
)

// A sweep over the bow with a variant on the buckling curve: each case is
// the study read again with its keys set.
func ExampleStudy_Derive() {
	src := []byte(`
[member]
length = "2 m"
ends = "pinned-pinned"
[member.section]
shape = "rect"
depth = "100 mm"
width = "50 mm"
[material]
modulus = "200 GPa"
yield = { dist = "lognormal", mean = "250 MPa", cov = 0.07 }
[imperfection]
bow = "L/1000"
[loads]
dead = "150 kN"
[sweep]
parameter = "imperfection.bow"
from = "L/1000"
to = "L/250"
steps = 3
[[variant]]
name = "curve c"
set = { "capacity.model" = "curve", "capacity.curve" = "c", "imperfection.bow" = "unset" }
`)
	st, err := study.Parse("bar.toml", src)
	if err != nil {
		log.Fatal(err)
	}
	fmt.Println(st.Sweep.Label())
	for i, q := range st.Sweep.Values {
		c, err := st.Derive(-1, i)
		if err != nil {
			log.Fatal(err)
		}
		fmt.Printf("bow %.5f L = %.2f mm\n", q.Value, c.Bow.Value)
	}
	c, err := st.Derive(0, -1)
	if err != nil {
		log.Fatal(err)
	}
	fmt.Printf("%s: model %s, alpha %.2f\n", st.Variants[0].Name, c.Model, c.Alpha[1].Value)
	// Output:
	// imperfection.bow (fraction of L)
	// bow 0.00100 L = 2.00 mm
	// bow 0.00250 L = 5.00 mm
	// bow 0.00400 L = 8.00 mm
	// curve c: model curve, alpha 0.49
}
