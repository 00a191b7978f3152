package report_test

import (
	"fmt"

	"strutrisk/internal/report"
)

func ExampleSummaryText() {
	pf, cov, target, reserve := 1.3e-4, 0.051, 3.8, 0.93
	beta := report.Index(3.65)
	evals, seed := int64(17502), uint64(1)
	b := &report.Bundle{Doc: &report.Document{
		Title:  "Column C4",
		Method: "conditional-qmc", Evaluations: &evals, Seed: &seed,
		Pf: &pf, PfCoV: &cov, PfCI: []float64{1.18e-4, 1.44e-4},
		Beta: &beta, BetaCI: []report.Index{3.63, 3.68},
		TargetBeta: &target, ReserveFactor: &reserve,
		FORM: &report.FORM{Importance: map[string]float64{"loads.imposed": 0.62, "material.yield": 0.09, "capacity.model_factor": 0.10}},
	}}
	fmt.Print(report.SummaryText(b))
	// Output:
	// Column C4
	//   failure prob. pf   1.3e-4   95 % interval [1.18e-4, 1.44e-4]
	//   reliability beta   3.65   95 % interval [3.63, 3.68]
	//   target beta        3.80: NOT met
	//   reserve factor     0.930 (load factor at which the target is just met)
	//   method             conditional-qmc, 17502 evaluations, cov of pf 0.051, seed 1
	//   most influential   loads.imposed (0.62), capacity.model_factor (0.1), material.yield (0.09)  [by FORM importance alpha^2]
	//   rankings           FORM importance alpha^2 answers whose scatter drives failure at the most
	//                      likely failure point (what to measure).
	//
	// Caution: results depend entirely on the inputs and models stated in the
	// study. strutrisk supports, and never replaces, the judgement of a licensed
	// engineer and the codes that apply where the structure stands.
}
