//go:build race

package column

// bcRace is set when the race detector is on: it makes sync.Pool drop
// items at random, so allocation counts are not meaningful.
const bcRace = true
