package modelerror_test

import (
	"fmt"

	"strutrisk/internal/modelerror"
)

// Five tests against a model: the mean-value correction, the scatter of
// the error term and the model factor line for a study.
func ExampleEvaluate() {
	measured := []float64{212e3, 187e3, 254e3, 231e3, 199e3}
	theory := []float64{200e3, 180e3, 240e3, 215e3, 190e3}
	f, err := modelerror.Evaluate(measured, theory)
	if err != nil {
		fmt.Println(err)
		return
	}
	fmt.Printf("b = %.4f, V_delta = %.4f\n", f.B, f.V)
	fmt.Println(f.ModelFactor())
	// Output:
	// b = 1.0573, V_delta = 0.0128
	// model_factor = { dist = "lognormal", mean = 1.057, cov = 0.01277 }
}
