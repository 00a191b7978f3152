package report

import "strutrisk/internal/assess"

// Document is the result document of a study (see the study-file contract):
// all values in N, mm and MPa. Fields that only sampling produces are
// pointers or nil slices so that `check --json` leaves them out.
type Document struct {
	Title       string `json:"title"`
	ToolVersion string `json:"tool_version"`
	InputSHA256 string `json:"input_sha256"`
	Units       string `json:"units"` // always "N-mm-MPa"
	// Record is the filing head of the study ([record]); absent when the
	// study has none.
	Record *Record `json:"record,omitempty"`
	// Complete is always written: true when the command finished
	// everything it set out to do, false when a signal stopped it, and
	// then IncompleteReason says what is missing.
	Complete         bool   `json:"complete"`
	IncompleteReason string `json:"incomplete_reason,omitempty"`

	Method      string    `json:"method,omitempty"`
	Seed        *uint64   `json:"seed,omitempty"`
	Evaluations *int64    `json:"evaluations,omitempty"`
	Pf          *float64  `json:"pf,omitempty"`
	PfCI        []float64 `json:"pf_ci,omitempty"`
	PfCoV       *float64  `json:"pf_cov,omitempty"`
	// Beta and BetaCI are null when unbounded (Index).
	Beta   *Index  `json:"beta,omitempty"`
	BetaCI []Index `json:"beta_ci,omitempty"`
	// Status says how far the estimate can be trusted (the names of
	// sim.Status: "converged", "budget-spent", "few-failures",
	// "interrupted", "weights-degenerate", "design-point-unreliable",
	// "imprecise", "unsettled"); StatusReason says why when it is not
	// "converged".
	Status       string `json:"status,omitempty"`
	StatusReason string `json:"status_reason,omitempty"`
	// Trusted is false when no verdict may be drawn from the estimate.
	Trusted *bool `json:"trusted,omitempty"`

	TargetBeta    *float64 `json:"target_beta,omitempty"`
	MeetsTarget   *bool    `json:"meets_target,omitempty"`
	ReserveFactor *float64 `json:"reserve_factor,omitempty"`
	// Target details the comparison with the target (see target.go).
	Target *TargetCheck `json:"target,omitempty"`
	// Measurements are the updates of inputs from test results.
	Measurements []Measurement `json:"measurements,omitempty"`
	// LoadPeriods says, per load that gives a period, what its
	// distribution describes and how it was converted to the reference
	// period (see LoadPeriod).
	LoadPeriods []LoadPeriod `json:"load_periods,omitempty"`
	// Combination and Combinations are the load combination of two or
	// more random variable loads and its cases (combination.go).
	Combination  *Combination      `json:"combination,omitempty"`
	Combinations []CombinationCase `json:"combinations,omitempty"`

	GoverningAxis string `json:"governing_axis,omitempty"`

	// CodeCheck is the deterministic code check beside beta (codecheck.go).
	CodeCheck *CodeCheck `json:"code_check,omitempty"`

	// Life is the remaining life under corrosion ([life], life.go): one
	// point per evaluated year; LifeEnd the first year whose annual beta
	// is below the annual target, absent when the horizon is reached (or
	// sampling error leaves the year in doubt: LifeBasis.Resolved false);
	// LifeBasis how it was computed and judged.
	Life      []LifePoint `json:"life,omitempty"`
	LifeEnd   *int        `json:"life_end,omitempty"`
	LifeBasis *LifeBasis  `json:"life_basis,omitempty"`

	// Calibration is the partial-factor calibration ([calibration]):
	// the factor's value, each case's FORM beta there, the spread and
	// whether the value lies at an end of the range searched.
	Calibration *assess.Calibration `json:"calibration,omitempty"`

	Nominal  *Nominal  `json:"nominal,omitempty"`
	Capacity *Summary  `json:"capacity,omitempty"`
	Demand   *Summary  `json:"demand,omitempty"`
	FORM     *FORM     `json:"form,omitempty"`
	Tornado  []Tornado `json:"tornado,omitempty"`
	Sobol    []Sobol   `json:"sobol,omitempty"`
	Sweep    []Point   `json:"sweep,omitempty"`
	Variants []Variant `json:"variants,omitempty"`
	// Inventory holds the members of the study's inventory and their
	// series system (inventory.go).
	Inventory *Inventory `json:"inventory,omitempty"`
	// InventoryCheck is the deterministic check of every member of the
	// inventory (strutrisk check --json only; inventory_check.go).
	InventoryCheck *InventoryCheck `json:"inventory_check,omitempty"`
	Warnings       []string        `json:"warnings"`
	// SobolCapacity are the Sobol indices of the capacity (Sobol holds those
	// of the study's sensitivity output, the margin); loads have ~0 here.
	SobolCapacity []Sobol `json:"sobol_capacity,omitempty"`
}

// Nominal is the deterministic picture at nominal (mean) values.
type Nominal struct {
	Capacity            float64 `json:"capacity"`
	EulerLoad           float64 `json:"euler_load"`
	Slenderness         float64 `json:"slenderness"`
	RelativeSlenderness float64 `json:"relative_slenderness"`
	K                   float64 `json:"k"`
	Axis                string  `json:"axis"`
	// SectionClass is the governing class of the section in pure
	// compression (EN 1993-1-1 Table 5.2), 1 to 4; absent for a custom
	// section. EffectiveArea (mm2) is A_eff of a class 4 section (EN
	// 1993-1-5 4.4), else the area.
	SectionClass  int     `json:"section_class,omitempty"`
	EffectiveArea float64 `json:"effective_area"`
	// CriticalLoad is the governing elastic critical load (N) over
	// flexure about the checked axes and, with both axes checked,
	// torsional and flexural-torsional buckling; Mode names its mode
	// (flexural-major, flexural-minor, torsional, flexural-torsional).
	// EulerLoad stays the flexural load of Axis. CapacityMode is the mode
	// of the governing capacity.
	CriticalLoad float64 `json:"critical_load"`
	Mode         string  `json:"mode"`
	CapacityMode string  `json:"capacity_mode"`
	// LoadFactor is, for a study with [bending], the factor on every
	// action at which the member reaches its limit at nominal values
	// (model factor included; the margin is the factor minus one), and
	// Capacity the axial load at that factor. Absent for an axial study.
	LoadFactor float64 `json:"load_factor,omitempty"`
	// Bending is the nominal bending of a study with [bending].
	Bending *NominalBending `json:"bending,omitempty"`
}

// NominalBending is the bending at nominal values, effect factor
// included: the axis (major or minor), the end moments (N mm; the same
// sign at both ends is single curvature) and the lateral load (N/mm).
type NominalBending struct {
	Axis    string  `json:"axis"`
	Top     float64 `json:"top"`
	Bottom  float64 `json:"bottom"`
	Lateral float64 `json:"lateral"`
}

// Summary describes the sampled distribution of a quantity.
type Summary struct {
	Mean float64 `json:"mean"`
	SD   float64 `json:"sd"`
	P01  float64 `json:"p01"`
	P05  float64 `json:"p05"`
	P50  float64 `json:"p50"`
	P95  float64 `json:"p95"`
	P99  float64 `json:"p99"`
}

// FORM is the first-order reliability result.
type FORM struct {
	Beta        float64            `json:"beta"`
	Pf          float64            `json:"pf"`
	DesignPoint map[string]float64 `json:"design_point"`
	Importance  map[string]float64 `json:"importance"`
	// DesignBeta is the reliability index of the design values: the
	// target's, or FORM's own (the design point itself) without a target.
	// DesignValues, CharacteristicValues and PartialFactors are keyed by
	// the input's path (N, mm, MPa); a partial factor that is not defined
	// (a characteristic value of zero) is absent. DesignRoles says
	// "resistance" or "action", CharacteristicBasis how each
	// characteristic value was taken; DesignNote what a reader must know.
	DesignBeta           *float64           `json:"design_beta,omitempty"`
	DesignValues         map[string]float64 `json:"design_values,omitempty"`
	CharacteristicValues map[string]float64 `json:"characteristic_values,omitempty"`
	PartialFactors       map[string]float64 `json:"partial_factors,omitempty"`
	DesignRoles          map[string]string  `json:"design_roles,omitempty"`
	CharacteristicBasis  map[string]string  `json:"characteristic_basis,omitempty"`
	DesignNote           string             `json:"design_note,omitempty"`
	// Converged is false when the design-point search did not converge:
	// its importance factors then rank nothing (RankInputs). Nil when
	// unknown (taken as converged).
	Converged *bool `json:"converged,omitempty"`
}

// Tornado is one bar of a tornado chart: the output with the variable at its
// low and at its high fractile, the others at their medians.
type Tornado struct {
	Variable  string  `json:"variable"`
	LowValue  float64 `json:"low_value"`
	HighValue float64 `json:"high_value"`
	Low       float64 `json:"low"`
	High      float64 `json:"high"`
}

// Sobol holds the first-order and total Sobol indices of one variable with
// their bootstrap intervals.
type Sobol struct {
	Variable string     `json:"variable"`
	First    float64    `json:"first"`
	Total    float64    `json:"total"`
	FirstCI  [2]float64 `json:"first_ci"`
	TotalCI  [2]float64 `json:"total_ci"`
}

// Point is one row of a sweep. With several swept keys Values holds each
// key's value (key path to value, in the unit of its axis) and Value is
// that of the first key.
type Point struct {
	Value  float64            `json:"value"`
	Values map[string]float64 `json:"values,omitempty"`
	// Doubtful is set when the engine does not trust the case's estimate
	// (a warning says why): pictures do not judge it against the target.
	Doubtful bool       `json:"-"`
	Pf       float64    `json:"pf"`
	Beta     Index      `json:"beta"`
	PfCI     [2]float64 `json:"pf_ci"`
	// Status, StatusReason and Trusted are the case's trust status, why
	// it is not converged and whether a verdict may be drawn from it, as
	// Document's; Trusted is nil when unknown.
	Status       string `json:"status,omitempty"`
	StatusReason string `json:"status_reason,omitempty"`
	Trusted      *bool  `json:"trusted,omitempty"`
}

// Variant is one named alternative of a study, at the study's values.
type Variant struct {
	Name string     `json:"name"`
	Pf   float64    `json:"pf"`
	Beta Index      `json:"beta"`
	PfCI [2]float64 `json:"pf_ci"`
	// Status, StatusReason and Trusted are as Document's: no verdict may
	// be drawn from a variant whose Trusted is false, and every table and
	// picture of the variants marks it. Trusted is nil when unknown.
	Status       string `json:"status,omitempty"`
	StatusReason string `json:"status_reason,omitempty"`
	Trusted      *bool  `json:"trusted,omitempty"`
}

// Untrusted tells whether the engine does not trust the variant's
// estimate.
func (v *Variant) Untrusted() bool { return v.Trusted != nil && !*v.Trusted }
