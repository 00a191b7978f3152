package report

import (
	"math"
	"sort"
)

// tornadoHalf is the half height of a tornado row's bar, in rows.
const tornadoHalf = 0.32

// tornadoBar is one half of a tornado row: the bar from the base to the
// result with the input at one fractile, and its label.
type tornadoBar struct {
	// Row is the row (0 at the bottom); Y0 and Y1 the bar's vertical extent.
	Row    int
	Y0, Y1 float64
	// X is the bar's far end (the base is the other).
	X float64
	// Low is set for the input at its low fractile.
	Low bool
	// Label is the input value; LabelY its height. Left puts the label to
	// the left of X (the bar points left).
	Label  string
	LabelY float64
	Left   bool
	// Split is set when the row's two bars share its height (both
	// fractiles move the result the same way).
	Split bool
}

// tornadoLayout sorts rows (smallest swing at the bottom, largest at the
// top, rows that are not finite left out) and lays out their bars about
// base (already scaled); values are multiplied by scale and labelled by
// label. When both fractiles of a row move the result the same way the
// row's two bars are drawn side by side, each half as high and each with
// its own label, so that neither hides the other; such rows are returned
// in same.
func tornadoLayout(all []Tornado, base, scale float64, label func(r Tornado, x float64) string) (rows []Tornado, bars []tornadoBar, same []string) {
	for _, r := range all {
		if finite(r.Low) && finite(r.High) {
			rows = append(rows, r)
		}
	}
	// The swing spans the base too: an input whose fractiles both move the
	// result one way is ranked by its farther end.
	swing := func(r Tornado) float64 {
		b := base / scale
		return math.Max(math.Max(r.Low, r.High), b) - math.Min(math.Min(r.Low, r.High), b)
	}
	sort.SliceStable(rows, func(i, j int) bool { return swing(rows[i]) < swing(rows[j]) })
	for i, r := range rows {
		y := float64(i)
		lo, hi := r.Low*scale, r.High*scale
		split := (lo-base)*(hi-base) > 0
		if split {
			same = append(same, r.Variable)
		}
		for _, h := range []struct {
			x, in float64
			low   bool
		}{{lo, r.LowValue, true}, {hi, r.HighValue, false}} {
			b := tornadoBar{Row: i, Split: split, Y0: y - tornadoHalf, Y1: y + tornadoHalf, X: h.x, Low: h.low, Label: label(r, h.in), LabelY: y}
			if split {
				// The low fractile above, the high one below.
				if h.low {
					b.Y0 = y
				} else {
					b.Y1 = y
				}
				b.LabelY = (b.Y0 + b.Y1) / 2
			}
			b.Left = h.x < base || (h.x == base && h.low)
			bars = append(bars, b)
		}
	}
	return rows, bars, same
}
