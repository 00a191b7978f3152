package report

import (
	"math"
	"strconv"
	"strings"

	"gonum.org/v1/plot"
)

// niceTicks marks a linear axis with about five major ticks at round steps
// (1, 2, 2.5 or 5 times a power of ten), labelled without trailing zeros
// and with the digits grouped by thousands as on the count axes (12 000),
// and unlabelled minor ticks between them.
type niceTicks struct {
	// Format, if not nil, writes the label of a major tick.
	Format func(float64) string
}

// Ticks implements plot.Ticker.
func (t niceTicks) Ticks(min, max float64) []plot.Tick {
	if !finite(min) || !finite(max) || !(max > min) {
		return nil
	}
	raw := (max - min) / 5
	mag := math.Pow(10, math.Floor(math.Log10(raw)))
	var step, minorDiv float64
	switch f := raw / mag; {
	case f < 1.5:
		step, minorDiv = mag, 5
	case f < 2.25:
		step, minorDiv = 2*mag, 4
	case f < 3.5:
		step, minorDiv = 2.5*mag, 5
	case f < 7.5:
		step, minorDiv = 5*mag, 5
	default:
		step, minorDiv = 10*mag, 5
	}
	dec := 0
	if step < 1 {
		dec = int(math.Ceil(-math.Log10(step) - 1e-9))
	}
	if math.Abs(step*math.Pow(10, float64(dec))-math.Round(step*math.Pow(10, float64(dec)))) > 1e-6 {
		dec++ // 0.25, 2.5 and the like
	}
	var ticks []plot.Tick
	minor := step / minorDiv
	first := math.Ceil(min/minor-1e-9) * minor
	for i := 0; ; i++ {
		v := first + float64(i)*minor
		if v > max+minor*1e-9 {
			break
		}
		if i > 10000 {
			break
		}
		k := v / step
		if math.Abs(k-math.Round(k)) < 1e-6 {
			v = math.Round(k) * step
			if math.Abs(v) < step*1e-9 {
				v = 0
			}
			label := groupThousands(trimZeros(strconv.FormatFloat(v, 'f', dec, 64)))
			if t.Format != nil {
				label = t.Format(v)
			}
			ticks = append(ticks, plot.Tick{Value: v, Label: label})
		} else {
			ticks = append(ticks, plot.Tick{Value: v})
		}
	}
	return ticks
}

// groupThousands puts a space between groups of three digits in the whole
// part of a decimal number written by strconv, as thousands does for an
// integer: "12000" becomes "12 000", "-1500.5" becomes "-1 500.5".
func groupThousands(s string) string {
	whole, frac, hasFrac := strings.Cut(s, ".")
	sign := ""
	if strings.HasPrefix(whole, "-") {
		sign, whole = "-", whole[1:]
	}
	n, err := strconv.ParseInt(whole, 10, 64)
	if err != nil {
		return s
	}
	out := sign + thousands(n)
	if hasFrac {
		out += "." + frac
	}
	return out
}
