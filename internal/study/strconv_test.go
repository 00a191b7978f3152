package study

import "strconv"

func strconvFormat(v float64) string { return strconv.FormatFloat(v, 'f', 6, 64) }
