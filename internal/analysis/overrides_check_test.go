package analysis

import (
	"strconv"
	"strings"
	"testing"
)

// TestCheckFlags: only flags given are checked; each bad one is named
// with its bounds (the budget's 1e10 is study.MaxSamples, the largest
// number of workers 16 per core and at least 64).
func TestCheckFlags(t *testing.T) {
	all := map[string]bool{"method": true, "samples": true, "workers": true}
	for _, c := range []struct {
		o    Overrides
		set  map[string]bool
		want string // "" no error
	}{
		{Overrides{Method: "form", Samples: 1, Workers: 1}, all, ""},
		{Overrides{Method: "monte-carlo", Samples: 1e10, Workers: MaxWorkers()}, all, ""},
		{Overrides{}, nil, ""}, // nothing given: the study's own
		{Overrides{Method: "magic"}, map[string]bool{"method": true}, `--method: unknown method "magic"`},
		{Overrides{Method: ""}, map[string]bool{"method": true}, `--method: unknown method ""`},
		{Overrides{Samples: 0}, map[string]bool{"samples": true}, "--samples 0 must be between 1 and 1e10"},
		{Overrides{Samples: 1e10 + 1}, map[string]bool{"samples": true}, "--samples 10000000001 must be between 1 and"},
		{Overrides{Workers: 0}, map[string]bool{"workers": true}, "--workers 0 must be between 1 and " + strconv.Itoa(MaxWorkers())},
		{Overrides{Workers: MaxWorkers() + 1}, map[string]bool{"workers": true}, "must be between 1 and " + strconv.Itoa(MaxWorkers())},
	} {
		err := c.o.CheckFlags(c.set)
		if c.want == "" && err != nil || c.want != "" && (err == nil || !strings.Contains(err.Error(), c.want)) {
			t.Errorf("%+v %v: %v, want %q", c.o, c.set, err, c.want)
		}
	}
	if MaxWorkers() < 64 {
		t.Errorf("MaxWorkers %d, below 64", MaxWorkers())
	}
}
