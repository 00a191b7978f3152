package study

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
