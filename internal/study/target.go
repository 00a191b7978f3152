package study

import (
	"fmt"
	"strings"
)

// permanentNames are the load names taken as permanent when [target] has
// no permanent key: the self-weight of the structure and what is fixed to
// it. Every other load is variable.
var permanentNames = []string{"dead", "permanent", "self_weight", "superimposed_dead"}

// reserve reads the keys of [target] that say what the reserve factor
// multiplies:
//
//	reserve_on       = "variable"        # or "all"
//	permanent        = ["dead"]          # the permanent loads (names in [loads])
//
// With reserve_on = "variable" (the default) the reserve factor multiplies
// every load that is not permanent. Without a permanent key, the loads
// named dead, permanent, self_weight or superimposed_dead are permanent.
func (p *parser) reserve(t *table) {
	st := p.st
	defaulted := false
	if on, ok := p.choice(t, "reserve_on", choicesOf("target", "reserve_on")); ok {
		st.ReserveOn = on
	} else if _, given := t.m["reserve_on"]; !given {
		st.ReserveOn, defaulted = "variable", true
	} else {
		return
	}
	loads := map[string]*Quantity{}
	var names []string
	for _, q := range st.Loads {
		n := strings.TrimPrefix(q.Path, "loads.")
		loads[n] = q
		names = append(names, n)
	}
	perm := map[string]bool{}
	if v, ok := t.get("permanent"); ok {
		list, isList := v.([]any)
		if !isList {
			p.errorf(t.key("permanent"), "permanent is a list of load names, e.g. [\"dead\"] (or [] when every load is variable)")
			return
		}
		for i, x := range list {
			at := fmt.Sprintf("%s[%d]", t.key("permanent"), i)
			s, _ := x.(string)
			s = strings.TrimPrefix(s, "loads.")
			if loads[s] == nil {
				if near, ok := nearest(s, names); ok {
					p.errorf(at, "%v is not a load of this study; did you mean %q?", x, near)
				} else {
					p.errorf(at, "%v is not a load of this study (the loads are %s)", x, strings.Join(names, ", "))
				}
				continue
			}
			perm[s] = true
		}
	} else {
		for _, n := range permanentNames {
			if loads[n] != nil {
				perm[n] = true
			}
		}
		if st.ReserveOn == "variable" {
			var list []string
			for _, n := range names {
				if perm[n] {
					list = append(list, "loads."+n)
				}
			}
			what := "no load is taken as permanent"
			if len(list) > 0 {
				what = strings.Join(list, ", ") + " taken as permanent"
			}
			p.defaultf("target.permanent: not given; %s (loads named %s are permanent, every other load variable)", what, strings.Join(permanentNames, ", "))
		}
	}
	for _, n := range names {
		if perm[n] {
			st.PermanentLoads = append(st.PermanentLoads, "loads."+n)
		}
	}
	allPermanent := len(names) > 0 && len(st.PermanentLoads) == len(names)
	_, listed := t.m["permanent"]
	switch {
	case defaulted && allPermanent && !listed:
		// A study whose loads all carry permanent names (a lone "dead"
		// load) is valid as it stands: the factor multiplies them all.
		st.ReserveOn = "all"
		p.defaultf("target.reserve_on: not given; every load is permanent, so the reserve factor multiplies all of them")
	case st.ReserveOn == "variable" && allPermanent:
		p.errorf(t.key("reserve_on"), "every load is permanent, so a factor on the variable loads has nothing to multiply: set reserve_on = \"all\" or list fewer permanent loads")
	case defaulted:
		p.defaultf("target.reserve_on: not given; the reserve factor multiplies the variable loads (every load but the permanent ones)")
	}
}

// ReserveLoads returns the loads the reserve factor multiplies.
func (s *Study) ReserveLoads() []*Quantity {
	perm := map[string]bool{}
	for _, n := range s.PermanentLoads {
		perm[n] = true
	}
	var out []*Quantity
	for _, q := range s.Loads {
		if s.ReserveOn == "all" || !perm[q.Path] {
			out = append(out, q)
		}
	}
	if c := s.Combination; c != nil {
		// The companions of the combination cases and the combined load
		// are variable loads too.
		if c.Combined != nil {
			out = append(out, c.Combined)
		}
		for _, cs := range c.Cases {
			for _, q := range cs.Loads {
				if c.owns(q) {
					out = append(out, q)
				}
			}
		}
	}
	return out
}
