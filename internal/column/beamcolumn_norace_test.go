//go:build !race

package column

// bcRace is set when the race detector is on (see beamcolumn_race_test.go).
const bcRace = false
