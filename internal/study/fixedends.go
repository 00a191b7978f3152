package study

import "math"

// designK holds, by end condition with a fixed end, the effective length
// factor design practice takes in place of the theoretical one, since a
// real connection is never fully fixed (common practice; the values of
// the commentary to AISC 360, Table C-A-7.1, from memory).
var designK = map[string]float64{
	"fixed-fixed":  0.65,
	"fixed-pinned": 0.80,
	"fixed-free":   2.1,
}

// fixedEndsNote warns that member.ends with a fixed end takes the
// theoretical K of an end that cannot rotate at all (column.EndsK), which
// no real connection achieves: the buckling length, and with it the
// capacity, is then on the unsafe side of design practice.
func (p *parser) fixedEndsNote(ends string, k float64, line int) {
	dk, ok := designK[ends]
	if !ok {
		return
	}
	p.warnf("member.ends (line %d): %s takes K = %.3g, the theoretical value for a fixed end that cannot rotate at all; a real connection or base rotates a little, and design practice takes K = %.3g or more (common practice): give k (a value or a distribution) or spring_top and spring_bottom for the fixity you can justify",
		line, ends, k, dk)
}

// rigidSpringsNote warns, once per key, of an end spring written "rigid":
// an end that cannot rotate at all, as with a fixed end of member.ends.
func (p *parser) rigidSpringsNote() {
	seen := map[string]bool{}
	for _, e := range p.st.Ends {
		if e.How != "springs" {
			continue
		}
		for _, q := range []*Quantity{e.Top, e.Bottom} {
			if q == nil || q.Dist != nil || !math.IsInf(q.Value, 1) || seen[q.Path] {
				continue
			}
			seen[q.Path] = true
			p.warnf("%s (line %d): \"rigid\" is an end that cannot rotate at all, which gives the theoretical K of a fixed end; a real connection or base rotates a little (common practice): give the rotational stiffness you can justify, or a distribution of it",
				q.Path, q.Line)
		}
	}
}
