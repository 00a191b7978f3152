package report

import (
	"fmt"
	"strconv"
)

// LifePoint is one evaluated year of the remaining life: the failure
// within that year under its annual maxima (beta, pf, pf_cov) and the
// failure at any time from now to its end (pf_cumulative,
// beta_cumulative, pf_cumulative_cov).
type LifePoint struct {
	Year            int     `json:"year"`
	Beta            Index   `json:"beta"`
	PfCumulative    float64 `json:"pf_cumulative"`
	BetaCumulative  Index   `json:"beta_cumulative"`
	Pf              float64 `json:"pf"`
	PfCoV           Index   `json:"pf_cov"`
	PfCumulativeCoV Index   `json:"pf_cumulative_cov"`
}

// LifeLoad is a variable load of the remaining life: the distribution of
// its annual maxima and how it was found.
type LifeLoad struct {
	Load   string `json:"load"`
	Annual string `json:"annual"`
	Basis  string `json:"basis"`
}

// LifeBasis says how the remaining life was computed and judged.
type LifeBasis struct {
	// Years is the horizon, Step the years between evaluations.
	Years int `json:"years"`
	Step  int `json:"step"`
	// LossLaw is the corrosion law as applied; LossEnd the nominal loss
	// from every face at the horizon (mm); CapacityNow and CapacityEnd
	// the nominal capacity now and at the horizon (N).
	LossLaw     string  `json:"loss_law"`
	LossEnd     float64 `json:"loss_end"`
	CapacityNow float64 `json:"capacity_now"`
	CapacityEnd float64 `json:"capacity_end"`
	// Method says how the probabilities were computed, Paths how many
	// member paths were sampled.
	Method string     `json:"method"`
	Paths  int        `json:"paths"`
	Loads  []LifeLoad `json:"loads,omitempty"`
	// TargetBeta is the annual target the annual beta is held against,
	// TargetSource where it came from; absent without a target.
	TargetBeta   *float64 `json:"target_beta,omitempty"`
	TargetSource string   `json:"target_source,omitempty"`
	// Criterion says which beta ends the life.
	Criterion string `json:"criterion"`
	// EndRange brackets the year the annual beta falls below the target
	// by the sampling error: the first year it may be below, the first
	// year it is below with confidence (0: not up to the horizon).
	// Resolved is false when that bracket is wider than two steps or
	// reaches beyond the horizon: then life_end is left out and no
	// verdict is drawn.
	EndRange []int `json:"end_range,omitempty"`
	Resolved bool  `json:"resolved"`
}

// LifeCriterion is the rule that ends the remaining life.
const LifeCriterion = "the first year whose annual beta (failure within that year, under its annual maxima) is below the annual target"

// LifeVerdict says in one sentence what the remaining life comes to, ""
// without a life.
func LifeVerdict(d *Document) string {
	lb := d.LifeBasis
	if lb == nil || len(d.Life) == 0 {
		return ""
	}
	first, last := d.Life[0], d.Life[len(d.Life)-1]
	switch {
	case lb.TargetBeta == nil:
		return fmt.Sprintf("Annual β %s in year %d, %s in year %d; no target to hold it against.",
			BetaText(float64(first.Beta)), first.Year, BetaText(float64(last.Beta)), last.Year)
	case !lb.Resolved:
		return fmt.Sprintf("Not resolved: sampling error puts the year the annual β falls below the target β = %s between %s and %s; raise life.samples for a verdict.",
			fixed(*lb.TargetBeta, 2), endText(lb.EndRange, 0), endText(lb.EndRange, 1))
	case d.LifeEnd != nil && *d.LifeEnd == first.Year:
		return fmt.Sprintf("The annual β is below the annual target β = %s already in year %d.", fixed(*lb.TargetBeta, 2), *d.LifeEnd)
	case d.LifeEnd != nil:
		return fmt.Sprintf("The annual β falls below the annual target β = %s in year %d%s: the remaining life is %d years.",
			fixed(*lb.TargetBeta, 2), *d.LifeEnd, bracketText(lb.EndRange), *d.LifeEnd-1)
	}
	return fmt.Sprintf("The annual β stays above the annual target β = %s up to the horizon of %d years (%s in year %d).",
		fixed(*lb.TargetBeta, 2), lb.Years, BetaText(float64(last.Beta)), last.Year)
}

// bracketText writes the sampling bracket of the end of life, "" when it
// is one year.
func bracketText(r []int) string {
	if len(r) != 2 || r[0] == r[1] {
		return ""
	}
	return fmt.Sprintf(" (sampling error: year %d to %d)", r[0], r[1])
}

// endText writes one end of the bracket: a year, or "beyond the horizon".
func endText(r []int, i int) string {
	if len(r) != 2 || r[i] == 0 {
		return "beyond the horizon"
	}
	return "year " + strconv.Itoa(r[i])
}

// LifeRows are the facts of the remaining life for the HTML and Markdown.
func LifeRows(d *Document) []KV {
	lb := d.LifeBasis
	if lb == nil {
		return nil
	}
	rows := []KV{
		{"horizon", fmt.Sprintf("%d years from now, evaluated every %s", lb.Years, yearsWord(lb.Step))},
		{"loss law", lb.LossLaw},
		{"nominal loss at the horizon", withUnitSig(lb.LossEnd, "mm", 3)},
		{"nominal capacity now → at the horizon", kN(lb.CapacityNow) + " → " + kN(lb.CapacityEnd)},
	}
	for _, l := range lb.Loads {
		rows = append(rows, KV{"annual maxima of " + l.Load, cleanNumbers(l.Annual) + " (" + l.Basis + ")"})
	}
	if lb.TargetBeta != nil {
		rows = append(rows, KV{"annual target β", fixed(*lb.TargetBeta, 2) + " (" + lb.TargetSource + ")"})
	}
	rows = append(rows, KV{"end of life", lb.Criterion}, KV{"method", lb.Method})
	return rows
}

// yearsWord writes n years in words: "year" or "5 years".
func yearsWord(n int) string {
	if n == 1 {
		return "year"
	}
	return strconv.Itoa(n) + " years"
}

// LifeTable is the year-by-year table of the remaining life: its head and
// rows. With more than max points it keeps every k-th and the last.
func LifeTable(d *Document, max int) (head []string, rows [][]string) {
	if len(d.Life) == 0 {
		return nil, nil
	}
	head = []string{"year", "annual β", "annual pf", "cumulative pf", "cumulative β"}
	k := (len(d.Life) + max - 1) / max
	for i, p := range d.Life {
		if i%k != 0 && i != len(d.Life)-1 && (d.LifeEnd == nil || p.Year != *d.LifeEnd) {
			continue
		}
		rows = append(rows, []string{strconv.Itoa(p.Year), BetaText(float64(p.Beta)), prob(p.Pf),
			prob(p.PfCumulative), BetaText(float64(p.BetaCumulative))})
	}
	return head, rows
}
