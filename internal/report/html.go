package report

import (
	"bytes"
	"html/template"
)

// HTML returns the self-contained HTML report of b: every picture inline as
// SVG, a small inline style sheet, no scripts and no links to anything
// outside the file.
func HTML(b *Bundle) ([]byte, error) {
	pics, notes := renderPictures(b, true, false)
	return htmlReport(b, pics, notes)
}

// htmlReport fills the report template.
func htmlReport(b *Bundle, pics []picture, notes []string) ([]byte, error) {
	var buf bytes.Buffer
	if err := reportTemplate.Execute(&buf, makeView(b, pics, notes)); err != nil {
		return nil, err
	}
	return buf.Bytes(), nil
}

var reportTemplate = template.Must(template.New("report").Parse(reportHTML))

const reportHTML = `<!DOCTYPE html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<title>{{.Title}}</title>
<style>
body{font-family:"Liberation Sans",Arial,Helvetica,sans-serif;color:#222;max-width:60rem;margin:2rem auto;padding:0 1rem;line-height:1.45}
h1{font-size:1.6rem;margin-bottom:.2rem}h2{font-size:1.25rem;border-bottom:1px solid #ccc;padding-bottom:.2rem;margin-top:2.2rem}h3{font-size:1.05rem;margin-top:1.5rem}
table{border-collapse:collapse;margin:.6rem 0;font-size:.92rem}th,td{padding:.25rem .7rem;border-bottom:1px solid #e2e2e2;text-align:left;vertical-align:top}th{background:#f4f4f4}
td.n{text-align:right;font-variant-numeric:tabular-nums;white-space:nowrap}
td.nw{white-space:nowrap}
figure{margin:1.2rem 0}figure svg{width:100%;max-width:48rem;height:auto}#fig-sweep svg,#fig-heatmap svg,#fig-beam-column svg{max-width:100%}figcaption{font-size:.88rem;color:#555}
.verdict{font-weight:bold;padding:.4rem .7rem;display:inline-block;border-radius:3px}
.met{background:#e3f1e7}.not-met{background:#f7e1de}.undecided{background:#fbf0d9}
.caution{border-left:4px solid #c0392b;padding:.5rem .9rem;background:#fbf3f2}
.side{display:flex;flex-wrap:wrap;gap:2rem}.muted{color:#666;font-size:.9rem}
code{font-size:.9em}
table.record th{width:9rem}
details.study{margin:.8rem 0}details.study summary{cursor:pointer}
pre.study{background:#f7f7f7;border:1px solid #e2e2e2;padding:.6rem .8rem;font-size:.82rem;line-height:1.35;white-space:pre-wrap;overflow-wrap:anywhere}
.print-only{display:none}
@page{size:A4;margin:16mm 15mm 18mm 15mm;
@top-left{content:""}@top-center{content:""}@top-right{content:""}@bottom-center{content:""}
@bottom-left{content:"{{.Title}}";font:8pt "Liberation Sans",Arial,sans-serif;color:#555}
@bottom-right{content:"page " counter(page) " of " counter(pages);font:8pt "Liberation Sans",Arial,sans-serif;color:#555}}
@media print{
body{max-width:none;margin:0;padding:0;font-size:9.5pt;line-height:1.35}
h1{font-size:15pt;margin-top:0}h2{font-size:12pt;margin-top:1.2rem}h3{font-size:10.5pt}
h2,h3{break-after:avoid}
table,figure,tr,.caution,.verdict{break-inside:avoid}
table{font-size:8.5pt}
table.record th,table.record td{padding:.1rem .6rem}
figure svg{max-width:100%}
.side{display:block}
details.study{display:none}
.print-only{display:block}
pre.study{break-inside:auto;font-size:7.5pt}
a{color:inherit;text-decoration:none}
}
</style>
</head>
<body>
<header>
<h1>{{.Title}}</h1>
{{if .Record}}<table class="record">{{range .Record}}<tr><th>{{.Key}}</th><td>{{.Value}}</td></tr>{{end}}</table>{{end}}
<p class="muted">Reliability study of a compression member{{if .StudyFile}} · study file <code>{{.StudyFile}}</code>{{end}}{{if .ToolVersion}} · strutrisk {{.ToolVersion}}{{end}}</p>
<p class="caution">{{.Caution}}</p>
</header>

<section id="result">
<h2>Result</h2>
{{if .InvVerdict}}<p class="verdict {{.InvVerdictClass}}">{{.InvVerdict}}</p>{{end}}
{{if .Verdict}}<p class="verdict {{.VerdictClass}}">{{.Verdict}}</p>{{end}}
{{if .Result}}<table>{{range .Result}}<tr><th>{{.Key}}</th><td>{{.Value}}</td></tr>{{end}}</table>{{else}}<p>No sampling result: deterministic check only.</p>{{end}}
{{if .Influence}}<p>Most influential inputs: {{.Influence}}. {{.RankingNote}}</p>{{end}}
{{if .Target}}<h3 id="target">Margin against the target</h3>
<table>{{range .Target}}<tr><th>{{.Key}}</th><td>{{.Value}}</td></tr>{{end}}</table>{{end}}
{{if .CodeCheck}}<h3 id="code-check">Code check beside β</h3>
<p>The deterministic check of EN 1993-1-1 6.3.1 at characteristic values with partial factors; the recommended factors may differ by National Annex.</p>
<table>{{range .CodeCheck}}<tr><th>{{.Key}}</th><td>{{.Value}}</td></tr>{{end}}</table>{{end}}
{{if .Combination}}<h3 id="combination">Load combination</h3>
<table>{{range .Combination}}<tr><th>{{.Key}}</th><td>{{.Value}}</td></tr>{{end}}</table>{{end}}
{{with .Picture "capacity-demand"}}{{template "fig" .}}{{end}}
{{with .Picture "margin"}}{{template "fig" .}}{{end}}
{{if .Warnings}}<h3>Warnings</h3><ul>{{range .Warnings}}<li>{{.}}</li>{{end}}</ul>{{end}}
</section>

<section id="inputs">
<h2>Inputs</h2>
{{if .Inputs}}<table>
<tr><th>input</th><th>distribution</th><th>parameters</th><th>mean</th><th>CoV (–)</th><th>unit of the mean</th></tr>
{{range .Inputs}}<tr><td>{{.Name}}</td><td>{{.Dist}}</td><td>{{.Params}}</td><td class="n">{{.Mean}}</td><td class="n">{{.CoV}}</td><td>{{.Unit}}</td></tr>
{{end}}</table>{{else}}<p>The inputs were not given to the report.</p>{{end}}
{{if .Defaults}}<h3>Defaults that applied</h3><ul>{{range .Defaults}}<li>{{.}}</li>{{end}}</ul>{{end}}
</section>

<section id="check">
<h2>Deterministic check at nominal values</h2>
{{if .Nominal}}<table>{{range .Nominal}}<tr><th>{{.Key}}</th><td>{{.Value}}</td></tr>{{end}}</table>{{end}}
{{if .Check}}<table>
<tr><th>quantity</th><th>major axis</th><th>minor axis</th><th>unit</th></tr>
{{range .Check}}<tr><td>{{.Quantity}}</td><td class="n">{{.Major}}</td><td class="n">{{.Minor}}</td><td>{{.Unit}}</td></tr>
{{end}}</table>{{end}}
{{with .Picture "slenderness"}}{{template "fig" .}}{{end}}
{{with .Picture "interaction"}}{{template "fig" .}}{{end}}
</section>

<section id="sensitivity">
<h2>Sensitivity</h2>
{{if .RankingNote}}<p>{{.RankingNote}}</p>{{end}}
{{if .Tornado}}<h3 id="tornado">One at a time (tornado): {{.TornadoOutput}}</h3>
<p>All inputs at their medians give {{.TornadoBase}}.</p>
{{with .Picture "tornado"}}{{template "fig" .}}{{end}}
<table><tr><th>input</th><th>low value</th><th>high value</th><th>result at low{{.TornadoUnit}}</th><th>result at high{{.TornadoUnit}}</th><th>swing{{.TornadoUnit}}</th>{{if .TornadoBeta}}<th>β at low (–)</th><th>β at high (–)</th>{{end}}</tr>
{{range .Tornado}}<tr><td>{{.Variable}}</td><td class="n">{{.LowValue}}</td><td class="n">{{.HighValue}}</td><td class="n">{{.Low}}</td><td class="n">{{.High}}</td><td class="n">{{.Swing}}</td>{{if $.TornadoBeta}}<td class="n">{{.LowBeta}}</td><td class="n">{{.HighBeta}}</td>{{end}}</tr>
{{end}}</table>
{{with .Picture "tornado-beta"}}{{template "fig" .}}{{end}}{{end}}
{{if .Sobol}}<h3 id="sobol">Variance-based (Sobol) indices of {{if .SobolOutput}}{{.SobolOutput}}{{else}}the output{{end}}</h3>
{{if .SobolNote}}<p>{{.SobolNote}}</p>{{end}}
{{with .Picture "sobol"}}{{template "fig" .}}{{end}}
<table><tr><th>input</th><th>first order (–)</th><th>95% interval (–)</th><th>total (–)</th><th>95% interval (–)</th></tr>
{{range .Sobol}}<tr><td>{{.Variable}}</td><td class="n">{{.First}}</td><td class="n">{{.FirstCI}}</td><td class="n">{{.Total}}</td><td class="n">{{.TotalCI}}</td></tr>
{{end}}</table>{{end}}
{{if .SobolCapacity}}<h3 id="sobol-capacity">Variance-based (Sobol) indices of the capacity</h3>
<p>The same sampling settings and seed, applied to the capacity: inputs that do not act on it (the loads) have indices about zero.</p>
{{with .Picture "sobol-capacity"}}{{template "fig" .}}{{end}}
<table><tr><th>input</th><th>first order (–)</th><th>95% interval (–)</th><th>total (–)</th><th>95% interval (–)</th></tr>
{{range .SobolCapacity}}<tr><td>{{.Variable}}</td><td class="n">{{.First}}</td><td class="n">{{.FirstCI}}</td><td class="n">{{.Total}}</td><td class="n">{{.TotalCI}}</td></tr>
{{end}}</table>{{end}}
<div class="side">
{{if .FORM}}<div id="form"><h3>FORM design point and importance</h3>
<p>β = {{.FORMBeta}}, pf = {{.FORMPf}}</p>
<table><tr><th>input</th><th>design point</th><th>importance α² (–)</th></tr>
{{range .FORM}}<tr><td>{{.Variable}}</td><td class="n">{{.DesignPoint}}</td><td class="n">{{.Importance}}</td></tr>
{{end}}</table></div>{{end}}
{{if .Design}}<div id="design"><h3>Design values and partial factors at β = {{.DesignBeta}}</h3>
<table><tr><th>input</th><th>role</th><th>characteristic value</th><th>taken as</th><th>design value</th><th>partial factor γ (–)</th></tr>
{{range .Design}}<tr><td>{{.Variable}}</td><td>{{.Role}}</td><td class="n">{{.Characteristic}}</td><td>{{.Basis}}</td><td class="n">{{.Design}}</td><td class="n">{{.Factor}}</td></tr>
{{end}}</table>
<p>{{.DesignNote}}</p></div>{{end}}
{{if .Spearman}}<div id="spearman"><h3>Rank correlation with the margin</h3>
<table><tr><th>input</th><th>Spearman ρ (–)</th></tr>
{{range .Spearman}}<tr><td>{{.Key}}</td><td class="n">{{.Value}}</td></tr>
{{end}}</table></div>{{end}}
</div>
{{if not (or .Tornado .Sobol .FORM .Spearman)}}<p>No sensitivity measures were computed.</p>{{end}}
</section>

{{if or .Sweep .Variants .SweepCurves (.Picture "sweep") (.Picture "heatmap")}}<section id="sweep">
<h2>Sweep and variants</h2>
{{with .Picture "sweep"}}{{template "fig" .}}{{end}}
{{with .Picture "heatmap"}}{{template "fig" .}}{{end}}
{{with .Picture "variants"}}{{template "fig" .}}{{end}}
{{if .Sweep}}<table><tr><th>{{if .SweepLabel}}{{.SweepLabel}}{{else}}value{{end}}</th><th>pf (–)</th><th>95% interval of pf (–)</th><th>β (–)</th>{{if .SweepNoted}}<th>trust</th>{{end}}</tr>
{{range .Sweep}}<tr><td class="n">{{.Name}}</td><td class="n">{{.Pf}}</td><td class="n">{{.PfCI}}</td><td class="n">{{.Beta}}</td>{{if $.SweepNoted}}<td>{{.Note}}</td>{{end}}</tr>
{{end}}</table>{{end}}
{{with .SweepCurves}}<p>β of every curve (95% interval in brackets) at each swept value:</p>
<table><tr>{{range .Head}}<th>{{.}}</th>{{end}}</tr>
{{range .Rows}}<tr>{{range .}}<td class="n">{{.}}</td>{{end}}</tr>
{{end}}</table>{{end}}
{{if .Variants}}<table><tr><th>variant</th><th>pf (–)</th><th>95% interval of pf (–)</th><th>β (–)</th>{{if .VariantsNoted}}<th>trust</th>{{end}}</tr>
{{range .Variants}}<tr><td>{{.Name}}</td><td class="n">{{.Pf}}</td><td class="n">{{.PfCI}}</td><td class="n">{{.Beta}}</td>{{if $.VariantsNoted}}<td>{{.Note}}</td>{{end}}</tr>
{{end}}</table>{{end}}
</section>{{end}}

{{with .Calibration}}<section id="calibration">
<h2>Calibration of {{.Factor}}</h2>
<p class="verdict {{.Class}}">{{.Head}}</p>
<table>{{range .Facts}}<tr><th>{{.Key}}</th><td>{{.Value}}</td></tr>{{end}}</table>
{{with $.Picture "calibration"}}{{template "fig" .}}{{end}}
<table><tr>{{range .Columns}}<th>{{.}}</th>{{end}}</tr>
{{range .Table}}<tr>{{range $i, $c := .}}<td{{if and $i (ne $c "worst")}} class="n"{{end}}>{{$c}}</td>{{end}}</tr>
{{end}}</table>
</section>{{end}}

{{if or .Inventory (.Picture "inventory-ranked") (.Picture "inventory-against")}}<section id="inventory">
<h2>Inventory</h2>
{{with .Inventory}}<p>{{.Head}}.</p>
<table>{{range .System}}<tr><th>{{.Key}}</th><td>{{.Value}}</td></tr>{{end}}</table>
<p>{{.Listing}}</p>
{{if .Rows}}<table><tr><th>member</th><th>β (–)</th><th>95% interval of β (–)</th><th>verdict</th><th>reserve factor (–)</th>{{if .HasCode}}<th>code check N_Ed/N_Rd</th>{{end}}<th>governs</th>{{if .HasNote}}<th>note</th>{{end}}</tr>
{{range .Rows}}<tr><td>{{.Name}}</td><td class="n">{{.Beta}}</td><td class="n">{{.BetaCI}}</td><td{{if .Class}} class="{{.Class}}"{{end}}>{{.Verdict}}</td><td class="n">{{.Reserve}}</td>{{if $.Inventory.HasCode}}<td class="nw">{{.Code}}</td>{{end}}<td class="nw">{{.Governs}}</td>{{if $.Inventory.HasNote}}<td>{{.Note}}</td>{{end}}</tr>
{{end}}</table>{{end}}
{{if .NotRun}}<p>Members not run:</p><ul>{{range .NotRun}}<li>{{.Name}}: {{.Note}}</li>{{end}}</ul>{{end}}
{{if .Rest}}<p>{{.Rest}}</p>{{end}}{{end}}
{{with .Picture "inventory-ranked"}}{{template "fig" .}}{{end}}
{{with .Picture "inventory-against"}}{{template "fig" .}}{{end}}
</section>{{end}}

{{if .Life}}<section id="life">
<h2>Remaining life under corrosion</h2>
{{if .LifeVerdict}}<p class="verdict">{{.LifeVerdict}}</p>{{end}}
<table>{{range .Life}}<tr><th>{{.Key}}</th><td>{{.Value}}</td></tr>{{end}}</table>
{{with .Picture "life"}}{{template "fig" .}}{{end}}
{{with .LifeTable}}<table><tr>{{range .Head}}<th>{{.}}</th>{{end}}</tr>
{{range .Rows}}<tr>{{range .}}<td class="n">{{.}}</td>{{end}}</tr>
{{end}}</table>{{end}}
</section>{{end}}

{{if .Updates}}<section id="updates">
<h2>Updating from measurements</h2>
<table><tr><th>input</th><th>prior</th><th>updated</th><th>unit of the mean or median</th><th>number of measurements</th></tr>
{{range .Updates}}<tr><td>{{.Variable}}</td><td>{{.Prior}}</td><td>{{.After}}</td><td>{{if .Unit}}{{.Unit}}{{else}}–{{end}}</td><td class="n">{{.N}}</td></tr>
{{end}}</table>
{{if .Measured}}<table><tr><th>input</th><th>n</th><th>spread</th><th>prior mean</th><th>prior CoV (–)</th><th>prior 5% fractile</th><th>updated mean</th><th>updated CoV (–)</th><th>updated 5% fractile</th></tr>
{{range .Measured}}<tr><td>{{.Variable}}</td><td class="n">{{.N}}</td><td>{{.Variance}}</td><td class="n">{{.PriorMean}}</td><td class="n">{{.PriorCoV}}</td><td class="n">{{.PriorP05}}</td><td class="n">{{.Mean}}</td><td class="n">{{.CoV}}</td><td class="n">{{.P05}}</td></tr>
{{end}}</table>
<p class="muted">The updated 5% fractile is that of the predictive distribution, the characteristic value of EN 1990 Annex D (D.7). With an unknown variance the predictive is a log-Student-t, which has no finite mean: its mean and CoV here are those of the lognormal with the same log-mean and log-scale.</p>{{end}}
{{range .Updates}}{{with $.Picture .Picture}}{{template "fig" .}}{{end}}{{end}}
</section>{{end}}

{{with .Picture "beam-column"}}<section id="beam-column">
<h2>Numerical beam-column</h2>
{{template "fig" .}}
</section>{{end}}

<section id="method">
<h2>Method and diagnostics</h2>
{{if .Diagnostics}}<table>{{range .Diagnostics}}<tr><th>{{.Key}}</th><td>{{.Value}}</td></tr>{{end}}</table>{{end}}
{{with .Picture "convergence"}}{{template "fig" .}}{{end}}
{{if .Notes}}<h3>Pictures left out</h3><ul>{{range .Notes}}<li>{{.}}</li>{{end}}</ul>{{end}}
</section>

<section id="reproducibility">
<h2>Reproducibility</h2>
<table>
<tr><th>tool version</th><td>{{if .ToolVersion}}{{.ToolVersion}}{{else}}not recorded{{end}}</td></tr>
<tr><th>study file</th><td>{{if .StudyFile}}<code>{{.StudyFile}}</code>{{else}}not recorded{{end}}</td></tr>
<tr><th>SHA-256 of the study file</th><td>{{if .InputSHA}}<code>{{.InputSHA}}</code>{{else}}not recorded{{end}}</td></tr>
<tr><th>seed</th><td>{{if .Seed}}{{.Seed}}{{else}}none (no sampling){{end}}</td></tr>
<tr><th>units of the result document</th><td>{{if .Units}}{{.Units}}{{else}}N-mm-MPa{{end}}</td></tr>
</table>
<p class="muted">The same study file, seed and tool version give the same numbers, whatever the number of workers.</p>
{{if .StudyText}}<details class="study"><summary>The study file as run (SHA-256 <code>{{.InputSHA}}</code>)</summary>
<pre class="study">{{.StudyText}}</pre>
</details>
<div class="print-only"><h3>The study file as run</h3>
<p class="muted">SHA-256 <code>{{.InputSHA}}</code></p>
<pre class="study">{{.StudyText}}</pre></div>{{end}}
</section>

<section id="cautions">
<h2>Cautions</h2>
<p class="caution">{{.Caution}}</p>
<ul>
<li>The probability of failure is that of the stated model: the distributions, correlations and capacity model written in the study. Gross errors, and actions or deterioration not written in the study, are outside it.</li>
<li>Intervals describe the sampling error of the estimate only, not the uncertainty of the inputs' own parameters.</li>
<li>Sensitivity measures rank the inputs as modelled; Sobol indices assume independent inputs.</li>
</ul>
</section>
</body>
</html>
{{define "fig"}}<figure id="fig-{{.Name}}">
{{.SVG}}
<figcaption>{{.Caption}}</figcaption>
</figure>{{end}}
`
