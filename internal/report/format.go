package report

import (
	"math"
	"strconv"
	"strings"
)

// notAvailable stands in the text for a number that is missing or not
// finite, so that no "NaN" or "+Inf" ever reaches a reader.
const notAvailable = "n/a"

// finite reports whether x is neither NaN nor infinite.
func finite(x float64) bool { return !math.IsNaN(x) && !math.IsInf(x, 0) }

// sig formats x to n significant digits without an exponent for ordinary
// magnitudes, e.g. sig(1234.567, 4) = "1235", sig(0.0123456, 3) = "0.0123".
func sig(x float64, n int) string {
	if !finite(x) {
		return notAvailable
	}
	if x == 0 {
		return "0"
	}
	a := math.Abs(x)
	if a >= 1e7 || a < 1e-4 {
		return sci(x, n)
	}
	e := int(math.Floor(math.Log10(a)))
	dec := n - 1 - e
	if dec < 0 {
		p := math.Pow10(-dec)
		return strconv.FormatFloat(math.Round(x/p)*p, 'f', 0, 64)
	}
	return trimZeros(strconv.FormatFloat(x, 'f', dec, 64))
}

// trimZeros removes trailing zeros after a decimal point, and the point.
func trimZeros(s string) string {
	if !strings.Contains(s, ".") {
		return s
	}
	s = strings.TrimRight(s, "0")
	return strings.TrimSuffix(s, ".")
}

// sci formats x in scientific notation with n significant digits and a
// short exponent, e.g. sci(0.00277, 3) = "2.77e-3".
func sci(x float64, n int) string {
	if !finite(x) {
		return notAvailable
	}
	s := strconv.FormatFloat(x, 'e', n-1, 64)
	mant, exp, ok := strings.Cut(s, "e")
	if !ok {
		return s
	}
	mant = trimZeros(mant)
	sign := ""
	if exp[0] == '-' {
		sign = "-"
	}
	exp = strings.TrimLeft(exp[1:], "0")
	if exp == "" {
		return mant
	}
	return mant + "e" + sign + exp
}

// prob formats a probability: scientific below 0.01, else 3 significant
// digits, or above 0.999 as many as tell it from 1.
func prob(p float64) string {
	if !finite(p) {
		return notAvailable
	}
	if p != 0 && math.Abs(p) < 0.01 {
		return sci(p, 3)
	}
	if p > 0.999 && p < 1 {
		// Enough digits to tell it from 1: the lower end of the interval
		// when every sample failed, 0.99963, is not certainty.
		return strconv.FormatFloat(p, 'g', int(math.Ceil(-math.Log10(1-p)))+2, 64)
	}
	return sig(p, 3)
}

// fixed formats x with d decimals.
func fixed(x float64, d int) string {
	if !finite(x) {
		return notAvailable
	}
	return strconv.FormatFloat(x, 'f', d, 64)
}

// percent formats a fraction as a percentage with one decimal.
func percent(x float64) string {
	if !finite(x) {
		return notAvailable
	}
	return strconv.FormatFloat(100*x, 'f', 1, 64) + "%"
}

// display returns the factor and unit used to show a value held in the
// internal unit u: forces in kN and moments in kN*m, everything else as it
// is.
func display(u string) (scale float64, unit string) {
	switch u {
	case "N":
		return 1e-3, "kN"
	case "N*mm", "N·mm":
		return 1e-6, "kN·m"
	}
	return 1, u
}

// displayFor is display, with stresses of 10 000 MPa or more (moduli)
// shown in GPa.
func displayFor(x float64, u string) (scale float64, unit string) {
	if u == "MPa" && math.Abs(x) >= 1e4 {
		return 1e-3, "GPa"
	}
	return display(u)
}

// withUnit formats a value held in internal unit u for reading: converted
// by display (and stresses of 10 000 MPa or more, such as moduli, in GPa)
// and followed by its unit when there is one.
func withUnit(x float64, u string) string {
	return withUnitSig(x, u, 4)
}

// withUnitSig is withUnit with n significant digits.
func withUnitSig(x float64, u string, n int) string {
	s, du := displayFor(x, u)
	v := sig(x*s, n)
	if du == "" || v == notAvailable {
		return v
	}
	return v + " " + du
}

// kN formats a force held in N as kN.
func kN(x float64) string { return withUnit(x, "N") }

// intervalText formats [lo, hi] with f.
func intervalText(ci []float64, f func(float64) string) string {
	if len(ci) != 2 {
		return notAvailable
	}
	return f(ci[0]) + " to " + f(ci[1])
}

// betaIntervalText is intervalText for an interval of beta whose ends may
// be unbounded.
func betaIntervalText(ci []Index) string {
	if len(ci) != 2 {
		return notAvailable
	}
	return BetaText(float64(ci[0])) + " to " + BetaText(float64(ci[1]))
}

// thousands formats an integer with a thin space between groups of three
// digits, e.g. 1 000 000.
func thousands(n int64) string {
	s := strconv.FormatInt(n, 10)
	neg := strings.HasPrefix(s, "-")
	s = strings.TrimPrefix(s, "-")
	var b strings.Builder
	for i, r := range s {
		if i > 0 && (len(s)-i)%3 == 0 {
			b.WriteString(" ")
		}
		b.WriteRune(r)
	}
	if neg {
		return "-" + b.String()
	}
	return b.String()
}

// nonFinite spells the non-finite numbers as fmt writes them.
var nonFinite = strings.NewReplacer("+Inf", "∞", "-Inf", "−∞", "Inf", "∞", "NaN", notAvailable)

// cleanNumbers rewrites the NaN and infinities that fmt may have put in a
// description (such as a distribution's String) for a reader.
func cleanNumbers(s string) string { return nonFinite.Replace(s) }
