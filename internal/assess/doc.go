// Package assess holds what the assessment of a member adds to a
// reliability result: target reliability indices by consequence class or
// by the relative cost of safety, their conversion between reference
// periods, and design values and partial factors from a FORM design point.
// It knows nothing of study files or reports.
package assess
