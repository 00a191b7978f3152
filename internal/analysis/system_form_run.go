package analysis

import (
	"context"
	"fmt"
	"math"
	"strings"

	"strutrisk/internal/report"
	"strutrisk/sim"
)

// addFormSystem adds the first-order system (linearSystem) to the
// inventory's system, whose joint sample is already in ir.doc.System, and
// names the headline estimate: the joint sample when one of its samples
// failed, else FORM, then an approximation that no sample checked.
// ir.doc.Members are still in the order of sys. A shard of a split run
// only notes its members' FORM results (shardForms).
func (ir *inventoryRun) addFormSystem(ctx context.Context, sys []systemMember, nShared int, s *sim.Settings) error {
	forms, err := shardForms(ctx, sys, memberFORM(s.FORM, nil), s)
	if err != nil || s.Shard.Splits() {
		return err // a shard notes its members' FORM; the merge combines
	}
	d := ir.doc.System
	n := len(sys)
	if d == nil || len(ir.doc.Members) < n {
		return fmt.Errorf("the first-order system needs every member's result")
	}
	names, pf, hi := make([]string, n), make([]float64, n), make([]float64, n)
	for i, m := range ir.doc.Members[:n] {
		names[i], pf[i], hi[i] = m.Name, m.Pf, m.PfCI[1]
	}
	f := linearSystem(sys, forms, nShared, names, pf, hi, MemberSeed(s.Seed, -2), s.Workers)
	if ctx.Err() != nil || math.IsNaN(f.Pf) {
		ir.warnings = append(ir.warnings, "inventory: no first-order system pf: FORM of the members did not finish")
		return nil
	}
	b := report.Index(sim.BetaFromPf(f.Pf))
	d.FormPf, d.FormBeta, d.FormPfError, d.FormMethod = &f.Pf, &b, &f.Err, f.describe()
	if len(f.Equivalent) > 0 {
		ir.warnings = append(ir.warnings, fmt.Sprintf("inventory: first-order system: %s have several design points, each combined into one equivalent plane", listNames(f.Equivalent)))
	}
	if len(f.Fallback) > 0 {
		ir.warnings = append(ir.warnings, fmt.Sprintf("inventory: first-order system: FORM did not converge for %s; taken as independent of the other members with their sampled pf", listNames(f.Fallback)))
	}
	if w := f.errorWarning(); w != "" {
		ir.warnings = append(ir.warnings, "inventory: "+w)
	}
	var w string
	d.Headline, w = systemHeadline(d, f.Pf)
	if w != "" {
		ir.warnings = append(ir.warnings, "inventory: "+w)
	}
	return nil
}

// systemHeadline names the estimate of the system d to read, given the
// first-order pf, with a warning when there is something to say: the
// joint sample when one of its samples failed (a first-order pf outside
// its 95 % interval is warned of); when none did, FORM, an approximation
// no failing sample checks, unless it lies above the sample's 95 % bound,
// which then stands.
func systemHeadline(d *report.System, formPf float64) (string, string) {
	beta := sim.BetaFromPf(formPf)
	switch {
	case d.Samples > 0 && d.Status != "no failures" && d.Status != "no samples":
		if formPf < d.PfCI[0] || formPf > d.PfCI[1] {
			return "joint sampling", fmt.Sprintf("the system pf by FORM, %.3g, is outside the joint sample's 95 %% interval [%.3g, %.3g]: some member's margin is not near linear at its design point; the sampled pf stands", formPf, d.PfCI[0], d.PfCI[1])
		}
		return "joint sampling", ""
	case d.Status == "no failures" && formPf > d.PfCI[1]:
		return "joint sampling", fmt.Sprintf("the system pf by FORM, %.3g (beta %.2f), is above the 95 %% bound %.3g of the joint sample, in which no member failed: some member's margin is not near linear at its design point; the bound stands, and neither is a verdict", formPf, beta, d.PfCI[1])
	}
	return "form", fmt.Sprintf("the system pf by FORM is %.3g (beta %.2f), an approximation that no failing joint sample checks: not a verdict", formPf, beta)
}

// listNames quotes up to five names and counts the rest.
func listNames(names []string) string {
	q := make([]string, 0, 6)
	for i, n := range names {
		if i == 5 {
			q = append(q, fmt.Sprintf("%d more", len(names)-5))
			break
		}
		q = append(q, fmt.Sprintf("%q", n))
	}
	return "member(s) " + strings.Join(q, ", ")
}

// errorWarning warns when the integration's error is above 1 % of the
// first-order pf (members whose margins are nearly all shared inputs
// make the integrand over one shared normal a step).
func (f *seriesIntegral) errorWarning() string {
	if !(f.Err > 0.01*f.Pf) {
		return ""
	}
	return fmt.Sprintf("the first-order system pf %.3g carries an integration error of %.2g (%.2g %% of it): read it to that precision", f.Pf, f.Err, 100*f.Err/f.Pf)
}
