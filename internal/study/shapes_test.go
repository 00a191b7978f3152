package study

import (
	"testing"

	"strutrisk/internal/column"
)

// TestShapeTable checks the one table of shapes against the column
// package and the dimension table: every shape has its name there and
// parses back, every key a shape takes is a dimension, every dimension
// is taken by some shape and sets its own field of column.Section.
func TestShapeTable(t *testing.T) {
	taken := map[string]bool{}
	for s, d := range shapeDims {
		shape := column.Shape(s)
		if got, err := column.ParseShape(shape.String()); err != nil || got != shape {
			t.Errorf("shape %d: ParseShape(%q) = %v, %v", s, shape, got, err)
		}
		if len(d.required) == 0 {
			t.Errorf("shape %s takes no dimension", shape)
		}
		for _, k := range append(append([]string{}, d.required...), d.optional...) {
			if dimIndex(k) < 0 {
				t.Errorf("shape %s takes %s, which is no dimension of sectionDims", shape, k)
			}
			taken[k] = true
		}
	}
	fields := map[*float64]string{}
	var sec column.Section
	for _, d := range sectionDims {
		k := d.info.Name
		if !taken[k] {
			t.Errorf("dimension %s is taken by no shape", k)
		}
		if !registered("member.section", k) {
			t.Errorf("dimension %s is not in the key table", k)
		}
		f := sec.Field(d.dim)
		if f == nil {
			t.Errorf("dimension %s sets no field", k)
		}
		if other, ok := fields[f]; ok {
			t.Errorf("dimensions %s and %s set the same field", other, k)
		}
		fields[f] = k
	}
	if got := choicesOf("member.section", "shape"); len(got) != len(shapeDims) {
		t.Errorf("shape choices %v, table of %d shapes", got, len(shapeDims))
	}
}

// TestSectionFromTable checks that a study's section reaches the column
// section through the table: an I section of the dimensions written has
// the area of its plates and fillets, A = 2 b tf + (h - 2 tf) tw +
// (4 - pi) r^2 (the closed form of an I with four root fillets, common
// practice), here 200x200x15x9 with r = 18.
func TestSectionFromTable(t *testing.T) {
	text := `[member]
length = 3000
ends = "pinned-pinned"
[member.section]
shape = "i"
depth = 200
width = 200
flange = 15
web = 9
root = 18
[material]
modulus = 205000
yield = 355
[imperfection]
bow = "L/1000"
[loads]
dead = 300000
`
	st := parse(t, text)
	if st.Section.Shape != column.ShapeI || st.Section.Name != "I" {
		t.Fatalf("shape %v named %q, want I", st.Section.Shape, st.Section.Name)
	}
	md, err := Build(st)
	if err != nil {
		t.Fatal(err)
	}
	want := 2*200*15 + (200-2*15)*9 + (4-3.141592653589793)*18*18
	if !near(md.gross.A, want, 1e-9) {
		t.Errorf("A = %.6g mm2, want %.6g", md.gross.A, want)
	}
}
