package study

import (
	"fmt"
	"strings"
)

// Variant is a named alternative of a study: keys of the study file set
// to other values.
type Variant struct {
	Name string
	// Set holds the values of the keys that are quantities of the study
	// (N, mm, MPa), by key path.
	Set map[string]*Quantity
	// Keys lists every key the variant sets, quantities or not
	// ("capacity.model"), in the order of the file.
	Keys []string

	set []override
}

func (p *parser) variants(top *table) {
	v, ok := top.get("variant")
	if !ok {
		return
	}
	list, ok := v.([]map[string]any)
	if !ok {
		p.errorf("variant", "write variants as [[variant]] tables with name and set")
		return
	}
	if len(list) > MaxCases {
		p.errorf("variant", "%d variants are more than the %d cases a study may run: split them into several studies", len(list), MaxCases)
		return
	}
	names := map[string]bool{}
	for i, m := range list {
		t := &table{path: fmt.Sprintf("variant[%d]", i), m: m, used: map[string]bool{}}
		va := Variant{Set: map[string]*Quantity{}}
		if name, ok := p.str(t, "name"); ok {
			va.Name = strings.TrimSpace(name)
			switch {
			case va.Name == "":
				p.errorf(t.key("name"), "the name is empty: give the variant a short name, e.g. \"bow L/500\"")
			case names[va.Name]:
				p.errorf(t.key("name"), "two variants are named %q: give each its own name", va.Name)
			}
			names[va.Name] = true
		} else if _, given := m["name"]; !given {
			p.required(t, "name", "a name for the variant, e.g. name = \"bow L/500\"")
		}
		if st := p.sub(t, "set"); st != nil {
			keys := sortedKeys(st.m)
			// In the order of the file.
			sortByLine(keys, func(k string) int { return p.line(st.key(k)) })
			for _, k := range keys {
				st.used[k] = true
				p.variantKey(top.m, &va, st.key(k), k, st.m[k])
			}
			if len(st.m) == 0 {
				p.errorf(st.path, "the variant sets nothing: give the keys it changes, e.g. set = { \"imperfection.bow\" = \"L/500\" }")
			}
		} else if _, given := m["set"]; !given {
			p.required(t, "set", "the keys the variant changes, e.g. set = { \"imperfection.bow\" = \"L/500\" }")
		}
		p.unknown(t)
		p.st.Variants = append(p.st.Variants, va)
	}
}

// variantKey records one key of a variant's set. Any key of the study
// file may be set; a quantity's value is read here with the quantity's
// rules, everything else when the variant is read as a study.
func (p *parser) variantKey(doc map[string]any, va *Variant, at, k string, v any) {
	va.Keys = append(va.Keys, k)
	va.set = append(va.set, override{key: k, value: v, at: at})
	if v == Unset {
		return
	}
	if q := p.byPath[k]; q != nil {
		if qq := p.quantity(at, v, p.opts[q]); qq != nil {
			va.Set[k] = qq
		}
		return
	}
	if _, inFile := pathIn(doc, k); inFile {
		return
	}
	// A new key: a near miss of an existing one is most likely a typo.
	if near, ok := nearest(k, sortedKeys(p.byPath)); ok {
		p.errorf(at, "%q is not a quantity of this study; did you mean %q?", k, near)
	}
}

// pathIn looks up a dotted key path in a decoded document.
func pathIn(doc map[string]any, path string) (any, bool) {
	var cur any = doc
	for _, part := range strings.Split(path, ".") {
		m, ok := cur.(map[string]any)
		if !ok {
			return nil, false
		}
		if cur, ok = m[part]; !ok {
			return nil, false
		}
	}
	return cur, true
}

// sortByLine orders keys by the line they are written on.
func sortByLine(keys []string, line func(string) int) {
	for i := 1; i < len(keys); i++ {
		for j := i; j > 0 && line(keys[j]) < line(keys[j-1]); j-- {
			keys[j], keys[j-1] = keys[j-1], keys[j]
		}
	}
}
