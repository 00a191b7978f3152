package main

import (
	"strings"
	"testing"
)

// hGood is a rolled H column (254 x 254 x 73 dimensions) checked by first
// yield with a geometric bow alone: the adequacy warning must show.
const hGood = `title = "rolled H"
[member]
length = "4 m"
ends = "pinned-pinned"
[member.section]
shape = "I"
depth = 254.1
width = 254.6
flange = 14.2
web = 8.6
root = 12.7
fabrication = "hot-rolled"
[material]
modulus = 210000
yield = { dist = "lognormal", mean = 275, cov = 0.07 }
[imperfection]
bow = "Lcr/1000"
[loads]
dead = { dist = "normal", mean = "600 kN", cov = 0.1 }
`

// TestAdequacyWarningShown: check prints the warning for first yield with
// a bow alone on a rolled H section, with the EN 1993-1-1 curve it is
// compared with, and not once the equivalent imperfection is used.
func TestAdequacyWarningShown(t *testing.T) {
	code, out, errs := invoke(t, "check", writeStudy(t, hGood))
	all := out + errs
	if code != 0 || !strings.Contains(all, "leaves out the residual stresses of a hot-rolled I section") || !strings.Contains(all, `buckling curve "b" (major), "c" (minor)`) {
		t.Errorf("exit %d; no adequacy warning:\n%s", code, all)
	}
	fixed := strings.Replace(hGood, `bow = "Lcr/1000"`, "", 1) + "[capacity]\nimperfection = \"equivalent\"\n"
	code, out, errs = invoke(t, "check", writeStudy(t, fixed))
	all = out + errs
	if code != 0 || strings.Contains(all, "leaves out the residual stresses") || !strings.Contains(all, "Table 6.2 gives curve") {
		t.Errorf("exit %d; equivalent imperfection:\n%s", code, all)
	}
}
