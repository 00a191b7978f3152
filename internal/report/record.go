package report

// Record is the filing head of a report ([record] of the study): every
// field is text as the study wrote it; an empty field was not given and
// is left out of the JSON.
type Record struct {
	Project    string `json:"project,omitempty"`
	Member     string `json:"member,omitempty"`
	PreparedBy string `json:"prepared_by,omitempty"`
	CheckedBy  string `json:"checked_by,omitempty"`
	Date       string `json:"date,omitempty"`
	Revision   string `json:"revision,omitempty"`
	Notes      string `json:"notes,omitempty"`
}

// RecordRows returns the given fields of r in the order of the study
// file, labelled for people; nil when r is nil or empty.
func RecordRows(r *Record) []KV {
	if r == nil {
		return nil
	}
	var rows []KV
	for _, f := range []KV{
		{"project", r.Project}, {"member", r.Member}, {"prepared by", r.PreparedBy},
		{"checked by", r.CheckedBy}, {"date", r.Date}, {"revision", r.Revision}, {"notes", r.Notes},
	} {
		if f.Value != "" {
			rows = append(rows, f)
		}
	}
	return rows
}
