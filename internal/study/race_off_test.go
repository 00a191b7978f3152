//go:build !race

package study

// raceOn is set when the race detector is on.
const raceOn = false
