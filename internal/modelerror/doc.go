// Package modelerror estimates the uncertainty of a resistance model from
// tests, as EN 1990:2002 Annex D, D.8 ("standard evaluation procedure",
// method (a)) sets out: the theoretical resistance r_t of each test from
// the model at the test's measured values, the mean-value correction b,
// the coefficient of variation V_delta of the error term, and the model
// factor that follows, a lognormal variable with mean b and coefficient of
// variation V_delta, ready to be written as a study's model_factor. With
// the coefficient of variation of the basic variables V_rt it also gives
// the characteristic and design values of D.8.2.2 step 7 and D.8.3.
//
// The procedure assumes the resistance function holds for every test, the
// tests cover the range of the variables the model is used for, and the
// error term is lognormal; D.8 asks the evaluator to check the r_e - r_t
// picture for these before the numbers are used.
package modelerror
