package analysis

import (
	"errors"
	"fmt"
	"math"
	"strings"

	"strutrisk/internal/column"
	"strutrisk/internal/report"
	"strutrisk/internal/study"
)

// Loaded is a checked study with its model and nominal picture.
type Loaded struct {
	Study     *study.Study
	Model     *study.Model
	Nominal   *study.Nominal
	CodeCheck *report.CodeCheck // nil when it could not be made
}

// Load reads, checks and builds the study at path. The problems of the
// file come as a *study.Error; a section or nominal member that cannot be
// built comes as an error that names the key.
func Load(path string) (*Loaded, error) {
	st, err := study.Load(path)
	if err != nil {
		return nil, err
	}
	md, err := study.Build(st)
	if err != nil {
		return nil, fmt.Errorf("member.section: %v", err)
	}
	nom, err := md.Nominal()
	if err != nil {
		return nil, errors.New(err.Error())
	}
	// Valid but probably not meant (a unit, a digit): warnings.
	st.Warnings = append(st.Warnings, md.Plausibility(nom)...)
	// A model outside its ground (L/n with K != 1, residual stresses left
	// out): warnings with the size of the effect.
	st.Warnings = append(st.Warnings, md.Adequacy(nom)...)
	cc, why := codeCheck(md) // codecheck.go
	if why != "" {
		// Not a doubt about a result: the check is absent, and says why.
		st.Defaults = append(st.Defaults, why)
	}
	return &Loaded{Study: st, Model: md, Nominal: nom, CodeCheck: cc}, nil
}

// BaseDocument is the result document without sampling fields.
func (l *Loaded) BaseDocument() *report.Document {
	st, n := l.Study, l.Nominal
	a := n.Axis
	d := &report.Document{
		Title:         st.Title,
		ToolVersion:   Version,
		InputSHA256:   st.SHA256,
		Record:        recordDoc(st.Record),
		Units:         "N-mm-MPa",
		Complete:      true,
		GoverningAxis: a.String(),
		Nominal: &report.Nominal{
			Capacity:            n.Capacity,
			EulerLoad:           n.Euler[a],
			Slenderness:         n.Slenderness[a],
			RelativeSlenderness: n.RelSlenderness[a],
			K:                   n.Member.K[a],
			Axis:                a.String(),
			SectionClass:        n.Class.Class,
			EffectiveArea:       n.EffectiveArea,
			CriticalLoad:        n.Critical,
			Mode:                n.Mode.String(),
			CapacityMode:        n.CapacityMode.String(),
			LoadFactor:          n.LoadFactor,
			Bending:             bendingDoc(n), // bending.go
		},
		CodeCheck: l.CodeCheck,
		Warnings:  append([]string{}, st.Warnings...),
	}
	if st.HasTarget {
		t := st.Target
		d.TargetBeta = &t
	}
	d.Target = baseTarget(st)                          // reserve.go
	d.Measurements = measurementsDoc(st)               // measure.go
	d.LoadPeriods = loadPeriodsDoc(st)                 // period.go
	d.Combination, d.Combinations = combinationDoc(st) // combination.go
	return d
}

// checkRows is the deterministic check, per axis.
func (l *Loaded) checkRows() []report.CheckRow {
	n := l.Nominal
	m := &n.Member
	row := func(q, unit string, f func(a column.Axis) string) report.CheckRow {
		return report.CheckRow{Quantity: q, Major: f(column.Major), Minor: f(column.Minor), Unit: unit}
	}
	g := func(v float64) string { return fmt.Sprintf("%.4g", v) }
	rows := []report.CheckRow{
		row("second moment of area I", "mm4", func(a column.Axis) string { return g(m.Props.I[a]) }),
		row("radius of gyration r", "mm", func(a column.Axis) string { return fmt.Sprintf("%.1f", m.Props.R[a]) }),
		row("elastic modulus W", "mm3", func(a column.Axis) string { return g(m.Props.W[a]) }),
		row("effective length factor K ("+kLabel(l.Study)+")", "", func(a column.Axis) string { return fmt.Sprintf("%.3f", m.K[a]) }),
		row("slenderness K L / r", "", func(a column.Axis) string { return fmt.Sprintf("%.1f", n.Slenderness[a]) }),
		row("relative slenderness", "", func(a column.Axis) string { return fmt.Sprintf("%.3f", n.RelSlenderness[a]) }),
		row("Euler load", "kN", func(a column.Axis) string { return fmt.Sprintf("%.1f", n.Euler[a]/1e3) }),
		row("capacity", "kN", func(a column.Axis) string {
			if n.AxisCapacity[a] == 0 {
				return "not checked"
			}
			return fmt.Sprintf("%.1f", n.AxisCapacity[a]/1e3)
		}),
	}
	return rows
}

// kLabel says how K was found, once when both axes agree.
func kLabel(st *study.Study) string {
	a, b := kHow(st, 0), kHow(st, 1)
	if a == b {
		return a
	}
	return a + " / " + b
}

func kHow(st *study.Study, a int) string {
	e := st.Ends[a]
	switch e.How {
	case "ends":
		return e.Ends
	case "springs":
		return "springs"
	case "default":
		return "default"
	}
	if e.K != nil && e.K.Random() {
		return "mean"
	}
	return "given"
}

// inputs lists every input of the study for the report.
func (l *Loaded) inputs() []report.Input {
	var in []report.Input
	for _, q := range l.Study.Quantities {
		r := report.Input{Name: q.Path, Unit: q.Unit()}
		if q.Random() {
			r.Dist, r.Params = q.DistName, q.Params
			r.Mean = q.MeanValue()
			if r.Mean != 0 {
				r.CoV = q.Dist.StdDev() / math.Abs(r.Mean)
			}
			if u := q.Updated(); u != nil {
				r.CoV = u.UpdatedSummary().CoV // the predictive may have no finite moments
			}
		} else {
			r.Dist, r.Mean = "fixed", q.Value
			r.Params = fmt.Sprintf("%g %s", q.Value, q.Unit())
		}
		in = append(in, r)
	}
	return in
}

// CheckText is the deterministic check as a person reads it.
func (l *Loaded) CheckText() string {
	var b strings.Builder
	st, n := l.Study, l.Nominal
	fmt.Fprintf(&b, "%s\n", st.Title)
	for _, kv := range report.RecordRows(recordDoc(st.Record)) {
		fmt.Fprintf(&b, "  %-12s %s\n", kv.Key, kv.Value)
	}
	fmt.Fprintf(&b, "study %s (bare numbers in %s); values below in N, mm, MPa and kN\n\n", st.File, st.Units.Name)
	fmt.Fprintf(&b, "Nominal member: %s section, A = %.0f mm2, L = %.0f mm, E = %.0f MPa, %s = %.1f MPa\n",
		st.Section.Name, n.Member.Props.A, n.Member.Length, n.Member.E, strengthSymbol(st), n.Member.Fy)
	b.WriteString(materialText(l.Model, n)) // material.go
	if st.Material.Kind != column.Timber {
		b.WriteString(classText(n)) // class.go
	}
	if !st.ModelTraits().Curve {
		fmt.Fprintf(&b, "  bow %.2f mm, eccentricity %.2f mm (means of their magnitude)%s\n", math.Abs(n.Member.Bow), math.Abs(n.Member.Ecc), imperfectionNote(st, n))
	} else {
		fmt.Fprintf(&b, "  imperfection factor alpha %.2f (major) / %.2f (minor), plateau lambda_0 %.2f\n", n.Member.Alpha[0], n.Member.Alpha[1], plateau(n))
	}
	fmt.Fprintf(&b, "\n  %-44s %12s %12s\n", "", "major", "minor")
	for _, r := range l.checkRows() {
		q := r.Quantity
		if r.Unit != "" {
			q += " (" + r.Unit + ")"
		}
		fmt.Fprintf(&b, "  %-44s %12s %12s\n", q, r.Major, r.Minor)
	}
	b.WriteString(torsionText(n))
	fmt.Fprintf(&b, "\nCapacity model %s: %s governs (%s), capacity %.1f kN", st.Model, governingText(n), n.Governs, n.Capacity/1e3)
	if n.ModelFactor != 1 {
		fmt.Fprintf(&b, " (model factor %.3g included)", n.ModelFactor)
	}
	fmt.Fprintf(&b, "\nDemand at mean loads %.1f kN", n.Demand/1e3)
	if st.Combination != nil {
		b.WriteString(" (the combination case of the largest mean load)")
	}
	if n.EffectFactor != 1 {
		fmt.Fprintf(&b, " (effect factor %.3g included)", n.EffectFactor)
	}
	fmt.Fprintf(&b, "; utilisation %.3f\n", n.Utilisation)
	b.WriteString(bendingText(st, n)) // bending.go
	if st.HasTarget {
		fmt.Fprintf(&b, "Target reliability index %.2f: `strutrisk run` estimates whether it is met\n", st.Target)
	}
	b.WriteString(targetCheckText(st) + measureText(st)) // reserve.go, measure.go
	b.WriteString(loadPeriodText(st))                    // period.go
	b.WriteString(st.CombinationText())
	b.WriteString(report.CodeCheckText(l.CodeCheck))
	b.WriteString(lifeCheckText(l))   // life.go
	b.WriteString(casesCheckText(st)) // sweep.go
	b.WriteString(report.InventoryCheckText(l.InventoryCheck()))
	if len(st.Defaults) > 0 {
		fmt.Fprintf(&b, "\nDefaults that apply:\n")
		for _, d := range st.Defaults {
			fmt.Fprintf(&b, "  - %s\n", d)
		}
	}
	if len(st.Warnings) > 0 {
		fmt.Fprintf(&b, "\nWarnings:\n")
		for _, w := range st.Warnings {
			fmt.Fprintf(&b, "  - %s\n", w)
		}
	}
	fmt.Fprintf(&b, "\n%s\n", report.CautionText)
	return b.String()
}

// imperfectionNote says what the nominal bow printed by check stands for
// when it depends on the axis: the governing axis's, the equivalent
// imperfection (with the study's bow in place of its geometric part), a
// fraction of the buckling length, and the sway.
func imperfectionNote(st *study.Study, n *study.Nominal) string {
	var parts []string
	if st.Imperfection == "equivalent" {
		e := fmt.Sprintf("EN 1993-1-1 equivalent imperfection, alpha %.2f", n.Member.Alpha[n.Axis])
		if st.Bow != nil {
			e += ", with imperfection.bow for its geometric part"
		}
		parts = append(parts, e)
	} else if st.Bow != nil && st.Bow.Lcr || st.Ecc != nil && st.Ecc.Lcr {
		parts = append(parts, fmt.Sprintf("Lcr/n of K L = %.0f mm", n.Member.K[n.Axis]*n.Member.Length))
	}
	switch {
	case st.Sway != nil && n.Member.Sway != 0:
		parts = append(parts, fmt.Sprintf("sway 1/%.0f", 1/math.Abs(n.Member.Sway)))
	case st.Sway != nil:
		parts = append(parts, "no sway (braced about this axis)")
	}
	if len(parts) == 0 {
		return ""
	}
	return "; " + n.Axis.String() + " axis: " + strings.Join(parts, "; ")
}

// recordDoc is the study's [record] for the result document; nil when the
// study has none.
func recordDoc(r study.Record) *report.Record {
	if r.Empty() {
		return nil
	}
	return &report.Record{Project: r.Project, Member: r.Member, PreparedBy: r.PreparedBy,
		CheckedBy: r.CheckedBy, Date: r.Date, Revision: r.Revision, Notes: r.Notes}
}
