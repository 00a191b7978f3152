package sim

import (
	"math"
	"math/rand/v2"
	"strings"
	"testing"
)

// mustDist returns d and panics on err (for test tables).
func mustDist(d Dist, err error) Dist {
	if err != nil {
		panic(err)
	}
	return d
}

func TestTransformRoundTrip(t *testing.T) {
	t.Parallel()
	m := &Model{
		Vars: []Variable{
			{Name: "a", Dist: mustDist(NewLognormal(300, 21))},
			{Name: "b", Dist: mustDist(NewGumbel(0.6e6, 0.15e6))},
			{Name: "c", Dist: mustDist(NewUniform(0.7, 1))},
			{Name: "d", Dist: mustDist(NewNormal(1.2e6, 1.2e5))},
		},
		Corr: []Correlation{{A: "a", B: "c", Rho: 0.4}, {A: "b", B: "c", Rho: -0.3}},
	}
	tr, err := NewTransform(m)
	if err != nil {
		t.Fatal(err)
	}
	u := []float64{0.3, -1.2, 2.5, -0.7}
	x := make([]float64, 4)
	back := make([]float64, 4)
	tr.ToX(x, u)
	tr.ToU(back, x)
	for i := range u {
		if math.Abs(back[i]-u[i]) > 1e-8 {
			t.Errorf("u[%d]: round trip gives %v, want %v", i, back[i], u[i])
		}
	}
}

// TestNatafReproducesCorrelation checks that a lognormal pair with
// rho = 0.5 shows that correlation in samples. For lognormals the Nataf
// coefficient has the closed form
// rho0 = ln(1 + rho v1 v2)/sqrt(ln(1+v1^2) ln(1+v2^2))
// (Liu and Der Kiureghian 1986, Probabilistic Engineering Mechanics 1(2)).
func TestNatafReproducesCorrelation(t *testing.T) {
	t.Parallel()
	v1, v2, rho := 0.3, 0.5, 0.5
	d1 := mustDist(NewLognormal(1, v1))
	d2 := mustDist(NewLognormal(10, 10*v2))
	m := &Model{Vars: []Variable{{Name: "x", Dist: d1}, {Name: "y", Dist: d2}},
		Corr: []Correlation{{A: "x", B: "y", Rho: rho}}}
	tr, err := NewTransform(m)
	if err != nil {
		t.Fatal(err)
	}
	want := math.Log1p(rho*v1*v2) / math.Sqrt(math.Log1p(v1*v1)*math.Log1p(v2*v2))
	if got := tr.NormalCorrelation(0, 1); math.Abs(got-want) > 1e-6 {
		t.Errorf("normal-space rho = %v, want %v", got, want)
	}
	r := rand.New(rand.NewPCG(1, 2))
	const n = 200000
	u, x := make([]float64, 2), make([]float64, 2)
	var sx, sy, sxx, syy, sxy float64
	for i := 0; i < n; i++ {
		u[0], u[1] = r.NormFloat64(), r.NormFloat64()
		tr.ToX(x, u)
		sx += x[0]
		sy += x[1]
		sxx += x[0] * x[0]
		syy += x[1] * x[1]
		sxy += x[0] * x[1]
	}
	mx, my := sx/n, sy/n
	got := (sxy/n - mx*my) / math.Sqrt((sxx/n-mx*mx)*(syy/n-my*my))
	// The sample correlation of skewed data has a standard error near
	// (1-rho^2)/sqrt(n) inflated by the tails; 0.01 is about 4 of them.
	if math.Abs(got-rho) > 0.01 {
		t.Errorf("sample correlation %v, want %v", got, rho)
	}
}

func TestTransformErrors(t *testing.T) {
	t.Parallel()
	n := mustDist(NewNormal(0, 1))
	ln := mustDist(NewLognormal(1, 0.2))
	vars := []Variable{{Name: "a", Dist: n}, {Name: "b", Dist: n}, {Name: "c", Dist: ln}}
	for _, c := range []struct {
		corr []Correlation
		want string
	}{
		{[]Correlation{{A: "a", B: "zz", Rho: 0.1}}, `"zz"`},
		{[]Correlation{{A: "a", B: "b", Rho: 1.2}}, "(-1, 1)"},
		{[]Correlation{{A: "a", B: "b", Rho: 0.9}, {A: "a", B: "c", Rho: 0.9}, {A: "b", B: "c", Rho: -0.9}}, "not positive definite"},
		{[]Correlation{{A: "a", B: "b", Rho: 0.1}, {A: "b", B: "a", Rho: 0.1}}, "twice"},
	} {
		_, err := NewTransform(&Model{Vars: vars, Corr: c.corr})
		if err == nil || !strings.Contains(err.Error(), c.want) {
			t.Errorf("corr %v: error %v, want one containing %s", c.corr, err, c.want)
		}
	}
}

// TestTransformNoAlloc checks that the per-sample paths do not allocate.
func TestTransformNoAlloc(t *testing.T) {
	m := columnModel(1.2e6)
	m.Corr = []Correlation{{A: "E", B: "fy", Rho: 0.3}, {A: "D", B: "Q", Rho: 0.2}}
	tr, err := NewTransform(m)
	if err != nil {
		t.Fatal(err)
	}
	n := tr.Dim()
	x, u, z, p := make([]float64, n), make([]float64, n), make([]float64, n), make([]float64, n)
	for i := range p {
		p[i] = 0.3 + 0.05*float64(i)
		u[i] = 0.5 - 0.2*float64(i)
	}
	g := newBlockRNG()
	g.seed(1, 1, 1)
	for name, f := range map[string]func(){
		"ToX":         func() { tr.ToX(x, u) },
		"ToU":         func() { tr.ToU(u, x) },
		"drawX":       func() { tr.drawX(x, z, g.r) },
		"fromUniform": func() { tr.fromUniform(x, p, z, -1) },
		"G":           func() { m.G(x, z[:2]) },
		"conditional": func() { conditionalProb(m.Vars[5].Dist, 1e6, 1) },
	} {
		if a := testing.AllocsPerRun(100, f); a != 0 {
			t.Errorf("%s allocates %v times per call", name, a)
		}
	}
}
