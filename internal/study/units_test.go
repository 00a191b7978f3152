package study

import (
	"math"
	"strings"
	"testing"
)

// Exact unit factors. The inch, foot and pound-force are exact by
// definition: NIST Special Publication 811 (2008), Appendix B.8/B.9:
// 1 in = 0.0254 m, 1 ft = 0.3048 m, 1 lbf = 4.4482216152605 N,
// 1 kip = 4448.2216152605 N, 1 psi = 6894.757293168 Pa (Appendix B.9 gives
// 6.894757 E+03 Pa; the full value follows from the exact lbf and in),
// 1 ksi = 6.894757293168 MPa.
func TestConvert(t *testing.T) {
	nmm := systems["N-mm"]
	knm := systems["kN-m"]
	kipin := systems["kip-in"]
	for _, c := range []struct {
		in   string
		dim  Dim
		sys  System
		want float64
	}{
		{"5200", Length, nmm, 5200},
		{"5.2", Length, knm, 5200},
		{"5.2 m", Length, nmm, 5200},
		{"5.2m", Length, nmm, 5200},
		{"52 cm", Length, nmm, 520},
		{"1 in", Length, nmm, 25.4},
		{"2 ft", Length, nmm, 609.6},
		{"10", Length, kipin, 254},
		{"1_000", Force, nmm, 1000},
		{"1_000 kN", Force, nmm, 1e6},
		{"620 kN", Force, nmm, 620e3},
		{"1.5 MN", Force, nmm, 1.5e6},
		{"1 lbf", Force, nmm, 4.4482216152605},
		{"1 kip", Force, nmm, 4448.2216152605},
		{"1", Force, kipin, 4448.2216152605},
		{"1", Force, knm, 1000},
		{"205 GPa", Stress, nmm, 205000},
		{"275 MPa", Stress, nmm, 275},
		{"275e6 Pa", Stress, nmm, 275},
		{"275000 kPa", Stress, nmm, 275},
		{"275000", Stress, knm, 275},
		{"1 ksi", Stress, nmm, 6.894757293168},
		{"1000 psi", Stress, nmm, 6.894757293168},
		{"36", Stress, kipin, 36 * 6.894757293168},
		{"275 N/mm2", Stress, nmm, 275},
		{"3 kN*m", Moment, nmm, 3e6},
		{"1 kip*in", Moment, nmm, 4448.2216152605 * 25.4},
		{"1 kip*ft", Moment, nmm, 4448.2216152605 * 304.8},
		{"5000 kN*m/rad", Spring, nmm, 5e9},
		{"5000 kN*m", Spring, nmm, 5e9}, // a moment unit is read per radian
		{"1 kip*in/rad", Spring, nmm, 4448.2216152605 * 25.4},
		{"1 kip*ft/rad", Spring, nmm, 4448.2216152605 * 304.8},
		{"1 N*mm/rad", Spring, nmm, 1},
		{"2", Spring, knm, 2e6},
		{"93.1 cm2", Area, nmm, 9310},
		{"9310 mm^2", Area, nmm, 9310},
		{"1 in2", Area, nmm, 645.16},
		{"0.5 m2", Area, nmm, 5e5},
		{"11360 cm4", SecondMoment, nmm, 1.136e8},
		{"1 in4", SecondMoment, nmm, 416231.4256},
		{"1 m4", SecondMoment, nmm, 1e12},
		{"1 mm^4", SecondMoment, nmm, 1},
		{"125.9e3 cm6", Warping, nmm, 1.259e11},    // 1 cm^6 = 10^6 mm^6
		{"1 in6", Warping, nmm, 268535866.5400959}, // 25.4^6
		{"2 m^6", Warping, nmm, 2e18},
		{"740", SecondMoment, kipin, 740 * 416231.4256},
		{"0.03", Dimensionless, knm, 0.03},
	} {
		got, err := convert(c.in, c.dim, c.sys)
		if err != nil {
			t.Errorf("convert(%q, %v, %s): %v", c.in, c.dim, c.sys.Name, err)
			continue
		}
		if math.Abs(got-c.want) > 1e-12*math.Abs(c.want) {
			t.Errorf("convert(%q, %v, %s) = %.15g, want %.15g", c.in, c.dim, c.sys.Name, got, c.want)
		}
	}
}

func TestConvertErrors(t *testing.T) {
	nmm := systems["N-mm"]
	for _, c := range []struct {
		in   string
		dim  Dim
		want string
	}{
		{"5.2 kN", Length, "is a force but this key takes a length"},
		{"205 GPa", Force, "is a stress but this key takes a force"},
		{"5.2 furlongs", Length, "unknown unit \"furlongs\""},
		{"5.2 Mpa", Stress, "write \"MPa\""},
		{"abc", Length, "is not a number"},
		{"1__0", Force, "is not a number"},
		{"nan", Force, "is not a number"},
		{"3 kN*m", Stress, "is a moment"},
		{"0.5 kN", Dimensionless, "takes a plain number (no unit)"},
	} {
		_, err := convert(c.in, c.dim, nmm)
		if err == nil || !strings.Contains(err.Error(), c.want) {
			t.Errorf("convert(%q, %v) error %v, want one containing %q", c.in, c.dim, err, c.want)
		}
	}
}
