package report

// LoadPeriod is what a variable load's distribution describes and its
// conversion to the reference period.
type LoadPeriod struct {
	// Load is the load's path, e.g. "loads.imposed".
	Load string `json:"load"`
	// Period is as read: a duration ("1 year") or "point-in-time";
	// PeriodYears is it in years (absent for point-in-time).
	Period      string  `json:"period"`
	PeriodYears float64 `json:"period_years,omitempty"`
	// ReferenceYears is the reference period the maxima were converted
	// to, N the number of periods in it (reference / period); both absent
	// when no conversion was made.
	ReferenceYears float64 `json:"reference_period_years,omitempty"`
	N              float64 `json:"n,omitempty"`
	// Method is "gumbel max-stability" (exact) or "F^n"; absent without a
	// conversion.
	Method string `json:"method,omitempty"`
	// Written is the distribution as written, Converted the one used (the
	// maxima over the reference period); Mean and SD those of the one used
	// (N).
	Written   string  `json:"written"`
	Converted string  `json:"converted,omitempty"`
	Mean      float64 `json:"mean"`
	SD        float64 `json:"sd"`
}
