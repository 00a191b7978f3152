package study

import (
	"strings"
	"testing"
)

// TestRecord: [record] is read field by field, a TOML date is written back
// as YYYY-MM-DD, and the file is kept byte for byte beside its digest.
func TestRecord(t *testing.T) {
	text := base + `[record]
project = "Warehouse B, refurbishment"
member = "column C4, grid B/3"
prepared_by = "A. Engineer"
checked_by = "B. Checker"
date = 2026-12-05
revision = "B"
notes = "Loads from the 2019 survey."
`
	st := parse(t, text)
	want := Record{Project: "Warehouse B, refurbishment", Member: "column C4, grid B/3", PreparedBy: "A. Engineer",
		CheckedBy: "B. Checker", Date: "2026-12-05", Revision: "B", Notes: "Loads from the 2019 survey."}
	if st.Record != want {
		t.Errorf("record %+v, want %+v", st.Record, want)
	}
	if string(st.Data) != text {
		t.Errorf("Data is not the file as read")
	}
	if st := parse(t, base); !st.Record.Empty() {
		t.Errorf("no [record]: record %+v, want empty", st.Record)
	}
	if st := parse(t, base+"[record]\ndate = \"5 Dec 2026\"\n"); st.Record.Date != "5 Dec 2026" {
		t.Errorf("date as text: %q", st.Record.Date)
	}
}

// TestRecordProblems: a wrong type, an unknown key and a control
// character each name the key and its line.
func TestRecordProblems(t *testing.T) {
	for _, c := range []struct{ add, want string }{
		{"[record]\nrevision = 2\n", "t.toml:16: record.revision: must be text in quotes, not int64"},
		{"[record]\nchecked = \"B\"\n", "t.toml:16: record.checked: unknown key in [record]; did you mean record.checked_by?"},
		{"[record]\nnotes = \"a\\u001b[2Jb\"\n", "t.toml:16: record.notes: the text contains the control character U+001B (ESC (a terminal escape))"},
		{"[record]\nnotes = \"a\\nb\"\n", "record.notes: the text contains the control character U+000A (a line break)"},
	} {
		_, err := Parse("t.toml", []byte(base+c.add))
		if err == nil || !strings.Contains(err.Error(), c.want) {
			t.Errorf("%q: error %v, want one containing %q", c.add, err, c.want)
		}
	}
}
