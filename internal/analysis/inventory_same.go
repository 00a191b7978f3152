package analysis

import (
	"context"
	"strconv"
	"strings"
	"sync"

	"strutrisk/internal/study"
	"strutrisk/sim"
)

// memberKey is the identity of a member's own study: the keys its row
// sets and their values, in the order of the file's columns. Rows equal
// in it (differing in name and in the columns that group shared inputs
// only) are the same study: the same model, the same FORM results.
func memberKey(m *study.Member) string {
	var b strings.Builder
	for _, s := range m.Sets {
		b.WriteString(s.Key)
		switch v := s.Value.(type) {
		case float64:
			b.WriteString("=f:")
			b.WriteString(strconv.FormatFloat(v, 'g', -1, 64))
		case string:
			b.WriteString("=s:")
			b.WriteString(strconv.Quote(v))
		default:
			return "" // not a value a row gives: no identity
		}
		b.WriteByte(0)
	}
	return b.String()
}

// sameMembers remembers, by memberKey, the estimate and the reserve
// factor of each member study found, so that a member equal to an
// earlier one (a building has many alike) takes them instead of running
// again. A member's estimate is drawn with the seed of the first row of
// the file with its key (seedRow), so it is the same whichever of the
// equal rows runs it, in whatever order, on whatever machine; the
// reserve search depends on the member's model and FORM result alone.
// Safe for concurrent use.
type sameMembers struct {
	first    map[string]int // the first row of each key
	mu       sync.Mutex
	estimate map[string]*memberEstimate
	reserve  map[string]memberReserveResult
	found    int // searches run (for the tests)
	runs     int // estimates run (for the tests)
}

// newSameMembers returns the memory of the members of inv, nil when inv
// is nil.
func newSameMembers(inv *study.Inventory) *sameMembers {
	if inv == nil {
		return nil
	}
	s := &sameMembers{first: map[string]int{}}
	for i := range inv.Members {
		if k := memberKey(&inv.Members[i]); k != "" {
			if _, ok := s.first[k]; !ok {
				s.first[k] = i
			}
		}
	}
	return s
}

// seedRow is the row whose MemberSeed member i of inv draws with: the
// first row of the file with its key (key, memberKey of row i), i itself
// when it has none. s may be nil: the rows of inv are searched.
func (s *sameMembers) seedRow(inv *study.Inventory, i int, key string) int {
	if key == "" {
		return i
	}
	if s != nil {
		if f, ok := s.first[key]; ok {
			return f
		}
		return i
	}
	for j := range i {
		if memberKey(&inv.Members[j]) == key {
			return j
		}
	}
	return i
}

// memberEstimate is the estimate of a member study, run once.
type memberEstimate struct {
	once sync.Once
	res  *sim.Result
	err  error
}

// estimateOf returns the estimate of the member study key, from run the
// first time it is asked for (a second caller with the same key waits
// for it); an empty key runs every time. The result is shared: read it,
// do not change it. s may be nil: no memory.
func (s *sameMembers) estimateOf(key string, run func() (*sim.Result, error)) (*sim.Result, error) {
	if s == nil || key == "" {
		return run()
	}
	s.mu.Lock()
	if s.estimate == nil {
		s.estimate = map[string]*memberEstimate{}
	}
	e := s.estimate[key]
	if e == nil {
		e = &memberEstimate{}
		s.estimate[key] = e
	}
	s.mu.Unlock()
	e.once.Do(func() {
		e.res, e.err = run()
		s.mu.Lock()
		s.runs++
		s.mu.Unlock()
	})
	return e.res, e.err
}

// memberReserveResult is a member's reserve factor (nil: none) and the
// warning that says why there is none.
type memberReserveResult struct {
	factor *float64
	warn   string
}

// reserveOf returns the reserve factor of the member study key, from
// search when it has not been found before; an empty key is searched
// every time, and a search that ctx stopped is not remembered. s may be
// nil: no memory.
func (s *sameMembers) reserveOf(ctx context.Context, key string, search func() (*float64, string)) (*float64, string) {
	if s == nil || key == "" {
		return search()
	}
	s.mu.Lock()
	r, ok := s.reserve[key]
	s.mu.Unlock()
	if !ok {
		r.factor, r.warn = search()
		if ctx.Err() != nil {
			return r.factor, r.warn
		}
		s.mu.Lock()
		if s.reserve == nil {
			s.reserve = map[string]memberReserveResult{}
		}
		s.reserve[key] = r
		s.found++
		s.mu.Unlock()
	}
	if r.factor == nil {
		return nil, r.warn
	}
	f := *r.factor
	return &f, r.warn
}
