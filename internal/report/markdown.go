package report

import (
	"fmt"
	"strings"
)

// Markdown returns the report of b as Markdown (summary.md): the same facts
// as the HTML report, in tables, for a reader without a browser. Pictures
// are not included; they are written beside it as files.
func Markdown(b *Bundle) string {
	if b == nil {
		b = &Bundle{}
	}
	v := makeView(b, nil, nil)
	var w strings.Builder
	fmt.Fprintf(&w, "# %s\n\n", mdText(v.Title))
	mdKV(&w, v.Record)
	fmt.Fprintf(&w, "> %s\n\n", v.Caution)

	w.WriteString("## Result\n\n")
	if v.InvVerdict != "" {
		fmt.Fprintf(&w, "**%s**\n\n", mdText(v.InvVerdict))
	}
	if v.Verdict != "" {
		fmt.Fprintf(&w, "**%s**\n\n", mdText(v.Verdict))
	}
	if len(v.Result) > 0 {
		mdKV(&w, v.Result)
	} else {
		w.WriteString("No sampling result: deterministic check only.\n\n")
	}
	if v.Influence != "" {
		fmt.Fprintf(&w, "Most influential inputs: %s. %s\n\n", mdText(v.Influence), mdText(v.RankingNote))
	}
	if len(v.Target) > 0 {
		w.WriteString("### Margin against the target\n\n")
		mdKV(&w, v.Target)
	}
	if len(v.CodeCheck) > 0 {
		w.WriteString("### Code check beside beta\n\n")
		w.WriteString("The deterministic check of EN 1993-1-1 6.3.1 at characteristic values with partial factors; the recommended factors may differ by National Annex.\n\n")
		mdKV(&w, v.CodeCheck)
	}
	if len(v.Combination) > 0 {
		w.WriteString("### Load combination\n\n")
		mdKV(&w, v.Combination)
	}
	if len(v.Warnings) > 0 {
		w.WriteString("Warnings:\n\n")
		for _, s := range v.Warnings {
			fmt.Fprintf(&w, "- %s\n", mdText(s))
		}
		w.WriteString("\n")
	}

	w.WriteString("## Inputs\n\n")
	rows := make([][]string, len(v.Inputs))
	for i, in := range v.Inputs {
		rows[i] = []string{in.Name, in.Dist, in.Params, in.Mean, in.CoV, in.Unit}
	}
	mdTable(&w, []string{"input", "distribution", "parameters", "mean", "CoV (–)", "unit of the mean"}, rows)
	if len(v.Defaults) > 0 {
		w.WriteString("Defaults that applied:\n\n")
		for _, s := range v.Defaults {
			fmt.Fprintf(&w, "- %s\n", mdText(s))
		}
		w.WriteString("\n")
	}

	w.WriteString("## Deterministic check at nominal values\n\n")
	mdKV(&w, v.Nominal)
	rows = rows[:0]
	for _, c := range v.Check {
		rows = append(rows, []string{c.Quantity, c.Major, c.Minor, c.Unit})
	}
	mdTable(&w, []string{"quantity", "major axis", "minor axis", "unit"}, rows)

	w.WriteString("## Sensitivity\n\n")
	if v.RankingNote != "" {
		w.WriteString(mdText(v.RankingNote) + "\n\n")
	}
	if len(v.Tornado) > 0 {
		fmt.Fprintf(&w, "### One at a time (tornado): %s\n\nAll inputs at their medians give %s.\n\n", mdText(v.TornadoOutput), v.TornadoBase)
		rows = rows[:0]
		head := []string{"input", "low value", "high value", "result at low" + v.TornadoUnit, "result at high" + v.TornadoUnit, "swing" + v.TornadoUnit}
		if v.TornadoBeta {
			head = append(head, "β at low (–)", "β at high (–)")
		}
		for _, t := range v.Tornado {
			r := []string{t.Variable, t.LowValue, t.HighValue, t.Low, t.High, t.Swing}
			if v.TornadoBeta {
				r = append(r, t.LowBeta, t.HighBeta)
			}
			rows = append(rows, r)
		}
		mdTable(&w, head, rows)
	}
	if len(v.Sobol) > 0 {
		what := v.SobolOutput
		if what == "" {
			what = "the output"
		}
		fmt.Fprintf(&w, "### Sobol indices of %s\n\n", mdText(what))
		if v.SobolNote != "" {
			fmt.Fprintf(&w, "%s\n\n", mdText(v.SobolNote))
		}
		rows = rows[:0]
		for _, s := range v.Sobol {
			rows = append(rows, []string{s.Variable, s.First, s.FirstCI, s.Total, s.TotalCI})
		}
		mdTable(&w, []string{"input", "first order (–)", "95% interval (–)", "total (–)", "95% interval (–)"}, rows)
	}
	if len(v.SobolCapacity) > 0 {
		w.WriteString("### Sobol indices of the capacity\n\n")
		rows = rows[:0]
		for _, s := range v.SobolCapacity {
			rows = append(rows, []string{s.Variable, s.First, s.FirstCI, s.Total, s.TotalCI})
		}
		mdTable(&w, []string{"input", "first order (–)", "95% interval (–)", "total (–)", "95% interval (–)"}, rows)
	}
	if len(v.FORM) > 0 {
		fmt.Fprintf(&w, "### FORM design point and importance\n\nβ = %s, pf = %s\n\n", v.FORMBeta, v.FORMPf)
		rows = rows[:0]
		for _, f := range v.FORM {
			rows = append(rows, []string{f.Variable, f.DesignPoint, f.Importance})
		}
		mdTable(&w, []string{"input", "design point", "importance α² (–)"}, rows)
	}
	if len(v.Design) > 0 {
		fmt.Fprintf(&w, "### Design values and partial factors at β = %s\n\n", v.DesignBeta)
		rows = rows[:0]
		for _, r := range v.Design {
			rows = append(rows, []string{r.Variable, r.Role, r.Characteristic, r.Basis, r.Design, r.Factor})
		}
		mdTable(&w, []string{"input", "role", "characteristic value", "taken as", "design value", "partial factor γ (–)"}, rows)
		fmt.Fprintf(&w, "%s\n\n", mdText(v.DesignNote))
	}
	if len(v.Spearman) > 0 {
		w.WriteString("### Rank correlation with the margin\n\n")
		rows = rows[:0]
		for _, s := range v.Spearman {
			rows = append(rows, []string{s.Key, s.Value})
		}
		mdTable(&w, []string{"input", "Spearman ρ (–)"}, rows)
	}

	if len(v.Sweep) > 0 || len(v.Variants) > 0 || v.SweepCurves != nil {
		w.WriteString("## Sweep and variants\n\n")
		switch {
		case newHeatGrid(b.Cases) != nil:
			w.WriteString("The heat map of β over the two swept keys is heatmap.png (and .svg) beside this file, when pictures are written: one panel for the study and each variant, the cells coloured by classes of β about the target.\n\n")
		case newHeatSlices(b.Cases) != nil:
			w.WriteString("The heat maps of β over the first two swept keys, one for each combination of the other keys' values, are heatmap.png (and .svg) beside this file, when pictures are written: the study's first, then each variant's, the cells coloured by classes of β about the target.\n\n")
		case len(b.Series) == 0 && b.Cases != nil && b.Cases.Zipped:
			w.WriteString("β and pf over the swept points, the keys in step, are drawn in sweep.png (and .svg) beside this file, when pictures are written: one curve for the study and each variant, each point's value of every key written under it.\n\n")
		}
		if t := v.SweepCurves; t != nil {
			w.WriteString("β of every curve (95% interval in brackets) at each swept value:\n\n")
			mdTable(&w, t.Head, t.Rows)
		}
		label := v.SweepLabel
		if label == "" {
			label = "value"
		}
		for _, t := range []struct {
			head  string
			pts   []pointRow
			noted bool
		}{{label, v.Sweep, v.SweepNoted}, {"variant", v.Variants, v.VariantsNoted}} {
			if len(t.pts) == 0 {
				continue
			}
			rows = rows[:0]
			head := []string{t.head, "pf (–)", "95% interval of pf (–)", "β (–)"}
			if t.noted {
				head = append(head, "trust")
			}
			for _, p := range t.pts {
				r := []string{p.Name, p.Pf, p.PfCI, p.Beta}
				if t.noted {
					r = append(r, p.Note)
				}
				rows = append(rows, r)
			}
			mdTable(&w, head, rows)
		}
	}
	mdCalibration(&w, v.Calibration)
	mdInventory(&w, v.Inventory)
	if len(v.Life) > 0 {
		w.WriteString("## Remaining life under corrosion\n\n")
		if v.LifeVerdict != "" {
			fmt.Fprintf(&w, "**%s**\n\n", mdText(v.LifeVerdict))
		}
		mdKV(&w, v.Life)
		if t := v.LifeTable; t != nil {
			mdTable(&w, t.Head, t.Rows)
		}
	}
	if len(v.Updates) > 0 {
		w.WriteString("## Updating from measurements\n\n")
		rows = rows[:0]
		for _, u := range v.Updates {
			unit := u.Unit
			if unit == "" {
				unit = "–"
			}
			rows = append(rows, []string{u.Variable, u.Prior, u.After, unit, u.N})
		}
		mdTable(&w, []string{"input", "prior", "updated", "unit of the mean or median", "number of measurements"}, rows)
		rows = rows[:0]
		for _, m := range v.Measured {
			rows = append(rows, []string{m.Variable, m.N, m.Variance, m.PriorMean, m.PriorCoV, m.PriorP05, m.Mean, m.CoV, m.P05})
		}
		if len(rows) > 0 {
			mdTable(&w, []string{"input", "n", "spread", "prior mean", "prior CoV (–)", "prior 5%", "updated mean", "updated CoV (–)", "updated 5%"}, rows)
		}
	}

	w.WriteString("## Method and diagnostics\n\n")
	mdKV(&w, v.Diagnostics)

	w.WriteString("## Reproducibility\n\n")
	orNot := func(s string) string {
		if s == "" {
			return "not recorded"
		}
		return s
	}
	mdKV(&w, []KV{
		{"tool version", orNot(v.ToolVersion)},
		{"study file", orNot(v.StudyFile)},
		{"SHA-256 of the study file", orNot(v.InputSHA)},
		{"seed", orNot(v.Seed)},
	})

	w.WriteString("## Cautions\n\n")
	fmt.Fprintf(&w, "%s\n", v.Caution)
	return w.String()
}

// mdKV writes a two-column table of labelled values.
func mdKV(w *strings.Builder, kv []KV) {
	rows := make([][]string, len(kv))
	for i, p := range kv {
		rows[i] = []string{p.Key, p.Value}
	}
	mdTable(w, []string{"", ""}, rows)
}

// mdTable writes a Markdown table; nothing when there are no rows.
func mdTable(w *strings.Builder, head []string, rows [][]string) {
	if len(rows) == 0 {
		return
	}
	line := func(cells []string) {
		w.WriteString("|")
		for _, c := range cells {
			w.WriteString(" " + mdText(c) + " |")
		}
		w.WriteString("\n")
	}
	line(head)
	w.WriteString("|")
	for range head {
		w.WriteString(" --- |")
	}
	w.WriteString("\n")
	for _, r := range rows {
		line(r)
	}
	w.WriteString("\n")
}
