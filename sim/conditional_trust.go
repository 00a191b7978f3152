package sim

import "fmt"

// conditionalRoughCoV is the CoV of pf above which an estimate of
// conditional quasi-Monte Carlo is not trusted: twice the CoV aimed at
// (target, or autoTargetCoV when the caller set none).
//
// Where the method suits the model its error falls faster than 1/sqrt(n),
// and the budget reaches the target; a CoV still more than twice the
// target after the whole budget marks the far tail, where the conditional
// integrand is a narrow spike that few of the quasi-random points reach.
// The replicate estimates are then skewed and their spread understates
// the error (see qmcStart: even at 1024 points per replicate the 95 %
// interval missed the exact pf of a well-suited model in 6 of 80 seeds),
// so the estimate is an order of magnitude and its interval decides
// nothing.
func conditionalRoughCoV(target float64) float64 {
	if !(target > 0) {
		target = autoTargetCoV
	}
	return 2 * target
}

// flagRoughConditional marks a finished estimate of conditional
// quasi-Monte Carlo Imprecise (not trusted: no verdict may be drawn from
// it) when its CoV is above conditionalRoughCoV(target), or when it found
// no probability at all. also, when not empty, says what else was tried
// ("and importance sampling did no better").
func flagRoughConditional(r *Result, target float64, also string) {
	if r.Incomplete || r.Method != ConditionalQMC {
		return
	}
	limit := conditionalRoughCoV(target)
	if also != "" {
		also = ", " + also
	}
	switch {
	case r.Pf == 0:
		r.flag(Imprecise, fmt.Sprintf("conditional quasi-Monte Carlo found a failure probability of zero at every point%s: pf is not bounded by it and no verdict is drawn; use importance sampling or subset simulation", also))
	case r.PfCoV > limit:
		r.flag(Imprecise, fmt.Sprintf("conditional quasi-Monte Carlo ended at CoV %.2g of pf, more than twice the %.2g aimed at%s: so far in the tail few of its points reach the failure region and the spread of its replicates understates the error, so pf is only an order of magnitude and no verdict is drawn from it; raise the samples, or use importance sampling or subset simulation", r.PfCoV, limit/2, also))
	}
}
