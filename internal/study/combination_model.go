package study

import (
	"fmt"

	"strutrisk/sim"
)

// demand is the load effect of one evaluation: the effect factor times
// the sum of the loads, the combined loads taken from the governing
// combination case.
func (md *Model) demand(v *values) float64 {
	return v[fEffect] * (v[fLoads] + md.caseLoad(v))
}

// caseLoad is the sum of the combined loads of the governing case (the
// largest sum: with one capacity for every case, the case with the
// smallest margin), of the one case the model takes (CaseModel), or 0
// without a combination.
func (md *Model) caseLoad(v *values) float64 {
	if md.only > 0 {
		return v[fCase0+md.only-1]
	}
	if md.cases == 0 {
		return 0
	}
	s := v[fCase0]
	for i := 1; i < md.cases; i++ {
		s = max(s, v[fCase0+i])
	}
	return s
}

// Cases returns the number of load combination cases (0 when the loads
// simply add up).
func (md *Model) Cases() int { return md.cases }

// CaseModel returns the reliability model of combination case i alone:
// the variables of md.Sim, in the same order, and the limit state of that
// case (the loads of the other cases are drawn and not used).
func (md *Model) CaseModel(i int) (*sim.Model, error) {
	if i < 0 || i >= md.cases {
		return nil, fmt.Errorf("study: no load combination case %d (the study has %d)", i, md.cases)
	}
	c := *md
	c.only = i + 1
	m := *md.Sim
	m.G = c.g
	m.Linear = nil
	c.Sim = &m
	return &m, nil
}
