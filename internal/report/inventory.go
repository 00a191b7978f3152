package report

import (
	"bytes"
	"encoding/csv"
	"strconv"
)

// Inventory is the result of a study's inventory: every member's result,
// sorted by beta, lowest first, and the members as a series system.
type Inventory struct {
	// File is the inventory's CSV as the study names it.
	File    string   `json:"file"`
	Members []Member `json:"members"`
	// System is the series system: at least one member fails. Absent
	// when it could not be estimated.
	System *System `json:"system,omitempty"`
}

// Member is one member's result. Beta and BetaCI are null when not
// finite; Verdict is "met", "not met" or "undecided" (as the main
// result's target.verdict), absent when the study has no target;
// ReserveFactor is FORM's factor on the loads
// that gives the target beta, not confirmed by sampling.
type Member struct {
	Name string `json:"name"`
	// Line is the member's line in the inventory file.
	Line          int        `json:"line"`
	Pf            float64    `json:"pf"`
	PfCI          [2]float64 `json:"pf_ci"`
	Beta          Index      `json:"beta"`
	BetaCI        [2]Index   `json:"beta_ci"`
	Status        string     `json:"status"`
	Verdict       string     `json:"verdict,omitempty"`
	ReserveFactor *float64   `json:"reserve_factor,omitempty"`
	GoverningAxis string     `json:"governing_axis"`
	Mode          string     `json:"mode"`
	// Share is the member's share of the system failure: the
	// probability that it fails given that the system fails.
	Share *float64 `json:"share_of_system_failure,omitempty"`
	// CodeCheck is the member's code check (EN 1993-1-1 6.3.1 at
	// characteristic values, as the study's code_check), absent when no
	// member of the inventory has one; CodeCheckNotMade says why this
	// member's was not made when another's was.
	CodeCheck        *MemberCodeCheck `json:"code_check,omitempty"`
	CodeCheckNotMade string           `json:"code_check_not_made,omitempty"`
	// Cells are the member's cells in the inventory file, by column.
	Cells map[string]string `json:"cells"`
	// Error, when not empty, says why the member has no result.
	Error string `json:"error,omitempty"`
}

// System is the series system of an inventory's members.
type System struct {
	// Pf is the probability that at least one member fails, PfCI its
	// interval, Beta its index.
	Pf   float64    `json:"pf"`
	PfCI [2]float64 `json:"pf_ci"`
	Beta Index      `json:"beta"`
	// PfCoV is the coefficient of variation of Pf, null when no sample
	// failed; Samples the joint samples drawn; Status "converged", "few
	// failures" (under 100 failing samples) or "no failures".
	PfCoV   *float64 `json:"pf_cov"`
	Samples int64    `json:"samples"`
	Status  string   `json:"status"`
	// ExpectedFailures is the expected number of failing members, the
	// sum of their pf.
	ExpectedFailures float64 `json:"expected_failures"`
	// PfIfIndependent is 1 - prod(1 - pf_i): the system's pf were the
	// members to share nothing.
	PfIfIndependent float64 `json:"pf_if_independent"`
	// Method says how Pf was computed.
	Method string `json:"method"`
	// FormPf is the first-order system pf: FORM per member, the margins
	// linearised at their design points and combined with the
	// correlation the shared inputs induce; FormBeta its index,
	// FormPfError the integration's error estimate (absolute, not
	// FORM's own error), FormMethod how it was computed. Absent when it
	// could not be computed.
	FormPf      *float64 `json:"form_pf,omitempty"`
	FormBeta    *Index   `json:"form_beta,omitempty"`
	FormPfError *float64 `json:"form_pf_error,omitempty"`
	FormMethod  string   `json:"form_method,omitempty"`
	// Headline names the estimate to read as the system's: "joint
	// sampling" when a joint sample failed, "form" when none did (an
	// approximation, not a verdict).
	Headline string `json:"headline,omitempty"`
}

// inventoryCSV writes one row a member, in the order of the document:
// its results, its code check when any member has one (forces in kN,
// codeCheckHead), then its cells in the inventory file.
func inventoryCSV(inv *Inventory, columns []string) ([]byte, error) {
	var buf bytes.Buffer
	w := csv.NewWriter(&buf)
	head := []string{"name", "line", "pf", "pf_low", "pf_high", "beta", "beta_low", "beta_high", "status", "verdict", "reserve_factor", "governing_axis", "mode", "share_of_system_failure"}
	code := hasCodeCheck(inv)
	if code {
		head = append(head, codeCheckHead...)
	}
	if err := w.Write(csvCells(append(head, columns...))[0]); err != nil {
		return nil, err
	}
	g := func(x float64) string { return strconv.FormatFloat(x, 'g', 6, 64) }
	opt := func(x *float64) string {
		if x == nil {
			return ""
		}
		return g(*x)
	}
	for _, m := range inv.Members {
		row := []string{m.Name, strconv.Itoa(m.Line), g(m.Pf), g(m.PfCI[0]), g(m.PfCI[1]),
			g(float64(m.Beta)), g(float64(m.BetaCI[0])), g(float64(m.BetaCI[1])),
			m.Status, m.Verdict, opt(m.ReserveFactor), m.GoverningAxis, m.Mode, opt(m.Share)}
		if m.Error != "" {
			row = []string{m.Name, strconv.Itoa(m.Line), "", "", "", "", "", "", "not run: " + m.Error, "", "", "", "", ""}
		}
		if code {
			row = append(row, codeCheckCells(&m)...)
		}
		for _, c := range columns {
			row = append(row, m.Cells[c])
		}
		if err := w.Write(csvCells(row)[0]); err != nil {
			return nil, err
		}
	}
	w.Flush()
	return buf.Bytes(), w.Error()
}
