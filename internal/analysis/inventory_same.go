package analysis

import (
	"context"
	"strconv"
	"strings"
	"sync"

	"strutrisk/internal/study"
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

// sameMembers remembers the reserve factor of each member study found,
// by memberKey, so that a member equal to an earlier one (a building has
// many alike) takes its factor instead of searching it again: the search
// depends on the member's model and FORM result alone, not on its seed,
// so the factor is the one the search would find, whatever the order in
// which members run. Safe for concurrent use.
type sameMembers struct {
	mu      sync.Mutex
	reserve map[string]memberReserveResult
	found   int // searches run (for the tests)
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
