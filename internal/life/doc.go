// Package life estimates the reliability of a member over its remaining
// life, when its resistance falls with time (corrosion) and it meets a new
// maximum of its variable loads every year.
//
// The resistance is the same random member in every year: each sampled
// path (one draw of every input that does not change from year to year:
// strength, geometry, the loss law, permanent loads, model factors) is
// followed through the years, and failures in different years of one path
// are not independent. Given a path, the years are independent through
// the annual maxima of the variable loads, so the probability that the
// path survives years 1 to t is the product of the probabilities that it
// survives each year. That probability is computed exactly from the CDF of
// one variable load's annual maximum (conditional sampling); the annual
// maxima of any further variable loads are sampled year by year. The
// estimates are the averages over the paths.
//
// It knows nothing of study files, sections or reports: a Problem gives
// the inputs and the limit state of one year.
package life
