package sim

import (
	"math"
	"testing"
)

// TestFORMScreen: screening the restarts keeps the design points of a
// system with four failure regions (the four-branch benchmark: four points
// at beta = 3, Echard et al. 2011) and, on a limit state with one region,
// finds the same point with fewer evaluations.
func TestFORMScreen(t *testing.T) {
	r := mustDist(NewLognormal(300, 30))
	s := mustDist(NewGumbel(150, 30))
	one := &Model{Vars: []Variable{{Name: "r", Dist: r}, {Name: "s", Dist: s}, {Name: "e", Dist: mustDist(NewNormal(1, 0.05))}},
		G: func(x, _ []float64) float64 { return x[0]*x[2] - x[1] }}
	// Two regions at beta 3 and 4 on either side of the median.
	two := &Model{Vars: []Variable{{Name: "a", Dist: mustDist(NewNormal(0, 1))}, {Name: "b", Dist: mustDist(NewNormal(0, 1))}},
		G: func(x, _ []float64) float64 { return min(3-x[0], 4+x[0]) + 0*x[1] }}
	for _, c := range []struct {
		name   string
		m      *Model
		points int
	}{{"four-branch", fourBranch(6), 4}, {"one region", one, 1}, {"two regions", two, 2}} {
		full, err := FORM(c.m, nil)
		if err != nil {
			t.Fatal(err)
		}
		scr, err := FORM(c.m, &FORMSettings{Screen: true})
		if err != nil {
			t.Fatal(err)
		}
		t.Logf("%s: %d points in %d evaluations, screened %d in %d (%s)", c.name, len(full.Points), full.Evaluations, len(scr.Points), scr.Evaluations, scr.Status)
		if len(scr.Points) != c.points || len(full.Points) != c.points {
			t.Errorf("%s: %d points screened, %d not, want %d", c.name, len(scr.Points), len(full.Points), c.points)
		}
		if math.Abs(scr.Beta-full.Beta) > 1e-6 {
			t.Errorf("%s: beta %.6f screened, %.6f not", c.name, scr.Beta, full.Beta)
		}
		if c.points == 1 && !(scr.Evaluations < full.Evaluations) {
			t.Errorf("%s: screening spent %d evaluations, the full search %d", c.name, scr.Evaluations, full.Evaluations)
		}
	}
}

// TestFORMWorkers: FORM gives the same points, beta and count of
// evaluations whether its gradients run on one goroutine or several, also
// when the limit state is NaN in part of the space.
func TestFORMWorkers(t *testing.T) {
	nanAbove := fourBranch(6)
	g := nanAbove.G
	nanAbove.G = func(x, out []float64) float64 {
		if x[0] > 2.5 {
			return math.NaN()
		}
		return g(x, out)
	}
	for _, m := range []*Model{fourBranch(6), nanAbove} {
		one, err1 := FORM(m, &FORMSettings{Screen: true})
		par, err2 := FORM(m, &FORMSettings{Screen: true, Workers: 3})
		if (err1 == nil) != (err2 == nil) || one.Evaluations != par.Evaluations || one.Beta != par.Beta || len(one.Points) != len(par.Points) || one.Status != par.Status {
			t.Fatalf("1 worker: beta %v, %d evaluations, %s; 3 workers: beta %v, %d evaluations, %s", one.Beta, one.Evaluations, one.Status, par.Beta, par.Evaluations, par.Status)
		}
		for i := range one.Points {
			for j, v := range one.Points[i].U {
				if par.Points[i].U[j] != v {
					t.Errorf("point %d differs: %v and %v", i, one.Points[i].U, par.Points[i].U)
				}
			}
		}
	}
}
