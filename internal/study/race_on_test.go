//go:build race

package study

// raceOn is set when the race detector is on: it slows the numerical
// beam-column about fifteen times, so the longest searches are left to the
// plain test run.
const raceOn = true
