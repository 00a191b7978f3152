package report

import (
	"encoding/json"
	"math"
	"strings"
	"testing"
)

// TestMemberJSONNaN checks that a member without a pf encodes, pf null in
// its place, and reads back as NaN; and that a member with one keeps its
// fields' order and value.
func TestMemberJSONNaN(t *testing.T) {
	for _, c := range []struct {
		m    Member
		want string
	}{
		{Member{Name: `odd "pf":0,"pf_ci": name`, Pf: math.NaN(), Beta: Index(math.NaN()), Error: "interrupted"},
			`{"name":"odd \"pf\":0,\"pf_ci\": name","line":0,"pf":null,"pf_ci":[0,0],`},
		{Member{Name: "C1", Line: 3, Pf: 1.5e-4}, `{"name":"C1","line":3,"pf":0.00015,"pf_ci":[0,0],`},
	} {
		data, err := json.Marshal(c.m)
		if err != nil {
			t.Fatal(err)
		}
		if !strings.HasPrefix(string(data), c.want) {
			t.Errorf("got %s, want it to begin %s", data, c.want)
		}
		var back Member
		if err := json.Unmarshal(data, &back); err != nil {
			t.Fatal(err)
		}
		if back.Name != c.m.Name || math.Float64bits(back.Pf) != math.Float64bits(c.m.Pf) && !(math.IsNaN(back.Pf) && math.IsNaN(c.m.Pf)) {
			t.Errorf("read back %+v, wrote %+v", back, c.m)
		}
	}
}
