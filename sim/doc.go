// Package sim is a small structural-reliability engine: random variables and
// their parameterisations, a Gaussian-copula (Nataf) transformation, and
// estimators of the probability that a limit state g(x) is negative (Monte
// Carlo, Latin hypercube, conditional and quasi-Monte Carlo, FORM,
// importance sampling, subset simulation and an active-learning Kriging
// surrogate), with sensitivity measures. Settings holds the settings of
// each estimator (FORM, Importance, Subset, ConditionalQMC, Surrogate),
// which reach it wherever Run uses it, auto included; Methods lists the
// estimators and ParseMethod reads their names; an Observer follows a run
// from outside the algorithms.
//
// sim knows nothing of columns: a user describes a problem as a Model (named
// random variables, optional correlations and a limit-state function) and
// calls Run. Results are reproducible: the sample index space is cut into
// fixed blocks seeded from (seed, block), so a result is bit-identical for
// any number of workers.
package sim
