package analysis

import (
	"context"
	"fmt"
)

// MarkInterrupted records in r.Incomplete why the run is not complete
// when a signal stopped it: its main run cut short, or ctx cancelled
// during the step phase after it ("" when no step was under way). signal
// names what stopped it ("SIGINT"). A complete run is left as it is. It
// returns r.Incomplete.
func (r *Result) MarkInterrupted(ctx context.Context, signal, phase string) string {
	switch {
	case r.Estimate.Incomplete:
		r.Incomplete = fmt.Sprintf("interrupted by %s after %d evaluations of the main run: the estimate is from the samples finished; the sensitivities, the reserve factor and any sweep or variant cases were not run", signal, r.Estimate.Evaluations)
	case ctx.Err() != nil:
		if phase == "" {
			phase = "the steps after the main run"
		}
		r.Incomplete = fmt.Sprintf("interrupted by %s during %s: the main estimate is complete; what had not finished then (sensitivities, reserve factor, sweep or variant cases) is missing", signal, phase)
	}
	return r.Incomplete
}
