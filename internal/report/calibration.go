package report

import (
	"fmt"

	"strutrisk/internal/assess"
)

// CalibrationLine is the summary of a partial-factor calibration, "" when
// there is none: the value, the spread of the cases' betas there and the
// least safe case, or, when the value lies at an end of the range, that
// it is no calibration.
func CalibrationLine(c *assess.Calibration) string {
	if c == nil {
		return ""
	}
	s := fmt.Sprintf("calibrated %s = %s (beta spread %s, worst case %s at beta %s, target %s; FORM, %d cases)",
		c.Factor, fixed(c.Value, 3), fixed(c.Spread, 2), c.Worst, fixed(worstBeta(c), 2), fixed(c.TargetBeta, 2), len(c.Cases))
	if c.AtBound {
		s += fmt.Sprintf("; warning: the value lies at an end of the range %s to %s, so the best value may lie outside it and this is no calibration: widen calibration.range", fixed(c.Low, 3), fixed(c.High, 3))
	}
	return s
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
