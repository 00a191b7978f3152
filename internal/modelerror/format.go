package modelerror

import "strconv"

// fmtG writes x with four significant digits, as a study file would take it.
func fmtG(x float64) string { return strconv.FormatFloat(x, 'g', 4, 64) }
