package study

import (
	"slices"
	"strings"
	"testing"

	"strutrisk/internal/column"
)

// TestModelRegistry checks that the key table, the default and the
// lookup read the one registry of capacity models, and that every key a
// model takes is a row of [capacity] in the key table.
func TestModelRegistry(t *testing.T) {
	names := modelNames()
	if got := choicesOf("capacity", "model"); !slices.Equal(got, names) {
		t.Errorf("capacity.model choices %v, registry %v", got, names)
	}
	if k, _ := keyInfo("capacity", "model"); k.Default != defaultModel.String() {
		t.Errorf("capacity.model default %q, registry's %q", k.Default, defaultModel)
	}
	seen := map[string]bool{}
	for _, m := range capacityModels {
		if seen[m.String()] {
			t.Errorf("model %q is registered twice", m)
		}
		seen[m.String()] = true
		if modelNamed(m.String()) != m {
			t.Errorf("modelNamed(%q) = %v", m, modelNamed(m.String()))
		}
		for _, k := range m.keys() {
			if _, ok := keyInfo("capacity", k); !ok {
				t.Errorf("model %q takes capacity.%s, which the key table lacks", m, k)
			}
		}
	}
	if modelNamed("euler") != nil {
		t.Error("modelNamed finds a model that is not registered")
	}
	if st := parse(t, base); st.Model != defaultModel {
		t.Errorf("a study without capacity.model has model %q, want %q", st.Model, defaultModel)
	}
}

// TestModelOptionsTyped checks that the beam-column's options are read
// into their types, with the defaults of the key table.
func TestModelOptionsTyped(t *testing.T) {
	for _, c := range []struct {
		capacity string
		limit    column.BeamLimit
		residual column.Residual
	}{
		{"model = \"beam-column\"\n", column.FirstYieldLimit, column.ResidualNone},
		{"model = \"beam-column\"\nlimit = \"ultimate\"\n", column.UltimateLimit, column.ResidualNone},
		{"model = \"beam-column\"\nlimit = \"ultimate\"\nresidual_stress = \"cold-formed\"\n", column.UltimateLimit, column.ResidualColdFormed},
	} {
		st := parse(t, base+"[capacity]\n"+c.capacity)
		if st.Limit != c.limit || st.Residual != c.residual {
			t.Errorf("%q: limit %v, residual %v; want %v, %v", c.capacity, st.Limit, st.Residual, c.limit, c.residual)
		}
		if tr := st.ModelTraits(); tr.Options != c.limit.String() || !tr.Expensive || tr.Ultimate != (c.limit == column.UltimateLimit) {
			t.Errorf("%q: traits %+v", c.capacity, tr)
		}
	}
}

// TestModelKeysRefused checks that a key of one model given to another is
// refused at its line, and that the beam-column's own checks hold.
func TestModelKeysRefused(t *testing.T) {
	for _, c := range []struct {
		capacity, want string
	}{
		{"model = \"secant\"\nlimit = \"ultimate\"\n", `t.toml:16: capacity.limit: limit applies to model = "beam-column" only (the model is "secant")`},
		{"model = \"curve\"\ncurve = \"b\"\nprofile = [0, 1, 0]\n", `t.toml:17: capacity.profile: profile applies to model = "beam-column" only (the model is "curve")`},
		{"residual_stress = \"welded\"\n", `t.toml:15: capacity.residual_stress: residual_stress applies to model = "beam-column" only (the model is "perry-robertson")`},
		{"model = \"beam-column\"\nresidual_stress = \"welded\"\n", `t.toml:16: capacity.residual_stress: residual stresses act only with limit = "ultimate"`},
		{"model = \"secant\"\ncurve = \"b\"\n", `t.toml:16: capacity.curve: curve applies to model = "curve" or imperfection = "equivalent" only (the model is "secant")`},
	} {
		text := strings.Replace(base, "[loads]", "[capacity]\n"+c.capacity+"[loads]", 1)
		text = strings.Replace(text, "bow = \"L/1000\"", "bow = \"L/1000\"\neccentricity = 5", 1)
		_, err := Parse("t.toml", []byte(text))
		if err == nil || !strings.Contains(err.Error(), c.want) {
			t.Errorf("%q: error %v, want %q", c.capacity, err, c.want)
		}
	}
}
