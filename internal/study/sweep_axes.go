package study

import (
	"fmt"
	"strings"
)

// Grid repeats a study over several swept keys at once, each a
// [[sweep.axis]] table: every combination of their values (Combine
// "grid"), or their values taken in step (Combine "zip").
type Grid struct {
	// Axes are the swept keys in the order of the file.
	Axes []*Sweep
	// Combine is "grid" or "zip".
	Combine string
	// Points[i][a] is the index in Axes[a].Values of swept point i. In a
	// grid the last axis changes fastest.
	Points [][]int
}

// sweepAxes reads [sweep] written as [[sweep.axis]] tables.
func (p *parser) sweepAxes(t *table) {
	v, _ := t.get("axis")
	list, ok := v.([]map[string]any)
	if !ok || len(list) == 0 {
		p.errorf(t.key("axis"), "write each swept key as a [[sweep.axis]] table with parameter and values (or from, to and steps)")
		return
	}
	for _, k := range []string{"parameter", "values", "from", "to", "steps", "scale"} {
		if _, given := t.m[k]; given {
			t.used[k] = true
			p.errorf(t.key(k), "with [[sweep.axis]] tables, %s belongs in each axis table, not in [sweep]", k)
		}
	}
	combine := "grid"
	if c, ok := p.choice(t, "combine", choicesOf("sweep", "combine")); ok {
		combine = c
	}
	var axes []*Sweep
	seen := map[string]string{}
	good := true
	for i, m := range list {
		at := &table{path: fmt.Sprintf("sweep.axis[%d]", i), m: m, used: map[string]bool{}}
		sw := p.sweepOne(at)
		p.unknown(at)
		if sw == nil || len(sw.Values) == 0 {
			good = false
			continue
		}
		if prev, dup := seen[sw.Parameter]; dup {
			p.errorf(at.key("parameter"), "%q is swept in %s already: sweep each key in one axis", sw.Parameter, prev)
			good = false
		}
		seen[sw.Parameter] = at.path
		axes = append(axes, sw)
	}
	if !good {
		return
	}
	if len(axes) == 1 {
		p.st.Sweep = axes[0] // one key: the plain sweep
		return
	}
	g := &Grid{Axes: axes, Combine: combine}
	if combine == "zip" {
		g.Points = p.zipPoints(axes)
	} else {
		g.Points = p.gridPoints(t, axes)
	}
	if g.Points != nil {
		p.st.Grid = g
	}
}

// zipPoints pairs the axes' values in step; every axis must have as many.
func (p *parser) zipPoints(axes []*Sweep) [][]int {
	n := len(axes[0].Values)
	for _, sw := range axes[1:] {
		if len(sw.Values) != n {
			p.errorf(sw.countKey, "combine = \"zip\" takes the axes' values in step: %s has %d values, %s has %d; give every axis the same number (or combine = \"grid\" for every combination)",
				sw.at, len(sw.Values), axes[0].at, n)
			return nil
		}
	}
	points := make([][]int, n)
	for i := range points {
		points[i] = make([]int, len(axes))
		for a := range axes {
			points[i][a] = i
		}
	}
	return points
}

// gridPoints is every combination of the axes' values, the last axis
// changing fastest; it refuses more than MaxCases of them.
func (p *parser) gridPoints(t *table, axes []*Sweep) [][]int {
	var counts []string
	for _, sw := range axes {
		counts = append(counts, fmt.Sprint(len(sw.Values)))
	}
	n := 1
	for _, sw := range axes {
		n *= len(sw.Values) // each at most MaxCases: no overflow before the check
		if n > MaxCases {
			p.errorf(t.key("axis"), "the grid of the swept keys has more than the %d cases a study may run (%s values): sweep fewer values, or combine = \"zip\"",
				MaxCases, strings.Join(counts, " x "))
			return nil
		}
	}
	points := make([][]int, n)
	idx := make([]int, len(axes))
	for i := range points {
		points[i] = append([]int(nil), idx...)
		for a := len(axes) - 1; a >= 0; a-- {
			idx[a]++
			if idx[a] < len(axes[a].Values) {
				break
			}
			idx[a] = 0
		}
	}
	return points
}
