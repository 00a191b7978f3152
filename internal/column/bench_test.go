package column

import "testing"

// benchMember is a UC 254x254x73 (SCI Blue Book dimensions) 5 m long with
// an L/1000 bow and a 10 mm eccentricity.
func benchMember(b testing.TB) Member {
	p, err := Section{Shape: ShapeI, Depth: 254.1, Width: 254.6, Flange: 14.2, Web: 8.6, Root: 12.7}.Properties()
	if err != nil {
		b.Fatal(err)
	}
	return Member{Props: p, E: 210000, Fy: 275, Length: 5000, K: [2]float64{1, 1},
		Bow: 5, Ecc: 10, Alpha: [2]float64{0.34, 0.49}}
}

var sink float64

func benchModel(b *testing.B, f func(*Member, Axis) (Result, error), ecc float64) {
	m := benchMember(b)
	m.Ecc = ecc
	b.ReportAllocs()
	for i := 0; b.Loop(); i++ {
		m.Length = 3000 + float64(i%64)*50 // vary the input a little
		res, err := f(&m, Both)
		if err != nil {
			b.Fatal(err)
		}
		sink += res.N
	}
}

func BenchmarkPerryRobertson(b *testing.B) { benchModel(b, PerryRobertson, 0) }

func BenchmarkSecant(b *testing.B) { benchModel(b, Secant, 10) }

func BenchmarkCurve(b *testing.B) { benchModel(b, Curve, 0) }

func BenchmarkSpringK(b *testing.B) {
	b.ReportAllocs()
	for i := 0; b.Loop(); i++ {
		k, err := SpringK(0.5+float64(i%32), 3)
		if err != nil {
			b.Fatal(err)
		}
		sink += k
	}
}

func BenchmarkProperties(b *testing.B) {
	s := Section{Shape: ShapeI, Depth: 254.1, Width: 254.6, Flange: 14.2, Web: 8.6, Root: 12.7}
	b.ReportAllocs()
	for i := 0; b.Loop(); i++ {
		s.ThicknessLoss = float64(i%8) * 0.25
		p, err := s.Properties()
		if err != nil {
			b.Fatal(err)
		}
		sink += p.A
	}
}

// The hot paths allocate nothing, on success and on invalid input.
func TestNoAllocs(t *testing.T) {
	m := benchMember(t)
	bad := m
	bad.Length = -1
	s := Section{Shape: ShapeRHS, Depth: 200, Width: 100, Thickness: 8, ThicknessLoss: 1}
	for _, tt := range []struct {
		name string
		f    func()
	}{
		{"FirstYield", func() { r, _ := FirstYield(&m, Both); sink += r.N }},
		{"Curve", func() { r, _ := Curve(&m, Both); sink += r.N }},
		{"FirstYield, bad input", func() { _, err := FirstYield(&bad, Both); sink += float64(len(err.Error())) }},
		{"SpringK", func() { k, _ := SpringK(2, 7); sink += k }},
		{"SpringK, bad input", func() { _, err := SpringK(-1, 0); sink += float64(len(err.Error())) }},
		{"Properties", func() { p, _ := s.Properties(); sink += p.A }},
		{"helpers", func() { sink += Euler(&m, Both) + RelativeSlenderness(&m, Both) }},
	} {
		if n := testing.AllocsPerRun(100, tt.f); n != 0 {
			t.Errorf("%s: %g allocations per call, want 0", tt.name, n)
		}
	}
}
