package report

import (
	"fmt"
	"html/template"
	"math"
	"sort"
	"strconv"
	"strings"
)

// view is the report's content formatted for reading, shared by the HTML
// and Markdown writers so that both carry the same facts.
type view struct {
	Title, StudyFile, ToolVersion, InputSHA, Seed, Units string
	// Record is the filing head ([record]), StudyText the study file as
	// run (record.go).
	Record    []KV
	StudyText string

	Result       []KV
	Verdict      string
	VerdictClass string // "met", "not-met", "undecided" or ""
	// InvVerdict is an inventory's members against the target, beside
	// Verdict (then the study's as written, a typical member's), with its
	// class (inventory_verdict.go).
	InvVerdict, InvVerdictClass string

	Inputs   []inputRow
	Check    []CheckRow
	Nominal  []KV
	Defaults []string

	TornadoOutput, TornadoBase string
	TornadoUnit                string // " (kN)" or ""; for column heads
	TornadoBeta                bool   // the rows carry FORM betas
	Tornado                    []tornadoRow
	SobolOutput, SobolNote     string
	Sobol                      []sobolRow
	SobolCapacity              []sobolRow // indices of the capacity
	FORMBeta, FORMPf           string
	FORM                       []formRow
	Design                     []designRow // design values (design.go)
	DesignBeta, DesignNote     string
	Spearman                   []KV
	Influence                  string
	RankingNote                string // which ranking answers which question

	SweepLabel  string
	SweepCurves *table // every curve's β at every swept value
	Sweep       []pointRow
	Variants    []pointRow
	// SweepNoted and VariantsNoted are set when a row of Sweep or of
	// Variants has a Note: its table gains the column.
	SweepNoted, VariantsNoted bool
	// Inventory is the study's inventory (inventory_view.go).
	Inventory *invView
	// Calibration is the partial-factor calibration (calibration_view.go).
	Calibration *calView

	Updates     []updateRow
	Measured    []measuredRow // see target.go
	Target      []KV          // the target check and the reserve
	CodeCheck   []KV          // the code check beside beta (codecheck.go)
	Combination []KV          // the load combination cases (combination.go)
	// LifeVerdict, Life and LifeTable are the remaining life (life.go).
	LifeVerdict string
	Life        []KV
	LifeTable   *table
	Diagnostics []KV
	Warnings    []string
	Notes       []string

	Pictures map[string]pictureView
	Caution  string
}

type inputRow struct{ Name, Dist, Params, Mean, CoV, Unit string }

type tornadoRow struct{ Variable, LowValue, HighValue, Low, High, Swing, LowBeta, HighBeta string }

type sobolRow struct{ Variable, First, FirstCI, Total, TotalCI string }

type formRow struct{ Variable, DesignPoint, Importance string }

// pointRow is a case of a sweep or a variant in the report's tables;
// Note says, for a case whose estimate is not trusted, that it is no
// result and why ("" otherwise).
type pointRow struct{ Name, Pf, PfCI, Beta, Note string }

type updateRow struct{ Variable, Prior, After, Unit, N, Picture string }

// pictureView is a rendered picture ready for the HTML.
type pictureView struct {
	Name, Caption string
	SVG           template.HTML
}

// makeView formats b for reading.
func makeView(b *Bundle, pics []picture, notes []string) *view {
	d := doc(b)
	v := &view{
		Title:       d.Title,
		StudyFile:   b.StudyFile,
		ToolVersion: d.ToolVersion,
		InputSHA:    d.InputSHA256,
		Record:      RecordRows(d.Record),
		StudyText:   string(b.StudyText),
		Units:       d.Units,
		Defaults:    b.Defaults,
		Diagnostics: b.Diagnostics,
		Spearman:    byRankCorrelation(b.Spearman),
		Warnings:    d.Warnings,
		Notes:       notes,
		Pictures:    map[string]pictureView{},
		Caution:     Caution,
		SobolOutput: b.SobolOutput,
		SobolNote:   b.SobolNote,
		SweepLabel:  b.SweepLabel,
	}
	if v.Title == "" {
		v.Title = "strutrisk study"
	}
	v.Calibration = calibrationView(d.Calibration)
	v.Inventory = inventoryView(&d, func(lo, hi string) string { return ", 95% interval " + lo + " to " + hi })
	if d.Seed != nil {
		v.Seed = strconv.FormatUint(*d.Seed, 10)
	}
	f2 := func(x float64) string { return fixed(x, 2) }
	if d.Pf != nil {
		v.Result = append(v.Result, KV{"probability of failure pf", prob(*d.Pf)})
		if !sampled(&d) {
			v.Result = append(v.Result, KV{"95% interval of pf", "none: FORM is a first-order approximation, not a sample"})
		}
		if len(d.PfCI) == 2 && sampled(&d) {
			v.Result = append(v.Result, KV{"95% interval of pf", intervalText(d.PfCI, prob)})
		}
		if d.PfCoV != nil && sampled(&d) {
			v.Result = append(v.Result, KV{"coefficient of variation of the estimate", percent(*d.PfCoV)})
		}
	}
	if d.Beta != nil {
		v.Result = append(v.Result, KV{"reliability index β", BetaText(float64(*d.Beta))})
		if len(d.BetaCI) == 2 && sampled(&d) {
			v.Result = append(v.Result, KV{"95% interval of β", betaIntervalText(d.BetaCI)})
		}
	}
	if vd := TargetVerdict(&d); vd != NoTarget {
		v.Result = append(v.Result, KV{"target β", f2(*d.TargetBeta)})
		v.Verdict = "Target " + verdictText(&d, vd) + "."
		v.VerdictClass = map[Verdict]string{Met: "met", NotMet: "not-met", Undecided: "undecided"}[vd]
		if v.InvVerdict, v.InvVerdictClass = inventoryVerdict(&d); v.InvVerdict != "" {
			v.Verdict = "The study as written (a typical member): target " + verdictText(&d, vd) + "."
		}
	}
	if d.ReserveFactor != nil {
		v.Result = append(v.Result, KV{"reserve factor (load factor at which the target is just met)", factorText(*d.ReserveFactor)})
	}
	if d.GoverningAxis != "" {
		v.Result = append(v.Result, KV{"governing axis", d.GoverningAxis})
	}
	if d.Method != "" {
		v.Result = append(v.Result, KV{"method", d.Method})
	}
	if d.Evaluations != nil {
		v.Result = append(v.Result, KV{"limit-state evaluations", thousands(*d.Evaluations)})
	}
	if d.Capacity != nil {
		v.Result = append(v.Result, KV{"capacity: mean, sd, 5% fractile", kN(d.Capacity.Mean) + ", " + kN(d.Capacity.SD) + ", " + kN(d.Capacity.P05)})
	}
	if d.Demand != nil {
		v.Result = append(v.Result, KV{"demand: mean, sd, 95% fractile", kN(d.Demand.Mean) + ", " + kN(d.Demand.SD) + ", " + kN(d.Demand.P95)})
	}

	for _, c := range b.Check {
		c.Unit = unitText(c.Unit)
		v.Check = append(v.Check, c)
	}
	for _, in := range b.Inputs {
		cov := ""
		if in.CoV != 0 {
			cov = fixed(in.CoV, 3)
		}
		s, u := displayFor(in.Mean, in.Unit)
		v.Inputs = append(v.Inputs, inputRow{in.Name, in.Dist, in.Params, sig(in.Mean*s, 4), cov, unitText(u)})
	}
	if n := d.Nominal; n != nil {
		v.Nominal = []KV{
			{"nominal capacity", kN(n.Capacity)},
			{"Euler load", kN(n.EulerLoad)},
			{"elastic critical load", kN(n.CriticalLoad) + " (" + n.Mode + ")"},
			{"slenderness KL/r", sig(n.Slenderness, 4)},
			{"relative slenderness", fixed(n.RelativeSlenderness, 3)},
			{"effective length factor K", fixed(n.K, 3)},
			{"axis", n.Axis},
		}
		if bn := n.Bending; n.LoadFactor > 0 && bn != nil {
			v.Nominal = append([]KV{
				{"nominal load factor", fixed(n.LoadFactor, 3) + " on every action (margin " + fixed(n.LoadFactor-1, 3) + ")"},
				{"bending (" + bn.Axis + " axis)", "top " + sig(bn.Top*1e-6, 4) + " kN m, bottom " + sig(bn.Bottom*1e-6, 4) + " kN m (the same sign: single curvature), lateral " + sig(bn.Lateral, 4) + " kN/m"},
			}, v.Nominal...)
			v.Nominal[2].Key = "axial load at the load factor"
		}
	}

	scale, out := tornadoScale(b.TornadoOutput)
	v.TornadoOutput = out
	if i := strings.LastIndex(out, "("); i >= 0 && strings.HasSuffix(out, ")") {
		v.TornadoUnit = " " + out[i:]
	}
	if len(d.Tornado) > 0 {
		v.TornadoBase = sig(b.TornadoBase*scale, 4) + strings.TrimSuffix(strings.Replace(v.TornadoUnit, "(", "", 1), ")")
	}
	betas := map[string][2]float64{}
	for _, r := range b.TornadoBeta {
		if finite(r.LowBeta) || finite(r.HighBeta) {
			betas[r.Variable] = [2]float64{r.LowBeta, r.HighBeta}
			v.TornadoBeta = true
		}
	}
	for _, t := range d.Tornado {
		u := inputUnit(b, t.Variable)
		row := tornadoRow{t.Variable, withUnit(t.LowValue, u), withUnit(t.HighValue, u),
			sig(t.Low*scale, 4), sig(t.High*scale, 4), sig(math.Abs(t.High-t.Low)*scale, 3), notAvailable, notAvailable}
		if bt, ok := betas[t.Variable]; ok {
			row.LowBeta, row.HighBeta = f2(bt[0]), f2(bt[1])
		}
		v.Tornado = append(v.Tornado, row)
	}
	ci := func(c [2]float64) string { return fixed(c[0], 3) + " to " + fixed(c[1], 3) }
	sobolTable := func(rows []Sobol) []sobolRow {
		rows = append([]Sobol(nil), rows...)
		sort.SliceStable(rows, func(i, j int) bool { return rows[i].Total > rows[j].Total })
		var out []sobolRow
		for _, s := range rows {
			out = append(out, sobolRow{s.Variable, fixed(s.First, 3), ci(s.FirstCI), fixed(s.Total, 3), ci(s.TotalCI)})
		}
		return out
	}
	v.Sobol = sobolTable(d.Sobol)
	v.SobolCapacity = sobolTable(sobolRows(b.SobolCapacity))
	if f := d.FORM; f != nil {
		v.FORMBeta, v.FORMPf = f2(f.Beta), prob(f.Pf)
		names := sortedKeys(f.DesignPoint)
		for _, k := range sortedKeys(f.Importance) {
			if _, ok := f.DesignPoint[k]; !ok {
				names = append(names, k)
			}
		}
		sort.SliceStable(names, func(i, j int) bool { return f.Importance[names[i]] > f.Importance[names[j]] })
		for _, k := range names {
			dp, imp := notAvailable, notAvailable
			if x, ok := f.DesignPoint[k]; ok {
				dp = withUnit(x, inputUnit(b, k))
			}
			if a, ok := f.Importance[k]; ok {
				imp = fixed(a, 3)
			}
			v.FORM = append(v.FORM, formRow{k, dp, imp})
		}
	}
	v.Design, v.DesignBeta, v.DesignNote = designTable(b, d.FORM)
	if r := RankInputs(&d, 3); len(r.Inputs) > 0 {
		s := ""
		for i, in := range r.Inputs {
			if i > 0 {
				s += ", "
			}
			s += fmt.Sprintf("%s (%s)", in.Name, sig(in.Weight, 2))
		}
		v.Influence = s + " — by " + r.Measure
		v.RankingNote = RankingNote(&d)
	}

	v.SweepCurves = sweepCurvesTable(b)
	if t := gridCasesTable(b); t != nil {
		v.SweepCurves = t
	}
	for _, p := range d.Sweep {
		name := sig(p.Value, 4)
		if b.Cases.manyKeys() {
			name = pointName(pointOf(b.Cases, p))
		}
		r := pointRow{name, prob(p.Pf), intervalText(p.PfCI[:], prob), BetaText(float64(p.Beta)), ""}
		if p.Doubtful {
			r.Note = untrustedNote(p.StatusReason)
			v.SweepNoted = true
		}
		v.Sweep = append(v.Sweep, r)
	}
	for _, p := range d.Variants {
		r := pointRow{p.Name, prob(p.Pf), intervalText(p.PfCI[:], prob), BetaText(float64(p.Beta)), ""}
		if p.Untrusted() {
			r.Note = untrustedNote(p.StatusReason)
			v.VariantsNoted = true
		}
		v.Variants = append(v.Variants, r)
	}
	v.Target, v.Measured = targetRows(&d), measuredRows(&d)
	v.CodeCheck = CodeCheckRows(d.CodeCheck)
	v.Combination = CombinationRows(&d)
	v.LifeVerdict, v.Life = LifeVerdict(&d), LifeRows(&d)
	if head, rows := LifeTable(&d, 60); len(rows) > 0 {
		v.LifeTable = &table{Head: head, Rows: rows}
	}
	for k, u := range b.Updates {
		r := updateRow{Variable: u.Variable, Unit: u.Unit, N: strconv.Itoa(len(u.Data)), Picture: "update-" + strconv.Itoa(k+1)}
		if u.Prior != nil {
			r.Prior = cleanNumbers(u.Prior.String())
		}
		if u.After != nil {
			r.After = cleanNumbers(u.After.String())
		}
		v.Updates = append(v.Updates, r)
	}
	for _, p := range pics {
		if p.svg != nil {
			v.Pictures[p.fig.Name] = pictureView{p.fig.Name, p.fig.Caption, template.HTML(inlineSVG(p.svg))}
		}
	}
	return v
}

// unitText writes a unit for a table's unit column: powers as superscripts
// (mm4 as mm⁴) and a dash for a dimensionless quantity.
func unitText(u string) string {
	if u == "" {
		return "–"
	}
	return unitPowers.Replace(u)
}

var unitPowers = strings.NewReplacer("mm4", "mm⁴", "mm3", "mm³", "mm2", "mm²", "m4", "m⁴", "m3", "m³", "m2", "m²", "^4", "⁴", "^3", "³", "^2", "²")

// Picture returns the named picture, so templates can ask for it.
func (v *view) Picture(name string) *pictureView {
	if p, ok := v.Pictures[name]; ok {
		return &p
	}
	return nil
}
