// Package study reads a strutrisk study file (TOML), checks it and builds
// the reliability model of the column it describes.
//
// Every numeric input of a study is a quantity: a bare number in the
// study's unit system, a number with a unit ("5.2 m"), a length relative to
// the member length ("L/1000", imperfections only) or a distribution table
// ({ dist = "lognormal", mean = "205 GPa", cov = 0.03 }). Load converts all
// of them to N, mm and MPa, checks the whole file and reports every problem
// it finds at once, each naming the key, its line and what to do. Build
// turns a checked Study into a sim.Model whose limit state is
//
//	g = (model factor x capacity) - (effect factor x sum of loads)
//
// and Nominal gives the deterministic picture at nominal values.
package study
