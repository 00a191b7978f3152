package study_test

import (
	"fmt"
	"log"

	"strutrisk/internal/study"
)

// A pinned solid bar 100 x 50 mm, 2 m long, with a 2 mm bow: the
// Perry-Robertson first-yield load about the minor axis at nominal values.
func ExampleParse() {
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
bow = "2 mm"
[loads]
dead = "300 kN"
`)
	st, err := study.Parse("bar.toml", src)
	if err != nil {
		log.Fatal(err)
	}
	md, err := study.Build(st)
	if err != nil {
		log.Fatal(err)
	}
	n, err := md.Nominal()
	if err != nil {
		log.Fatal(err)
	}
	fmt.Printf("variables: %d (%s)\n", len(md.Sim.Vars), md.Sim.Vars[0].Name)
	fmt.Printf("capacity %.1f kN about the %s axis (%s)\n", n.Capacity/1e3, n.Axis, n.Governs)
	fmt.Printf("utilisation %.2f\n", n.Utilisation)
	// Output:
	// variables: 1 (material.yield)
	// capacity 445.7 kN about the minor axis (first-yield)
	// utilisation 0.67
}

// Problems are listed all at once, each with its line and key.
func ExampleError() {
	src := []byte(`[member]
length = "2 kN"
[material]
yeild = 250
`)
	_, err := study.Parse("bad.toml", src)
	if e, ok := err.(*study.Error); ok {
		for _, p := range e.Problems[:3] {
			fmt.Println(p)
		}
	}
	// Output:
	// bad.toml:2: member.length: "2 kN" is a force but this key takes a length (units mm cm m in ft)
	// bad.toml:1: member.section: missing table [member.section]: give shape and its dimensions, e.g. shape = "I", depth, width, flange, web
	// bad.toml:3: material.modulus: missing: the elastic modulus, e.g. modulus = "205 GPa"
}
