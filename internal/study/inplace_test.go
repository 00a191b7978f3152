package study

import (
	"math"
	"strings"
	"testing"

	"strutrisk/internal/column"
)

// TestBothAxesInPlace: with imperfections that differ by axis (Lcr/n,
// sway, the equivalent bow), the capacity about both axes is the smallest
// of the capacity about each axis alone and of the modes that twist the
// section (column.Twisting on the member with their imperfections), and
// the member returned carries the imperfections of the mode that governs.
// An unequal angle (its shear centre off both principal axes) and
// an I section are evaluated at points around the medians.
func TestBothAxesInPlace(t *testing.T) {
	sections := []string{
		"shape = \"angle\"\ndepth = 120\nwidth = 80\nthickness = 12\nroot = 11",
		"shape = \"I\"\ndepth = 300\nwidth = 150\nflange = 10.7\nweb = 7.1\nroot = 15",
	}
	imps := []string{
		"bow = \"Lcr/1000\"\neccentricity = \"Lcr/500\"",
		"bow = \"Lcr/700\"\nsway = \"1/200\"",
		"bow = \"L/1000\"\nsway = \"1/300\"",
	}
	for _, sec := range sections {
		for _, imp := range imps {
			text := strings.NewReplacer("shape = \"CHS\"\ndiameter = 168.3\nthickness = 8", sec,
				`ends = "pinned-pinned"`, `ends = "fixed-free"`,
				`bow = "L/1000"`, imp,
				"yield = 355", `yield = { dist = "lognormal", mean = 355, cov = 0.07 }`,
				"length = 3000", `length = { dist = "normal", mean = 3000, sd = 100 }`).Replace(base)
			for _, extra := range []string{"", "[capacity]\nimperfection = \"equivalent\"\n"} {
				md, err := Build(parse(t, text+extra))
				if err != nil {
					t.Fatal(err)
				}
				if !md.perAxis {
					t.Fatalf("%s, %s: imperfections not per axis", sec, imp)
				}
				x := medians(md)
				for k := range 5 {
					for i := range x {
						x[i] = md.Sim.Vars[i].Dist.Quantile(0.1 + 0.2*float64((k+i)%5))
					}
					checkBoth(t, md, x, sec+", "+imp+" "+extra)
				}
			}
		}
	}
}

func checkBoth(t *testing.T, md *Model, x []float64, what string) {
	t.Helper()
	v := md.base
	md.feeds.fill(&v, x)
	res, m, err := md.capacity(&v, column.Both)
	if err != nil {
		t.Fatalf("%s: %v", what, err)
	}
	want := math.Inf(1)
	var wantBow float64
	for _, a := range []column.Axis{column.Major, column.Minor} {
		ra, ma, err := md.capacity(&v, a)
		if err != nil {
			t.Fatalf("%s, axis %v: %v", what, a, err)
		}
		if ra.N <= want {
			want, wantBow = ra.N, ma.Bow
		}
	}
	base, _, err := md.member(&v)
	if err != nil {
		t.Fatal(err)
	}
	if base.Props.It != 0 {
		mt := md.twistMember(base, &v)
		rt, err := column.Twisting(&mt, column.GovernsFirstYield)
		if err != nil {
			t.Fatalf("%s, twisting: %v", what, err)
		}
		if rt.N <= want {
			want, wantBow = rt.N, mt.Bow
		}
	}
	if res.N != want || m.Bow != wantBow {
		t.Errorf("%s: both axes %.9g N (bow %.6g mm, %v), the least of the modes %.9g N (bow %.6g mm)", what, res.N, m.Bow, res.Mode, want, wantBow)
	}
}
