package study

// bucklingCurve is capacity model "curve": the buckling curves of EN
// 1993-1-1 6.3.1.2 (column.Curve) with the imperfection factor of each
// axis (capacity.curve or alpha; Table 6.2's by default, curvechoice.go).
type bucklingCurve struct{}

func (bucklingCurve) String() string { return "curve" }

// Traits of a buckling curve: it carries the imperfections.
func (bucklingCurve) Traits(*Study) Traits { return Traits{Curve: true} }

func (bucklingCurve) keys() []string          { return nil }
func (bucklingCurve) options(*parser, *table) {}
func (bucklingCurve) kernel() kernel          { return kernelCurve }

// check warns that the geometric imperfections are not read.
func (bucklingCurve) check(p *parser) {
	if st := p.st; st.Bow != nil || st.Ecc != nil {
		p.warnf("capacity.model: the buckling curve already contains the imperfections; imperfection.bow and imperfection.eccentricity are ignored")
	}
}
