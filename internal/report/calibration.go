package report

import (
	"fmt"
	"strings"
	"unicode/utf8"

	"strutrisk/internal/assess"
)

// CalibrationLine is the summary of a partial-factor calibration, "" when
// there is none: the value, the spread of the cases' betas there and the
// least safe case. A value at an end of the range is no calibration: the
// line says so and points to the run's warning, which alone explains it
// (runCalibration adds it), so that the summary does not print it twice.
func CalibrationLine(c *assess.Calibration) string {
	if c == nil {
		return ""
	}
	spread := fmt.Sprintf("beta spread %s, worst case %s at beta %s, target %s; FORM, %d cases",
		fixed(c.Spread, 2), c.Worst, fixed(worstBeta(c), 2), fixed(c.TargetBeta, 2), len(c.Cases))
	if c.AtBound {
		return fmt.Sprintf("no calibration: %s = %s lies at an end of the range %s to %s (see the warning; %s)",
			c.Factor, fixed(c.Value, 3), fixed(c.Low, 3), fixed(c.High, 3), spread)
	}
	return fmt.Sprintf("calibrated %s = %s (%s)", c.Factor, fixed(c.Value, 3), spread)
}

// worstBeta is the beta of the calibration's worst case.
func worstBeta(c *assess.Calibration) float64 {
	for _, k := range c.Cases {
		if k.Case == c.Worst {
			return k.Beta
		}
	}
	return 0
}

// calibrationCasesText is the table of a calibration's cases for the
// summary, under its line: weight, beta at the value found, its gap to
// the target and, when known, beta at the initial value.
func calibrationCasesText(c *assess.Calibration) string {
	if c == nil || len(c.Cases) == 0 {
		return ""
	}
	var w strings.Builder
	initial := c.Cases[0].BetaInitial != nil
	width := 28
	for _, k := range c.Cases {
		width = max(width, utf8.RuneCountInString(k.Case))
	}
	fmt.Fprintf(&w, "    %-*s %7s  %8s  %11s", width, "case", "weight", "beta", "beta-target")
	if initial {
		fmt.Fprintf(&w, "  %s", "beta at "+fixed(c.Initial, 3))
	}
	w.WriteString("\n")
	for _, k := range c.Cases {
		fmt.Fprintf(&w, "    %-*s %7s  %8s  %11s", width, k.Case, sig(k.Weight, 3), fixed(k.Beta, 2), strings.Replace(signed(k.Beta-c.TargetBeta), "−", "-", 1))
		if initial && k.BetaInitial != nil {
			fmt.Fprintf(&w, "  %14s", fixed(*k.BetaInitial, 2))
		}
		w.WriteString("\n")
	}
	return w.String()
}
