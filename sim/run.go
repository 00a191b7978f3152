package sim

import (
	"context"
	"errors"
)

// Progress reports the state of a running estimate.
type Progress struct {
	// Done and Total count evaluations (Total is the budget).
	Done, Total int64
	Pf, CoV     float64
}

// Settings control Run. The zero value of each field means its default.
type Settings struct {
	// Method is the estimator; the default is Auto.
	Method Method
	// Samples is the budget of limit-state evaluations; default 1e6.
	Samples int64
	// TargetCoV stops sampling once the CoV of Pf is this small; 0 never.
	TargetCoV float64
	// Seed seeds every random stream.
	Seed uint64
	// Workers is the number of goroutines; default runtime.NumCPU().
	Workers int
	// Confidence is the level of the intervals; default 0.95.
	Confidence float64
	// Keep is the number of sample points kept in Result.Kept; default 2000.
	Keep int
	// Progress, if not nil, is called from time to time (never concurrently).
	Progress func(Progress)
}

// Run estimates the failure probability of m.
func Run(ctx context.Context, m *Model, s *Settings) (*Result, error) {
	return nil, errors.New("sim: Run is not implemented yet")
}
