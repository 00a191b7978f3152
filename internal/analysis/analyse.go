package analysis

import (
	"context"
	"fmt"
	"math"
	"runtime"

	"strutrisk/internal/assess"
	"strutrisk/internal/report"
	"strutrisk/internal/study"
	"strutrisk/sim"
)

// Result is everything a run computed.
type Result struct {
	l        *Loaded
	settings sim.Settings
	// Estimate is the main run's.
	Estimate *sim.Result
	form     *sim.FORMResult
	formErr  error
	base     float64
	tornado  []sim.TornadoRow
	sobol    []sim.SobolIndex
	sobolMsg string
	sobolCap []sim.SobolIndex // of the capacity; sobol is of the margin
	warnings []string
	target   *targetRun      // reserve factor and its confirmation (reserve.go)
	combined *study.Combined // the load combination cases (combination.go)
	life     *lifeRun        // the remaining life under corrosion (life.go)
	// calibration is the partial-factor calibration (calibration.go).
	calibration *assess.Calibration
	// Incomplete, when not empty, says why the run is not complete.
	Incomplete string
	cases      *cases        // sweep and variants (sweep.go)
	inventory  *inventoryRun // the members of an inventory (inventory.go)
}

// Settings are the study's [analysis] settings for sim, with those of its
// capacity model; workers 0 takes every core.
func (l *Loaded) Settings(workers int) sim.Settings {
	st := l.Study
	if workers <= 0 {
		// Resolved here, not left 0 for sim to resolve: the steps above
		// sampling (inventory members, the joint sample of a system, the
		// first-order system) share out work by this count, and took one
		// core with 0.
		workers = runtime.NumCPU()
	}
	s := l.Model.SimSettings(sim.Settings{
		Method:    st.Analysis.Method,
		Samples:   st.Analysis.Samples,
		TargetCoV: st.Analysis.TargetCoV,
		Seed:      st.Analysis.Seed,
		Workers:   workers,
	})
	if st.ModelTraits().Expensive {
		// Each evaluation is a numerical analysis: describe the capacity
		// and demand from a smaller auxiliary sample.
		s.AuxSamples = 2000
	}
	return s
}

// Run runs the study of l with settings s: the estimate, FORM, the
// sensitivity measures and the reserve factor, then, when the main run is
// complete, every case of its sweep and variants with the same settings.
// obs, when not nil, is told of each step. An error means no estimate; an
// interrupted run returns what finished, its Estimate marked Incomplete.
func Run(ctx context.Context, l *Loaded, s *sim.Settings, obs Observer) (*Result, error) {
	if obs == nil {
		obs = quiet{}
	}
	obs.Stage("main run (" + string(s.Method) + ")")
	r, err := analyse(ctx, l, s, obs)
	if err == nil && !r.Estimate.Incomplete && l.Study.Life != nil {
		obs.Stage("remaining life")
		r.runLife(ctx, s.Workers) // life.go
	}
	if err == nil && !r.Estimate.Incomplete && l.Study.Calibration != nil {
		obs.Stage("calibration of " + l.Study.Calibration.Factor)
		r.runCalibration(ctx, s.FORM, obs) // calibration.go
	}
	if err == nil && !r.Estimate.Incomplete {
		// The main result stays the study itself; sweep and variants
		// follow with the same settings (sweep.go).
		if r.cases = runCases(ctx, l, s, obs); r.cases != nil {
			r.warnings = append(r.warnings, r.cases.warnings...)
		}
	}
	if err == nil && !r.Estimate.Incomplete && l.Study.Inventory != nil {
		obs.Stage("inventory members")
		r.inventory = runInventory(ctx, l, s, r.form, obs)
		r.warnings = append(r.warnings, r.inventory.warnings...)
	}
	return r, err
}

// analyse runs the estimate and the sensitivity measures.
func analyse(ctx context.Context, l *Loaded, s *sim.Settings, obs Observer) (*Result, error) {
	r := &Result{l: l, settings: *s}
	m := l.Model.Sim
	res, err := sim.Run(ctx, m, s)
	if err != nil {
		return nil, err
	}
	r.Estimate = res
	r.warnings = append(r.warnings, res.Warnings...)
	if st := res.BetaStatement(); st != "" && !res.Incomplete {
		r.warnings = append(r.warnings, st) // empty when a warning of the method says so
	}
	if res.Incomplete {
		r.warnings = append(r.warnings, fmt.Sprintf("incomplete: the run was interrupted after %d evaluations; the estimate is from the samples finished", res.Evaluations))
		return r, nil
	}
	obs.Stage("FORM")
	r.form = res.FORM
	if r.form == nil && len(m.Vars) > 0 && ctx.Err() == nil {
		r.form, r.formErr = studyFORM(ctx, l, s) // a merge takes the shards' (shard_form.go)
		if r.formErr != nil {
			r.warnings = append(r.warnings, "form: "+r.formErr.Error())
		}
	}
	if r.form != nil && !r.form.Converged {
		r.warnings = append(r.warnings, "form: the design-point search did not converge ("+r.form.Status+"); its beta and importance are indicative only")
	}
	if l.Study.Combination != nil && ctx.Err() == nil {
		obs.Stage("load combination cases")
		var warns []string
		r.combined, warns = runCombination(ctx, l, s.FORM)
		r.warnings = append(r.warnings, warns...)
	}
	sens := l.Study.Sensitivity
	margin := l.Model.MarginModel()
	if sens.Tornado && len(m.Vars) > 0 && ctx.Err() == nil {
		obs.Stage("tornado")
		// FORM betas per bar, unless each evaluation is a numerical analysis.
		withFORM := !l.Study.ModelTraits().Expensive
		base, rows, err := sim.Tornado(margin, &sim.TornadoSettings{Low: sens.TornadoLow, High: sens.TornadoHigh, Output: 0, FORM: withFORM, FORMSettings: s.FORM})
		if err != nil {
			r.warnings = append(r.warnings, "tornado: "+err.Error())
		} else {
			r.base, r.tornado = base, rows
		}
	}
	if sens.Sobol && len(m.Vars) > 1 && ctx.Err() == nil {
		obs.Stage("Sobol indices")
		idx, err := sim.Sobol(ctx, margin, &sim.SobolSettings{Samples: sens.SobolSamples, Seed: s.Seed, Output: 0, Workers: s.Workers})
		if err != nil {
			r.warnings = append(r.warnings, "sobol: "+err.Error())
		} else {
			r.sobol = idx
			r.sobolMsg = sim.SobolIndependenceWarning(margin)
		}
		if k := outputIndex(m, "capacity"); k >= 0 && ctx.Err() == nil {
			obs.Stage("Sobol indices of the capacity")
			idx, err := sim.Sobol(ctx, m, &sim.SobolSettings{Samples: sens.SobolSamples, Seed: s.Seed, Output: k, Workers: s.Workers})
			if err != nil {
				r.warnings = append(r.warnings, "sobol of the capacity: "+err.Error())
			} else {
				r.sobolCap = idx
			}
		}
	}
	if ctx.Err() == nil {
		r.target = runTarget(ctx, l, s, obs)
		if r.target != nil && r.target.cut != "" {
			r.warnings = append(r.warnings, r.target.cut)
		}
	}
	return r, nil
}

// Document fills the complete result document.
func (r *Result) Document() *report.Document {
	d := r.l.BaseDocument()
	res := r.Estimate
	d.Method = string(res.Method)
	seed := r.settings.Seed
	d.Seed = &seed
	ev := res.Evaluations
	d.Evaluations = &ev
	pf, cov, beta := res.Pf, res.PfCoV, res.Beta
	ib := report.Index(beta)
	d.Pf, d.PfCoV, d.Beta = finitePtr(pf), finitePtr(cov), &ib // beta null when unbounded
	d.PfCI = []float64{res.PfCI[0], res.PfCI[1]}
	d.BetaCI = report.Indices(res.BetaCI[0], res.BetaCI[1])
	d.Status = res.Status.String()
	if res.Status != sim.Converged {
		d.StatusReason = res.StatusReason
	}
	trusted := res.Status.Trusted()
	d.Trusted = &trusted
	r.fillTarget(d) // verdict (absent when undecided) and reserve
	fillCombination(d, r.combined)
	r.life.fill(d)
	d.Calibration = r.calibration
	r.inventory.fill(d, nil)
	for _, o := range res.Outputs {
		switch o.Name {
		case "capacity":
			d.Capacity = summaryOf(o)
		case "demand":
			d.Demand = summaryOf(o)
		}
	}
	if f := r.form; f != nil && len(f.Points) > 0 {
		p := f.Points[0]
		conv := f.Converged
		ff := &report.FORM{Beta: f.Beta, Pf: f.Pf, DesignPoint: map[string]float64{}, Importance: map[string]float64{}, Converged: &conv}
		for i, v := range r.l.Model.Sim.Vars {
			ff.DesignPoint[v.Name] = r.l.Model.InUnits(i, p.X[i], p.X) // L/n in mm
			ff.Importance[v.Name] = p.Importance[i]
		}
		r.fillDesign(ff) // design.go
		d.FORM = ff
	}
	med := r.l.Model.Medians()
	for _, t := range r.tornado {
		lo, hi := t.LowValue, t.HighValue
		for i, v := range r.l.Model.Sim.Vars {
			if v.Name == t.Variable { // the others at their medians; L/n in mm
				lo, hi = r.l.Model.InUnits(i, lo, med), r.l.Model.InUnits(i, hi, med)
			}
		}
		d.Tornado = append(d.Tornado, report.Tornado{Variable: t.Variable, LowValue: lo, HighValue: hi, Low: t.Low, High: t.High})
	}
	for _, s := range r.sobol {
		d.Sobol = append(d.Sobol, report.Sobol{Variable: s.Variable, First: s.First, Total: s.Total, FirstCI: s.FirstCI, TotalCI: s.TotalCI})
	}
	for _, s := range r.sobolCap {
		d.SobolCapacity = append(d.SobolCapacity, report.Sobol{Variable: s.Variable, First: s.First, Total: s.Total, FirstCI: s.FirstCI, TotalCI: s.TotalCI})
	}
	if f := r.form; f != nil && f.Converged && len(f.Points) > 0 {
		// The axis that governs at the most probable failure point.
		if res, _, _, err := r.l.Model.At(f.Points[0].X); err == nil {
			d.GoverningAxis = res.Axis.String()
		}
	}
	d.Warnings = append(d.Warnings, r.warnings...)
	if r.Incomplete != "" {
		d.Complete, d.IncompleteReason = false, r.Incomplete
		if !res.Incomplete { // that case has its warning already
			d.Warnings = append(d.Warnings, "incomplete: "+r.Incomplete)
		}
	}
	if r.sobolMsg != "" {
		d.Warnings = append(d.Warnings, "sobol: "+r.sobolMsg)
	}
	return d
}

// outputIndex returns the index of the output named name in m, or -1.
func outputIndex(m *sim.Model, name string) int {
	for i, o := range m.Outputs {
		if o == name {
			return i
		}
	}
	return -1
}

// finitePtr returns nil for a value JSON cannot carry (NaN, Inf).
func finitePtr(v float64) *float64 {
	if math.IsNaN(v) || math.IsInf(v, 0) {
		return nil
	}
	return &v
}

func summaryOf(o sim.OutputStats) *report.Summary {
	s := &report.Summary{Mean: o.Mean, SD: o.SD}
	q := func(p float64) float64 {
		for i, l := range sim.QuantileLevels {
			if l == p && i < len(o.Quantiles) {
				return o.Quantiles[i]
			}
		}
		return math.NaN()
	}
	s.P01, s.P05, s.P50, s.P95, s.P99 = q(0.01), q(0.05), q(0.50), q(0.95), q(0.99)
	return s
}

// Bundle is everything the report draws from.
func (r *Result) Bundle() *report.Bundle {
	l := r.l
	b := &report.Bundle{
		Doc:             r.Document(),
		StudyFile:       l.Study.File,
		StudyText:       l.Study.Data,
		Inputs:          l.inputs(),
		Check:           l.checkRows(),
		Defaults:        l.Study.Defaults,
		Convergence:     r.Estimate.Convergence,
		TraceKind:       r.Estimate.Trace,
		Replicates:      r.Estimate.Replicates,
		ReplicateName:   replicateName(r.Estimate.Method),
		Samples:         r.samplesInUnits(),
		NominalCapacity: l.Nominal.Capacity,
		Governs:         governingText(l.Nominal) + ", " + l.Nominal.Governs,
		NominalDemand:   l.Nominal.Demand,
		Utilisation:     l.Nominal.Utilisation,
		MethodReason:    r.Estimate.Reason,
		TornadoOutput:   "margin g = capacity - demand (N)",
		TornadoBase:     r.base,
		SobolOutput:     "margin g = capacity - demand",
		SobolNote:       r.sobolMsg,
		SobolCapacity:   r.sobolCap,
		Updates:         updates(l.Study),
		ByMagnitude:     l.Model.ByMagnitude(),
		StudyModel:      l.Study.Model.String(),
		VariantModels:   map[string]string{},
	}
	for v, va := range l.Study.Variants {
		b.VariantModels[va.Name] = caseModel(l.Study, v)
	}
	if !l.Study.ModelTraits().Expensive {
		b.TornadoBeta = r.tornado
	}
	for i := range r.Estimate.Outputs {
		o := &r.Estimate.Outputs[i]
		switch o.Name {
		case "capacity":
			b.Capacity = o
		case "demand":
			b.Demand = o
		case "g":
			b.Margin = o
		}
	}
	b.Slenderness = r.slendernessChart()
	r.bendingBundle(b) // bending.go
	r.cases.fill(b)
	r.inventory.fill(nil, b)
	r.addTrace(b)
	b.Diagnostics = []report.KV{
		{Key: "method", Value: string(r.Estimate.Method)},
		{Key: "why", Value: r.Estimate.Reason},
		{Key: "evaluations", Value: fmt.Sprint(r.Estimate.Evaluations)},
		{Key: "cov of pf", Value: fmt.Sprintf("%.3g", r.Estimate.PfCoV)},
		{Key: "status", Value: statusText(r.Estimate)},
		{Key: "seed", Value: fmt.Sprint(r.settings.Seed)},
	}
	if r.form != nil {
		b.Diagnostics = append(b.Diagnostics, report.KV{Key: "FORM", Value: fmt.Sprintf("beta %.3f, %d evaluations, %s", r.form.Beta, r.form.Evaluations, r.form.Status)})
	}
	if r.Estimate.Kept != nil {
		if rows, err := sim.SpearmanTable(r.Estimate.Kept, "g"); err == nil {
			for _, rc := range rows {
				if math.IsNaN(rc.Rho) || rc.Name == "g" {
					continue
				}
				b.Spearman = append(b.Spearman, report.KV{Key: rc.Name, Value: fmt.Sprintf("%+.3f", rc.Rho)})
			}
		}
	}
	return b
}

// slendernessChart is the capacity ratio against relative slenderness:
// the study's model and the closed-form models it is compared with, per
// axis (see study.ReferenceCurves) and Euler's curve, the nominal member and a cloud
// of sampled members.
func (r *Result) slendernessChart() *report.SlendernessChart {
	md := r.l.Model
	refs := md.ReferenceCurves(60, 3)
	if len(refs) == 0 {
		return nil
	}
	c := &report.SlendernessChart{}
	for _, rc := range refs {
		c.Curves = append(c.Curves, report.Curve{Name: rc.Name, Model: rc.Model, Note: rc.Note, Axis: rc.Axis.String(), X: rc.X, Y: rc.Y})
	}
	var ex, ey []float64
	for i := 1; i <= 60; i++ {
		l := 3 * float64(i) / 60
		ex = append(ex, l)
		ey = append(ey, math.Min(1, 1/(l*l))) // Euler: N/(A fy) = 1/lam^2, capped by the squash load
	}
	c.Curves = append(c.Curves, report.Curve{Name: "Euler", Model: "euler", X: ex, Y: ey})
	n := r.l.Nominal
	m := n.Member
	c.Member = [2]float64{n.ModeSlenderness, n.Capacity / n.ModelFactor / (m.Props.EffectiveArea() * m.Fy)}
	kept := r.Estimate.Kept
	limit := 500
	if r.l.Study.ModelTraits().Expensive {
		limit = 0 // each point would be a numerical analysis
	}
	if kept != nil {
		nv := len(md.Sim.Vars)
		for i, row := range kept.Rows {
			if i >= limit || len(row) < nv {
				break
			}
			res, mm, l, err := md.At(row[:nv])
			if err != nil || math.IsNaN(l) {
				continue
			}
			c.Cloud = append(c.Cloud, [2]float64{l, res.N / (mm.Props.EffectiveArea() * mm.Fy)})
		}
	}
	return c
}

// replicateName names one of the independent estimates of a method.
func replicateName(m sim.Method) string {
	switch m {
	case sim.ConditionalQMC:
		return "randomisation"
	case sim.Subset:
		return "run"
	}
	return ""
}

// statusText is the trust status of res with its reason, for the report.
func statusText(res *sim.Result) string {
	s := res.Status.String()
	if !res.Status.Trusted() {
		s += " (no verdict is drawn)"
	}
	if res.StatusReason != "" && res.Status != sim.Converged {
		s += ": " + res.StatusReason
	}
	return s
}
