package study

import (
	"errors"
	"fmt"
	"math"
	"sort"
	"strings"

	"strutrisk/internal/assess"
	"strutrisk/internal/column"
)

// CodeCheckSpec holds the partial factors of [code_check] (defaults: the
// recommended values, see assess.GammaM0...) and the characteristic
// values the study sets itself.
type CodeCheckSpec struct {
	GammaM0, GammaM1, GammaG, GammaQ, Psi0 float64
	// Psi0By holds the combination factors code_check.psi_0 gives named
	// loads, by the load's path ("loads.snow"); the others take Psi0.
	Psi0By map[string]float64
	// Characteristic holds characteristic values given in the study, by
	// the random input's path (N, mm, MPa).
	Characteristic map[string]float64
	// Normalise is code_check.normalise: NormaliseDesign, or "" for none;
	// LoadRatio is code_check.load_ratio, -1 when not given (see
	// normalise.go). NormalisedResistance is the design resistance the
	// loads were scaled to (N), 0 without normalising.
	Normalise            string
	LoadRatio            float64
	NormalisedResistance float64
}

// Psi0Of returns the combination factor of the load at path: its own
// from code_check.psi_0 written as a table, else Psi0.
func (cs *CodeCheckSpec) Psi0Of(path string) float64 {
	if v, ok := cs.Psi0By[path]; ok {
		return v
	}
	return cs.Psi0
}

// CheckInput is one input of the code check at its characteristic value.
type CheckInput struct {
	Path, Unit string
	Value      float64
	Basis      string
}

// CodeCheck is the deterministic check of EN 1993-1-1:2005 6.2.4 and
// 6.3.1 at characteristic values with partial factors: the design
// resistance against the design load of EN 1990 expression 6.10. All
// forces in N, stresses in MPa, areas in mm2.
type CodeCheck struct {
	GammaM0, GammaM1 float64
	Factors          assess.LoadFactors
	// Inputs are the characteristic values used: every random input and
	// every load, in the order of the file.
	Inputs []CheckInput
	// Fy is the characteristic yield strength, EffectiveArea A (A_eff of a
	// class 4 section at Fy) and Class the section's class (0: custom).
	Fy, EffectiveArea float64
	Class             int
	// Curve is the buckling curve of the governing mode ("" when an
	// imperfection factor was given), Alpha its imperfection factor and
	// CurveFrom where it came from.
	Curve     string
	Alpha     float64
	CurveFrom string
	// Axis and Mode are those of the governing buckling resistance,
	// Critical its elastic critical load, RelSlenderness
	// sqrt(A_eff fy / N_cr) and Chi the reduction factor of eq. (6.49).
	Axis                     column.Axis
	Mode                     column.Mode
	Critical, RelSlenderness float64
	Chi                      float64
	CrossSection, Buckling   float64 // N_c,Rd (6.10, 6.11), N_b,Rd (6.47)
	Resistance               float64 // the smaller of the two
	Loads                    []assess.Load
	Combination              assess.Combination
	EffectFactor             float64
	DesignLoad, Utilisation  float64
	// AxialOnly reports that the member also bends (end eccentricity,
	// sway, or the beam-column model): the check leaves the bending out,
	// so its utilisation is no verdict.
	AxialOnly bool
	Notes     []string
}

// CodeCheck makes the deterministic code check of the study: every input
// at its characteristic value (Characteristic, or the value of [code_check]
// characteristic), the resistance by EN 1993-1-1 6.3.1 whatever the
// study's capacity model, with the buckling curve of the study (capacity.
// curve or alpha) or of EN 1993-1-1 Table 6.2, the design load by EN 1990
// 6.10 times the effect factor's characteristic value (its mean). The
// model factor is not applied: gamma_M1 stands for it.
func (md *Model) CodeCheck() (*CodeCheck, error) {
	st := md.Study
	if st.Material.Kind != column.Steel {
		return nil, fmt.Errorf("the code check is that of EN 1993-1-1 for carbon steel; the material is %s", st.Material.Kind)
	}
	cs := st.CodeCheck
	c := &CodeCheck{GammaM0: cs.GammaM0, GammaM1: cs.GammaM1, Factors: assess.LoadFactors{GammaG: cs.GammaG, GammaQ: cs.GammaQ, Psi0: cs.Psi0, Psi0By: cs.Psi0By}}
	v, char := md.characteristicValues(c)
	m, sec, err := md.member(&v)
	if err == nil {
		err = m.Validate(column.Both)
	}
	if err != nil {
		return nil, fmt.Errorf("at characteristic values: %v", err)
	}
	if err := md.checkCurves(c, &m); err != nil {
		return nil, err
	}
	c.Fy, c.EffectiveArea = m.Fy, m.Props.EffectiveArea()
	if _, cl, err := sec.Classify(m.Fy); err == nil {
		c.Class = cl.Class
	}
	if c.Class == 4 && sec.Shape == column.ShapeCHS {
		return nil, errors.New("the CHS is class 4 at the characteristic yield: its shell buckling (EN 1993-1-6) is not in this check")
	}
	if err := md.checkBuckling(c, &m); err != nil {
		return nil, err
	}
	c.CrossSection = c.EffectiveArea * c.Fy / c.GammaM0
	c.Buckling = c.Chi * c.EffectiveArea * c.Fy / c.GammaM1
	c.Resistance = math.Min(c.CrossSection, c.Buckling)
	if !(c.Resistance > 0) || math.IsInf(c.Resistance, 0) {
		return nil, fmt.Errorf("the design resistance %g N is not a positive number", c.Resistance)
	}
	for _, q := range st.Loads {
		c.Loads = append(c.Loads, assess.Load{Name: q.Path, Characteristic: char[q], Permanent: md.isPermanent(q)})
	}
	if c.Combination, err = assess.DesignLoad(c.Loads, c.Factors); err != nil {
		return nil, err
	}
	c.EffectFactor = v[fEffect]
	c.DesignLoad = c.EffectFactor * c.Combination.Design
	if c.Resistance > 0 {
		c.Utilisation = c.DesignLoad / c.Resistance
	}
	c.AxialOnly = st.Ecc != nil || st.Sway != nil || st.ModelTraits().Bending || st.Bending != nil
	c.Notes = md.checkNotes()
	normalisedCheck(c, cs) // normalise.go
	return c, nil
}

// characteristicValues sets every input of an evaluation at its
// characteristic value and lists the random ones and the loads in c.
func (md *Model) characteristicValues(c *CodeCheck) (values, map[*Quantity]float64) {
	st := md.Study
	v := md.base
	char := map[*Quantity]float64{}
	basis := map[*Quantity]string{}
	for i, b := range md.binds {
		q := md.quantity(i)
		ch := md.Characteristic(i)
		if x, ok := st.CodeCheck.Characteristic[q.Path]; ok {
			ch = assess.Characteristic{Value: x, Basis: "code_check.characteristic"}
		}
		char[q], basis[q] = ch.Value, ch.Basis
		md.set(&v, b, ch.Value)
	}
	for _, q := range st.Quantities {
		switch {
		case q == st.Bow || q == st.Ecc || q == st.Sway || q == st.ModelFactor || st.companion(q):
			// not in the code check
		case q.Random():
			c.Inputs = append(c.Inputs, CheckInput{Path: q.Path, Unit: q.Unit(), Value: char[q], Basis: basis[q]})
		case md.isLoad(q):
			char[q] = q.Value
			c.Inputs = append(c.Inputs, CheckInput{Path: q.Path, Unit: q.Unit(), Value: q.Value, Basis: "fixed"})
		}
	}
	return v, char
}

// checkCurves gives m the imperfection factor of each axis: the study's
// curve or alpha, else EN 1993-1-1 Table 6.2's.
func (md *Model) checkCurves(c *CodeCheck, m *column.Member) error {
	st := md.Study
	for a := column.Major; a <= column.Minor; a++ {
		if st.Alpha[a] != nil {
			continue // m.Alpha[a] holds its value
		}
		name, _, err := st.Table62(a)
		if err != nil {
			if st.Section.Shape == column.ShapeCustom {
				return errors.New("a custom section has no buckling curve in EN 1993-1-1 Table 6.2: give capacity.curve for the code check")
			}
			return err
		}
		m.Alpha[a] = curveAlpha(name)
	}
	return nil
}

// checkBuckling finds the governing buckling resistance chi A_eff fy of
// EN 1993-1-1 6.3.1 over the checked axes and, with both axes, the modes
// that twist (6.3.1.4), with its curve, critical load and slenderness.
func (md *Model) checkBuckling(c *CodeCheck, m *column.Member) error {
	st := md.Study
	best := math.Inf(1)
	pick := func(n float64, a column.Axis, mode column.Mode, ncr float64) {
		if n < best || n == best && ncr <= c.Critical {
			best, c.Axis, c.Mode, c.Critical = n, a, mode, ncr
		}
	}
	for a := column.Major; a <= column.Minor; a++ {
		if st.Axis != column.Both && st.Axis != a {
			continue
		}
		res, err := column.Curve(m, a)
		if err != nil {
			return fmt.Errorf("code check, %s axis: %v", a, err)
		}
		pick(res.N, a, res.Mode, column.Euler(m, a))
	}
	if st.Axis == column.Both && m.Props.It != 0 {
		res, err := column.Twisting(m, column.GovernsCurve)
		if err != nil {
			return fmt.Errorf("code check, torsional mode: %v", err)
		}
		ncr, _ := column.TwistingLoad(m)
		pick(res.N, column.Minor, res.Mode, ncr)
	}
	np := c.EffectiveArea * c.Fy
	c.Chi = best / np
	c.RelSlenderness = math.Sqrt(np / c.Critical)
	c.Alpha = m.Alpha[c.Axis]
	c.Curve, c.CurveFrom = md.curveOf(c.Axis)
	return nil
}

// curveOf names the buckling curve of axis a and where it came from.
func (md *Model) curveOf(a column.Axis) (curve, from string) {
	st := md.Study
	if st.Alpha[a] != nil {
		if st.Curve[a] != "" {
			return st.Curve[a], "capacity.curve"
		}
		return "", "capacity.alpha"
	}
	name, row, err := st.Table62(a)
	if err != nil {
		return "", ""
	}
	return name, "EN 1993-1-1 Table 6.2: " + row
}

// checkNotes are what a reader of the code check must know about this
// study.
func (md *Model) checkNotes() []string {
	st := md.Study
	notes := []string{"Recommended partial factors unless the study sets them; the National Annex may differ."}
	if st.Ecc != nil || st.Sway != nil || st.ModelTraits().Bending {
		notes = append(notes, "The member also bends (end eccentricity, sway or the beam-column model), but this is the axial buckling resistance of EN 1993-1-1 6.3.1 only: the 6.3.3 interaction with bending is not checked, so the utilisation is no verdict.")
	}
	if st.ModelFactor != nil {
		notes = append(notes, "The model factor of the reliability model is not applied: gamma_M1 stands for the model uncertainty of the buckling curve.")
	}
	return notes
}

// Rule states the combination rule of the design load in words.
func (c *CodeCheck) Rule() string {
	s := fmt.Sprintf("EN 1990 6.10: gamma_G %g on permanent loads, gamma_Q %g on the leading variable load", c.Factors.GammaG, c.Factors.GammaQ)
	if c.Combination.Leading != "" {
		s += " (" + c.Combination.Leading + ")"
	}
	if len(c.Factors.Psi0By) == 0 {
		s += fmt.Sprintf(", gamma_Q psi_0 = %g x %g on the others", c.Factors.GammaQ, c.Factors.Psi0)
	} else {
		// Each load its own psi_0: no one product stands for the others.
		names := make([]string, 0, len(c.Factors.Psi0By))
		for n := range c.Factors.Psi0By {
			names = append(names, n)
		}
		sort.Strings(names)
		for i, n := range names {
			names[i] = fmt.Sprintf("%s %g", n, c.Factors.Psi0By[n])
		}
		s += fmt.Sprintf(", gamma_Q %g times psi_0 on the others (psi_0 of %s, of the other loads %g)", c.Factors.GammaQ, strings.Join(names, ", "), c.Factors.Psi0)
	}
	s += "; favourable loads 1.0 (permanent) or 0 (variable)"
	if c.EffectFactor != 1 {
		s += fmt.Sprintf("; times the effect factor %g", c.EffectFactor)
	}
	return s
}
