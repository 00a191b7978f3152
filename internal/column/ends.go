package column

import "fmt"

// kFixedPinned is pi/u with u the smallest positive root of tan u = u
// (u = 4.493409457909064): the theoretical effective length factor of a
// member fixed at one end and pinned at the other (Timoshenko & Gere,
// Theory of Elastic Stability, 2nd ed., ch. 2).
const kFixedPinned = 0.6991556596428413

// EndsK returns the theoretical effective length factor K of a member
// with classic ends:
//
//	"pinned-pinned"                 1
//	"fixed-free",   "free-fixed"    2
//	"fixed-fixed"                   0.5
//	"fixed-pinned", "pinned-fixed"  0.699156 (tan u = u; "0.7")
//
// These are the elastic eigenvalues. Design practice recommends larger
// values because real ends are never fully fixed: AISC 360 Commentary
// Table C-A-7.1 lists 0.65 (fixed-fixed), 0.80 (fixed-pinned),
// 1.0 (pinned-pinned) and 2.1 (fixed-free). EndsK never substitutes them;
// a study that wants them states K directly.
func EndsK(name string) (float64, error) {
	switch name {
	case "pinned-pinned":
		return 1, nil
	case "fixed-free", "free-fixed":
		return 2, nil
	case "fixed-fixed":
		return 0.5, nil
	case "fixed-pinned", "pinned-fixed":
		return kFixedPinned, nil
	}
	return 0, fmt.Errorf("column: unknown end conditions %q (want pinned-pinned, fixed-free, fixed-fixed or fixed-pinned)", name)
}
