package study

import (
	"math"

	"strutrisk/internal/column"
)

// flatClass is the range of yield strengths over which a fixed section
// stays out of class 4 (EN 1993-1-1 Table 5.2), so that its properties
// are the gross ones whatever the yield: a sample whose yield lies in it
// takes props without classifying the section again. Class 1 to 3 all
// give the gross section (only class 4 reduces it), and every class limit
// falls as the yield rises (eps = sqrt(235/fy)), also in floating point,
// where division and square root are correctly rounded and so monotone:
// the range is (0, fyMax].
type flatClass struct {
	fyMax float64      // 0: no range
	props column.Props // the properties over the range
}

// flatRange finds md.flat for a fixed section whose class the yield can
// change, by bisection over the float64 values of the yield, with the
// classification itself as the judge.
func (md *Model) flatRange() {
	md.flat = flatClass{}
	if md.secRandom || !md.propsDynamic {
		return
	}
	flat := func(fy float64) bool {
		_, cl, err := md.sec.ClassifyProps(md.gross, fy)
		return err == nil && cl.Class < 4 && md.sec.Shape != column.ShapeCustom
	}
	lo, hi := math.SmallestNonzeroFloat64, math.MaxFloat64
	if !flat(lo) {
		return
	}
	if !flat(hi) {
		// Positive floats order as their bits: bisect the bits, keeping
		// flat(lo) and not flat(hi).
		a, b := math.Float64bits(lo), math.Float64bits(hi)
		for b-a > 1 {
			m := a + (b-a)/2
			if flat(math.Float64frombits(m)) {
				a = m
			} else {
				b = m
			}
		}
		hi = math.Float64frombits(a)
	}
	p, _, _ := md.sec.ClassifyProps(md.gross, hi)
	md.flat = flatClass{fyMax: hi, props: p}
}

// propsInto sets *p to the properties of sec at the yield strength fy
// (sectionProps), from md.flat when the section is the fixed one and fy
// lies in its range (a copy of md may make the section random: lifeCopy).
func (md *Model) propsInto(sec *column.Section, fy float64, p *column.Props) error {
	if fy > 0 && fy <= md.flat.fyMax && !md.secRandom {
		*p = md.flat.props
		return nil
	}
	q, err := md.sectionProps(sec, fy)
	*p = q
	return err
}
