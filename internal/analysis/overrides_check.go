package analysis

import (
	"fmt"

	"strutrisk/internal/study"
	"strutrisk/sim"
)

// CheckFlags says what is wrong with overrides given on the command line,
// set naming the flags given (by their names "method", "samples" and
// "workers"): a method that is not one, a budget or a number of workers
// out of range. The error names the flag.
func (o Overrides) CheckFlags(set map[string]bool) error {
	if set["method"] {
		if _, err := sim.ParseMethod(string(o.Method)); err != nil {
			return fmt.Errorf("--method: %v", err)
		}
	}
	if set["samples"] && (o.Samples < 1 || o.Samples > study.MaxSamples) {
		return fmt.Errorf("--samples %d must be between 1 and %s", o.Samples, study.MaxSamplesText)
	}
	if set["workers"] && (o.Workers < 1 || o.Workers > MaxWorkers()) {
		return fmt.Errorf("--workers %d must be between 1 and %d (16 per core, at least 64; results do not depend on it)", o.Workers, MaxWorkers())
	}
	return nil
}
