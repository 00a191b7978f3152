package study

import (
	"math"
	"strings"
	"testing"

	"strutrisk/internal/column"
)

// classStudy is base with the section replaced and a random yield.
func classStudy(t *testing.T, section string) *Model {
	t.Helper()
	text := strings.Replace(base, "shape = \"CHS\"\ndiameter = 168.3\nthickness = 8", section, 1)
	text = strings.Replace(text, "yield = 355", `yield = { dist = "lognormal", mean = 235, cov = 0.1 }`, 1)
	md, err := Build(parse(t, text))
	if err != nil {
		t.Fatal(err)
	}
	return md
}

// TestFlatClassRange: the yield up to which a fixed I section keeps its
// gross properties is where its slenderest part reaches the class 3 limit
// of EN 1993-1-1:2005 Table 5.2, c/t = 42 eps for an internal part (the
// web, c = h - 2 tf - 2 r) and 14 eps for an outstand (the flange,
// c = (b - tw - 2 r)/2), eps = sqrt(235/fy): fy = 235 (42 t/c)^2.
func TestFlatClassRange(t *testing.T) {
	tests := []struct {
		name, section string
		want          float64
	}{
		// Web c/t = 384/10 = 38.4: fy = 235 (42/38.4)^2 = 281.1 MPa;
		// flange c/t = 95/12: 734 MPa.
		{"web governs", "shape = \"I\"\ndepth = 400\nwidth = 200\nflange = 8\nweb = 10", 235 * math.Pow(42*10/384.0, 2)},
		// Flange c/t = (300 - 10)/2/10 = 14.5: fy = 235 (14/14.5)^2 =
		// 219.1 MPa; web c/t = 280/10: 528.8 MPa.
		{"flange governs", "shape = \"I\"\ndepth = 300\nwidth = 300\nflange = 10\nweb = 10", 235 * math.Pow(14/14.5, 2)},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			md := classStudy(t, tt.section)
			if got := md.flat.fyMax; math.Abs(got-tt.want) > 1e-12*tt.want {
				t.Errorf("flat up to fy %.15g, want %.15g (Table 5.2 class 3 limit)", got, tt.want)
			}
		})
	}
}

// TestFlatClassProps: inside the flat range, at its edge and beyond it, a
// sample's properties are those that classifying the section gives, for
// every shape that is classified.
func TestFlatClassProps(t *testing.T) {
	sections := []string{
		"shape = \"I\"\ndepth = 400\nwidth = 200\nflange = 8\nweb = 10",
		"shape = \"I\"\ndepth = 300\nwidth = 300\nflange = 10\nweb = 10\nroot = 15",
		"shape = \"RHS\"\ndepth = 300\nwidth = 200\nthickness = 8",
		"shape = \"CHS\"\ndiameter = 400\nthickness = 6",
		"shape = \"angle\"\ndepth = 100\nwidth = 100\nthickness = 8",
		"shape = \"channel\"\ndepth = 300\nwidth = 100\nflange = 12\nweb = 8",
		"shape = \"tee\"\ndepth = 150\nwidth = 200\nflange = 14\nweb = 10",
	}
	for _, sec := range sections {
		md := classStudy(t, sec)
		if !md.propsDynamic {
			t.Fatalf("%s: properties not per sample", sec)
		}
		top := md.flat.fyMax
		if !(top > 0) {
			t.Errorf("%s: no flat range", sec)
			continue
		}
		fys := []float64{top, math.Nextafter(top, 0), math.Nextafter(top, math.Inf(1)), top * 1.5, top * 20, 1e-3, math.Inf(1), math.NaN(), -1, 0}
		for fy := 1.0; fy < 5000; fy *= 1.07 {
			fys = append(fys, fy)
		}
		for _, fy := range fys {
			var got column.Props
			err := md.propsInto(&md.sec, fy, &got)
			want, werr := md.sectionProps(&md.sec, fy)
			if got != want || (err == nil) != (werr == nil) {
				t.Errorf("%s at fy %g: props %+v (error %v), classifying gives %+v (error %v)", sec, fy, got, err, want, werr)
			}
		}
	}
}
