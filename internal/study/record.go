package study

import "time"

// Record is the filing head of a study ([record]): who prepared and
// checked it, for which project and member, when and at which revision.
// Every field is text as written; an empty field was not given. The
// parser's text checks (text.go) have already refused control and
// direction-changing characters in them.
type Record struct {
	Project, Member, PreparedBy, CheckedBy, Date, Revision, Notes string
}

// Empty reports whether no field of the record was given.
func (r Record) Empty() bool { return r == Record{} }

// record reads [record]. date takes text or a TOML date (2026-12-05),
// written back as YYYY-MM-DD.
func (p *parser) record(top *table) {
	t := p.sub(top, "record")
	if t == nil {
		return
	}
	r := &p.st.Record
	for _, f := range []struct {
		key string
		to  *string
	}{
		{"project", &r.Project}, {"member", &r.Member}, {"prepared_by", &r.PreparedBy},
		{"checked_by", &r.CheckedBy}, {"revision", &r.Revision}, {"notes", &r.Notes},
	} {
		if s, ok := p.str(t, f.key); ok {
			*f.to = s
		}
	}
	if v, ok := t.get("date"); ok {
		if d, isTime := v.(time.Time); isTime {
			r.Date = dateText(d)
		} else if s, ok := p.str(t, "date"); ok {
			r.Date = s
		}
	}
	p.unknown(t)
}

// dateText writes a TOML date, date-time or local date-time as read.
func dateText(d time.Time) string {
	// The TOML decoder marks local values by the zone's name.
	switch d.Location().String() {
	case "date-local":
		return d.Format(time.DateOnly)
	case "datetime-local":
		return d.Format("2006-01-02T15:04:05")
	case "time-local":
		return d.Format(time.TimeOnly)
	}
	return d.Format(time.RFC3339)
}
