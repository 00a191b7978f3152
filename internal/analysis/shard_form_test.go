package analysis

import (
	"encoding/json"
	"math"
	"reflect"
	"testing"

	"strutrisk/sim"
)

// TestFORMNoteExact checks that a FORM result noted by a shard reads back
// equal, infinities and NaN included, and that the note covers every
// field of sim.FORMResult and sim.DesignPoint (a field added there must
// be added to the note, or the merge would lose it).
func TestFORMNoteExact(t *testing.T) {
	if n := reflect.TypeFor[sim.FORMResult]().NumField(); n != 6 {
		t.Errorf("sim.FORMResult has %d fields, formNote knows 6", n)
	}
	if n := reflect.TypeFor[sim.DesignPoint]().NumField(); n != 5 {
		t.Errorf("sim.DesignPoint has %d fields, pointNote knows 5", n)
	}
	f := &sim.FORMResult{Beta: 0.1 + 0.2, Pf: math.Nextafter(1e-300, 0), Evaluations: 31, Converged: true, Status: "converged",
		Points: []sim.DesignPoint{{Beta: math.Inf(1), U: []float64{-1.0 / 3, math.NaN()}, X: []float64{2, 3}, Alpha: []float64{0.6, 0.8}, Importance: []float64{0.36, 0.64}}}}
	data, err := json.Marshal(noteOfFORM(f, nil))
	if err != nil {
		t.Fatal(err)
	}
	var n formNote
	if err := json.Unmarshal(data, &n); err != nil {
		t.Fatal(err)
	}
	g, err := n.result()
	if err != nil {
		t.Fatal(err)
	}
	if !sameBits(f, g) {
		t.Errorf("read back %+v, noted %+v", g, f)
	}
}

// sameBits compares FORM results field by field, floats by their bits.
func sameBits(a, b *sim.FORMResult) bool {
	eq := func(x, y float64) bool { return math.Float64bits(x) == math.Float64bits(y) }
	all := func(x, y []float64) bool {
		if len(x) != len(y) {
			return false
		}
		for i := range x {
			if !eq(x[i], y[i]) {
				return false
			}
		}
		return true
	}
	if !eq(a.Beta, b.Beta) || !eq(a.Pf, b.Pf) || a.Evaluations != b.Evaluations || a.Converged != b.Converged || a.Status != b.Status || len(a.Points) != len(b.Points) {
		return false
	}
	for i, p := range a.Points {
		q := b.Points[i]
		if !eq(p.Beta, q.Beta) || !all(p.U, q.U) || !all(p.X, q.X) || !all(p.Alpha, q.Alpha) || !all(p.Importance, q.Importance) {
			return false
		}
	}
	return true
}
