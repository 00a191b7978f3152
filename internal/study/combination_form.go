package study

import (
	"context"
	"math"

	"strutrisk/sim"
)

// CaseIndex is the first-order result of one load combination case alone.
type CaseIndex struct {
	// Case is the case's name (its leading load's), Leading that load's
	// path and Companions the paths of the other loads in the case.
	Case, Leading string
	Companions    []string
	// FORM is the case's first-order analysis, nil when it failed (Err
	// says why).
	FORM *sim.FORMResult
	Err  error
}

// Combined is the first-order picture of a load combination: each case's
// FORM analysis and their series system.
type Combined struct {
	Cases []CaseIndex
	// Governing is the index in Cases of the case with the lowest beta,
	// -1 when no case has one.
	Governing int
	// SeriesPf and SeriesBeta are the first-order failure probability of
	// the union of the cases (sim.SeriesPf on all their design points), NaN
	// when a case's FORM failed or did not converge.
	SeriesPf, SeriesBeta float64
}

// CaseIndices runs FORM on each load combination case of the study alone
// (CaseModel) with the settings fs (nil: FORMSettings) and combines the
// cases as a series system. It returns nil when the study has no
// combination.
func (md *Model) CaseIndices(ctx context.Context, fs *sim.FORMSettings) *Combined {
	c := md.Study.Combination
	if c == nil || md.cases == 0 {
		return nil
	}
	if fs == nil {
		fs = md.FORMSettings()
	}
	out := &Combined{Governing: -1, SeriesPf: math.NaN(), SeriesBeta: math.NaN()}
	var betas []float64
	var alphas [][]float64
	whole := true
	for i, cs := range c.Cases {
		ci := CaseIndex{Case: cs.Name(), Leading: cs.Leading.Path}
		for _, q := range cs.Loads {
			if q != cs.Leading {
				ci.Companions = append(ci.Companions, q.Path)
			}
		}
		m, err := md.CaseModel(i)
		if err == nil {
			ci.FORM, err = sim.FORMContext(ctx, m, fs)
		}
		ci.Err = err
		if f := ci.FORM; err == nil && f != nil {
			if out.Governing < 0 || f.Beta < out.Cases[out.Governing].FORM.Beta {
				out.Governing = i
			}
			if f.Converged && len(f.Points) > 0 {
				// Every design point of the case: a bow that acts by its
				// magnitude gives a case two mirrored points.
				for _, pt := range f.Points {
					betas = append(betas, pt.Beta)
					alphas = append(alphas, pt.Alpha)
				}
			} else {
				whole = false
			}
		} else {
			ci.FORM, whole = nil, false
		}
		out.Cases = append(out.Cases, ci)
	}
	if whole {
		out.SeriesPf = sim.SeriesPf(betas, alphas)
		out.SeriesBeta = sim.BetaFromPf(out.SeriesPf)
	}
	return out
}
