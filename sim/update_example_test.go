package sim_test

import (
	"fmt"
	"log"

	"strutrisk/sim"
)

// ExampleUpdateLognormal updates the prior of a yield strength with five
// coupon results (invented values, MPa) and reads the characteristic value,
// the 5% fractile of the predictive distribution (EN 1990:2002 Annex D, D.7).
func ExampleUpdateLognormal() {
	// Prior: lognormal with mean 400 MPa and CoV 0.07, worth 3 tests for
	// the mean and 3 degrees of freedom for the spread.
	prior := sim.PriorFromLognormal(400, 0.07, 3, 3)
	before, err := prior.Predictive()
	if err != nil {
		log.Fatal(err)
	}
	coupons := []float64{372, 389, 401, 365, 394}
	post, err := sim.UpdateLognormal(prior, coupons)
	if err != nil {
		log.Fatal(err)
	}
	fmt.Printf("prior:   5%% fractile %.0f MPa\n", before.Quantile(0.05))
	fmt.Printf("updated: mean %.0f MPa, 5%% fractile %.0f MPa (nu'' = %.0f)\n",
		post.MeanEstimate(), post.Fractile(0.05), post.Nu)

	// Vague prior: the classical EN 1990 D.7 characteristic value.
	vague, err := sim.UpdateLognormal(sim.Prior{}, coupons)
	if err != nil {
		log.Fatal(err)
	}
	fmt.Printf("vague:   5%% fractile %.0f MPa\n", vague.Fractile(0.05))
	// Output:
	// prior:   5% fractile 330 MPa
	// updated: mean 390 MPa, 5% fractile 350 MPa (nu'' = 8)
	// vague:   5% fractile 350 MPa
}
