package analysis

import (
	"context"
	"fmt"
	"strings"

	"strutrisk/internal/assess"
	"strutrisk/internal/life"
	"strutrisk/internal/report"
	"strutrisk/internal/study"
)

// lifeRun is the remaining life of a study with [life].
type lifeRun struct {
	res      life.Result
	crossing life.Crossing
	basis    report.LifeBasis
}

// runLife runs the remaining life into r: a failure is a warning, an
// interruption leaves the run incomplete.
func (r *Result) runLife(ctx context.Context, workers int) {
	lr, warns, err := runLife(ctx, r.l, workers, r.settings.Seed)
	r.warnings = append(r.warnings, warns...)
	switch {
	case ctx.Err() != nil:
		r.Incomplete = "interrupted during the remaining life ([life]): it is left out"
	case err != nil:
		r.warnings = append(r.warnings, "life: "+err.Error())
	default:
		r.life = lr
	}
}

// runLife follows the study's member through its remaining life
// (internal/life): conditional sampling over the years, the resistance
// the same random member every year, with the run's seed (--seed or
// analysis.seed).
func runLife(ctx context.Context, l *Loaded, workers int, seed uint64) (*lifeRun, []string, error) {
	st, md := l.Study, l.Model
	p, err := md.LifeProblem(workers)
	if err != nil {
		return nil, nil, err
	}
	p.Seed = seed
	res, err := life.Run(ctx, p)
	if err != nil {
		return nil, nil, err
	}
	ls := st.Life
	lr := &lifeRun{res: res}
	b := &lr.basis
	b.Years, b.Step, b.Paths = ls.Years, ls.Step, res.Paths
	b.LossLaw = lossLaw(st)
	b.LossEnd = md.LifeLoss(float64(ls.Years))
	b.CapacityNow, _ = md.LifeCapacity(0)
	b.CapacityEnd, _ = md.LifeCapacity(float64(ls.Years))
	b.Method = res.Method()
	b.Criterion = report.LifeCriterion
	for _, a := range ls.Annual {
		b.Loads = append(b.Loads, report.LifeLoad{Load: a.Path, Annual: a.Dist.String(), Basis: a.Basis})
	}
	warns := md.LifeWarnings()
	target, source, ok := annualTarget(st)
	switch {
	case ok:
		b.TargetBeta, b.TargetSource = &target, source
		lr.crossing = res.FirstBelow(target)
		b.Resolved = lr.crossing.Resolved(res)
		if c := lr.crossing; c.Earliest != 0 || c.Latest != 0 {
			b.EndRange = []int{c.Earliest, c.Latest}
		}
		if !b.Resolved {
			warns = append(warns, fmt.Sprintf("life: sampling error leaves the year the annual beta falls below the target in doubt (from year %d to %s): no end of life is given; raise life.samples (now %d)",
				lr.crossing.Earliest, yearOrBeyond(lr.crossing.Latest), ls.Paths))
		}
	case st.HasTarget:
		warns = append(warns, "life: target.reference_period is not a duration, so the target cannot be turned into an annual one: no end of life is found; give reference_period = \"50 years\" (or the period the target is for)")
	default:
		b.Resolved = true
	}
	if last := res.Points[len(res.Points)-1]; last.CoVCumulative > 0.2 {
		warns = append(warns, fmt.Sprintf("life: the cumulative pf at the horizon is known to a CoV of %.2g only: raise life.samples (now %d)", last.CoVCumulative, ls.Paths))
	}
	return lr, warns, nil
}

// yearOrBeyond writes a bracket's end.
func yearOrBeyond(y int) string {
	if y == 0 {
		return "beyond the horizon"
	}
	return fmt.Sprintf("year %d", y)
}

// annualTarget is the study's target for one year: a target over n years
// converted by Phi(beta_n) = Phi(beta_1)^n (independent years).
func annualTarget(st *study.Study) (beta float64, source string, ok bool) {
	if !st.HasTarget || !(st.ReferenceYears > 0) {
		return 0, "", false
	}
	if st.ReferenceYears == 1 {
		return st.Target, st.TargetSource + ", for one year", true
	}
	b1 := assess.BetaOverYears(st.Target, 1/st.ReferenceYears)
	return b1, fmt.Sprintf("%s: beta %.2f over %s, converted to one year by Phi(beta_n) = Phi(beta_1)^n, independent years", st.TargetSource, st.Target, assess.YearsText(st.ReferenceYears)), true
}

// lossLaw says the loss law of [life] as applied.
func lossLaw(st *study.Study) string {
	ls := st.Life
	q := func(x *study.Quantity, unit string, def string) string {
		switch {
		case x == nil:
			return def
		case x.Random():
			return x.Dist.String() + unit
		}
		return fmt.Sprintf("%g%s", x.Value, unit)
	}
	now := "none given"
	if tl := st.Section.Dims["thickness_loss"]; tl != nil {
		now = q(tl, " mm", "")
	}
	return fmt.Sprintf("d(t) = r t^b from every face, t in years from now, added to member.section.thickness_loss (%s); r = %s, b = %s",
		now, q(ls.Rate, " mm", ""), q(ls.Exponent, "", "1"))
}

// fill writes the remaining life into the result document.
func (lr *lifeRun) fill(d *report.Document) {
	if lr == nil {
		return
	}
	for _, p := range lr.res.Points {
		d.Life = append(d.Life, report.LifePoint{Year: p.Year, Beta: report.Index(p.Beta), Pf: p.Pf, PfCoV: report.Index(p.CoV),
			PfCumulative: p.PfCumulative, BetaCumulative: report.Index(p.BetaCumulative), PfCumulativeCoV: report.Index(p.CoVCumulative)})
	}
	b := lr.basis
	if b.TargetBeta != nil && b.Resolved && lr.crossing.Year > 0 {
		y := lr.crossing.Year
		d.LifeEnd = &y
	}
	d.LifeBasis = &b
}

// lifeCheckText shows in check what [life] will compute: the loss law,
// the nominal loss and capacity now and at the horizon, the annual
// maxima of the variable loads and the annual target.
func lifeCheckText(l *Loaded) string {
	st, md := l.Study, l.Model
	ls := st.Life
	if ls == nil {
		return ""
	}
	var b strings.Builder
	y := float64(ls.Years)
	fmt.Fprintf(&b, "\nRemaining life under corrosion ([life], computed by `strutrisk run`): %d years, evaluated every %s, %d member paths\n", ls.Years, stepText(ls.Step), ls.Paths)
	fmt.Fprintf(&b, "  loss law: %s\n", lossLaw(st))
	fmt.Fprintf(&b, "  nominal loss from every face: %.2f mm now, %.2f mm in year %d\n", md.LifeLoss(0), md.LifeLoss(y), ls.Years)
	now, _ := md.LifeCapacity(0)
	end, _ := md.LifeCapacity(y)
	fmt.Fprintf(&b, "  nominal capacity: %.1f kN now, %.1f kN in year %d\n", now/1e3, end/1e3, ls.Years)
	for _, a := range ls.Annual {
		fmt.Fprintf(&b, "  annual maxima of %s: %s (N; %s)\n", a.Path, a.Dist, a.Basis)
	}
	for _, w := range md.LifeWarnings() {
		fmt.Fprintf(&b, "  warning: %s\n", w)
	}
	if t, src, ok := annualTarget(st); ok {
		fmt.Fprintf(&b, "  annual target beta %.2f (%s)\n", t, report.PlainGreek(src))
		fmt.Fprintf(&b, "  the life ends at %s\n", report.LifeCriterion)
	}
	return b.String()
}

// stepText writes the step: "year" or "5 years".
func stepText(n int) string {
	if n == 1 {
		return "year"
	}
	return fmt.Sprintf("%d years", n)
}
