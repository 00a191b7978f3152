package study

import (
	"errors"
	"fmt"
	"strings"

	"strutrisk/internal/column"
)

// errShell is the refusal of a sample whose circular hollow section is
// class 4: its local buckling is shell buckling, which is not modelled.
var errShell = errors.New("study: the circular hollow section is class 4 (d/t beyond 90 eps^2): shell buckling (EN 1993-1-6) is not modelled")

// errOpen is the refusal of a sample whose angle, channel or tee is class
// 4: its effective section's centroid shift is not modelled.
var errOpen = errors.New("study: the open section is class 4: the shift of its effective centroid (EN 1993-1-1 6.3.3) is not modelled")

// openShape reports an angle, a channel or a tee (shapeInfo.open).
func openShape(s column.Shape) bool {
	return shapeDims[s].open
}

// classifyOptions decides how the model finds the section's class.
func (md *Model) classifyOptions(st *Study) {
	md.classify = shapeDims[st.Section.Shape].classified
	if st.Section.Shape == column.ShapeCustom { // its stated effective area (class 4)
		md.classify = st.Section.Dims["effective_area"] != nil
	}
	yieldRandom := st.Yield != nil && st.Yield.Random()
	md.propsDynamic = md.secRandom || md.classify && yieldRandom
	md.shellOK = st.ModelFactor != nil
}

// sectionProps returns the properties of sec at the yield strength fy:
// the effective ones of a class 4 section (column.Section.Classify). A
// class 4 CHS is refused unless the study gives a model factor for it. It
// does not allocate.
func (md *Model) sectionProps(sec *column.Section, fy float64) (column.Props, error) {
	if !md.classify {
		return sec.Properties()
	}
	var p column.Props
	var cl column.Classification
	var err error
	if md.secRandom {
		p, cl, err = sec.Classify(fy)
	} else {
		p, cl, err = sec.ClassifyProps(md.gross, fy) // the section is fixed
	}
	if err != nil {
		return p, err
	}
	if cl.Class == 4 && sec.Shape == column.ShapeCHS && !md.shellOK {
		return p, errShell
	}
	if cl.Class == 4 && openShape(sec.Shape) && cl.Reduced() {
		return p, errOpen
	}
	return p, nil
}

// checkClass classifies the section at nominal values (EN 1993-1-1 Table
// 5.2) before anything is sampled: it refuses what the models cannot do
// with a class 4 section and warns when the thickness loss, or the upper
// tail of the yield strength or of the loss, moves the class.
func (p *parser) checkClass() {
	st := p.st
	if st.Section.Dims == nil || st.Yield == nil || st.Section.Shape == column.ShapeCustom {
		if st.Section.Shape == column.ShapeCustom && st.Section.Dims["effective_area"] == nil {
			p.defaultf("member.section: a custom section is not classified (EN 1993-1-1 Table 5.2); its whole area is taken as effective (class 1 to 3): for a class 4 section give effective_area")
		}
		return
	}
	fy := nominalValue(st.Yield, 0)
	sec := st.Section.at(func(q *Quantity) float64 { return nominalValue(q, 0) })
	_, cl, err := sec.Classify(fy)
	if err != nil {
		return // checkSection has said why
	}
	if cl.Class == 4 {
		p.class4(sec, cl)
	}
	if sec.ThicknessLoss > 0 {
		clean := sec
		clean.ThicknessLoss = 0
		if _, c0, err := clean.Classify(fy); err == nil && c0.Class != cl.Class {
			p.warnf("member.section.thickness_loss: the loss of %.3g mm moves the section from class %d to class %d (EN 1993-1-1 Table 5.2 at nominal values)", sec.ThicknessLoss, c0.Class, cl.Class)
		}
	}
	if cl.Class < 4 {
		p.tailClass(cl.Class)
	}
}

// class4 says what a nominal class 4 section means for the study.
func (p *parser) class4(sec column.Section, cl column.Classification) {
	st := p.st
	if sec.Shape == column.ShapeCHS {
		if st.ModelFactor == nil {
			e := cl.Elements[0]
			p.errorf("member.section", "the CHS is class 4 (d/t = %.1f beyond 90 eps^2 = %.1f, EN 1993-1-1 Table 5.2): its local buckling is shell buckling (EN 1993-1-6), which strutrisk does not model. Choose a thicker wall, or assess shell buckling yourself and give capacity.model_factor for it (its whole area is then taken as effective)", e.Ratio, e.Limits[2])
			return
		}
		p.warnf("member.section: the CHS is class 4 (shell buckling, EN 1993-1-6, is not modelled): its whole area is taken as effective and capacity.model_factor must cover shell buckling")
		return
	}
	if openShape(sec.Shape) && !cl.Reduced() {
		p.warnf("member.section: the %s is class 4 (%s, EN 1993-1-1 Table 5.2), but every part is fully effective (rho = 1, EN 1993-1-5 4.4): the gross section is used", st.Section.Name, class4Parts(cl))
		return
	}
	if openShape(sec.Shape) {
		p.errorf("member.section", "the %s is class 4 (%s, EN 1993-1-1 Table 5.2): its effective section would shift its centroid (e_N of EN 1993-1-1 6.3.3), which strutrisk does not model. Choose a stockier section, or give it as custom with the effective area and second moments", st.Section.Name, class4Parts(cl))
		return
	}
	if st.ModelTraits().Ultimate {
		p.errorf("capacity.limit", "the section is class 4 (EN 1993-1-1 Table 5.2) and the ultimate beam-column follows the gross fibre section, not local buckling: use limit = \"first-yield\" (on the effective section) or model = \"curve\"")
		return
	}
	p.warnf("member.section: class 4 at nominal values (%s, EN 1993-1-1 Table 5.2): every sample takes its effective area and moduli (EN 1993-1-5 4.4), not the gross section", class4Parts(cl))
}

// class4Parts names the class 4 parts of cl with their ratio and limit.
func class4Parts(cl column.Classification) string {
	var parts []string
	for _, e := range cl.Elements[:cl.N] {
		if e.Class == 4 {
			parts = append(parts, fmt.Sprintf("%s %s %.1f > %.1f", e.Name, RatioName(e.Kind), e.Ratio, e.Limits[2]))
		}
	}
	return strings.Join(parts, ", ")
}

// RatioName is how the slenderness of a part of kind k is written: "c/t",
// "d/t" for a tube, "h/t" for an angle's leg, "(b+h)/2t" for its legs.
func RatioName(k column.ElementKind) string {
	switch k {
	case column.Tube:
		return "d/t"
	case column.Leg:
		return "h/t"
	case column.LegPair:
		return "(b+h)/2t"
	}
	return "c/t"
}

// tailClass warns when the upper tails of the yield strength and of the
// thickness loss (their 0.999 fractiles together) make the section class 4.
func (p *parser) tailClass(nominal int) {
	st := p.st
	loss := st.Section.Dims["thickness_loss"]
	yRandom := st.Yield.Random() && st.Yield.Dist != nil
	lRandom := loss != nil && loss.Random() && loss.Dist != nil
	if !yRandom && !lRandom {
		return
	}
	fy := nominalValue(st.Yield, 0)
	if yRandom {
		fy = st.Yield.Dist.Quantile(0.999)
	}
	sec := st.Section.at(func(q *Quantity) float64 {
		if q == loss && lRandom {
			return q.Dist.Quantile(0.999)
		}
		return nominalValue(q, 0)
	})
	_, cl, err := sec.Classify(fy)
	if err != nil || cl.Class < 4 {
		return
	}
	what := "take their effective area (EN 1993-1-5 4.4)"
	switch {
	case sec.Shape == column.ShapeCHS && st.ModelFactor == nil:
		what = "are counted as failures: a class 4 CHS buckles as a shell (EN 1993-1-6), which is not modelled"
	case openShape(sec.Shape) && cl.Reduced():
		what = "are counted as failures: the centroid shift of a class 4 open section is not modelled"
	case openShape(sec.Shape):
		what = "stay fully effective (rho = 1)"
	case st.ModelTraits().Ultimate:
		what = "are counted as failures: the ultimate beam-column cannot follow local buckling"
	}
	p.warnf("member.section: class %d at nominal values, but class 4 at the 0.999 fractiles of the yield strength and the thickness loss: such samples %s", nominal, what)
}
