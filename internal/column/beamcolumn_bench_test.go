package column

import "testing"

// benchBeamColumn evaluates a UC 254x254x73, 3 to 6 m long, bow L/1000
// and 10 mm eccentricity, about one axis, with 40 elements and 50 fibres.
func benchBeamColumn(b *testing.B, o *BeamOptions, axis Axis) {
	sec := Section{Shape: ShapeI, Depth: 254.1, Width: 254.6, Flange: 14.2, Web: 8.6, Root: 12.7}
	m := benchMember(b)
	o.Elements, o.Fibres = 40, 50
	b.ReportAllocs()
	for i := 0; b.Loop(); i++ {
		m.Length = 3000 + float64(i%64)*50 // vary the input a little
		m.Bow = m.Length / 1000
		res, err := BeamColumn(&m, sec, axis, o)
		if err != nil {
			b.Fatal(err)
		}
		sink += res.N
	}
}

func BenchmarkBeamColumnFirstYield(b *testing.B) {
	benchBeamColumn(b, &BeamOptions{Limit: FirstYieldLimit}, Minor)
}

func BenchmarkBeamColumnUltimate(b *testing.B) {
	benchBeamColumn(b, &BeamOptions{Limit: UltimateLimit, Residual: ResidualHotRolled}, Minor)
}

func BenchmarkBeamColumnUltimateSprings(b *testing.B) {
	o := &BeamOptions{Limit: UltimateLimit, Residual: ResidualHotRolled}
	o.Springs[Minor] = [2]float64{1e10, 3e9}
	benchBeamColumn(b, o, Minor)
}
