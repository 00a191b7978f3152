package study

// feed is the place of one random input in the fields of an evaluation:
// x[src] is stored in v[field] (or added to it, for a load).
type feed struct{ field, src int32 }

// feeds are the bindings flattened once by Build, so that a sample sets
// its inputs in two plain loops without a slice per variable: the fields
// a variable sets, then those the loads add to, in the order of the
// bindings (the loads add up in it). No field is both set and added to:
// the loads' fields are theirs alone.
type feeds struct{ set, add []feed }

// feedsOf flattens binds, leaving out the variable skip (-1: none).
func feedsOf(binds []binding, skip int) feeds {
	var fs feeds
	for i, b := range binds {
		if i == skip {
			continue
		}
		for _, f := range b.fields {
			if b.add {
				fs.add = append(fs.add, feed{int32(f), int32(i)})
			} else {
				fs.set = append(fs.set, feed{int32(f), int32(i)})
			}
		}
	}
	return fs
}

// fill puts the random inputs x into v, as set does for each binding.
func (fs *feeds) fill(v *values, x []float64) {
	for _, f := range fs.set {
		v[f.field] = x[f.src]
	}
	for _, f := range fs.add {
		v[f.field] += x[f.src]
	}
}
