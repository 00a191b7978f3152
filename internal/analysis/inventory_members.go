package analysis

import (
	"context"
	"sync"

	"strutrisk/internal/progress"
	"strutrisk/internal/report"
	"strutrisk/internal/study"
	"strutrisk/sim"
)

// memberOutcome is what running one member of an inventory gives: its
// row of the document, its model (nil when it was not run), its warnings
// and the FORM result of its estimate (nil when its method ran none).
type memberOutcome struct {
	mr    report.Member
	md    *study.Model
	warns []string
	form  *sim.FORMResult
}

// runMembers runs the members of st's inventory, run(i, s) running
// member i, several at a time: on s.Workers goroutines, each member on
// one worker (its Settings.Workers 1), since a member is a short run and
// its result is the same for any worker count. The outcomes are in the
// order of the file. obs is told of each member as it starts, from the
// calling goroutine. When ctx is done no further member starts: the
// outcomes are then those of the members started, a prefix of the file.
func runMembers(ctx context.Context, st *study.Study, s *sim.Settings, obs Observer, run func(i int, s *sim.Settings) memberOutcome) []memberOutcome {
	members := st.Inventory.Members
	one := *s
	one.Workers = 1
	out := make([]memberOutcome, len(members))
	next := make(chan int)
	var wg sync.WaitGroup
	for range max(1, min(s.Workers, len(members))) {
		wg.Add(1)
		go func() {
			defer wg.Done()
			ws := one // each worker its own copy of the settings
			for i := range next {
				out[i] = run(i, &ws)
			}
		}()
	}
	started := 0
	for i, m := range members {
		if ctx.Err() != nil {
			break
		}
		obs.StartCase(i+1, len(members), "member "+progress.Clip(m.Name, 24))
		next <- i
		started++
	}
	close(next)
	wg.Wait()
	return out[:started]
}
