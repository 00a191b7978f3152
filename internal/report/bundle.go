package report

import "strutrisk/sim"

// Bundle is everything a report is drawn from: the result document plus
// the data behind the tables and pictures. The caller (internal/analysis) fills it;
// report only presents it. Nil or empty parts are left out of the report.
type Bundle struct {
	// Doc is the result document, written as results.json.
	Doc *Document
	// StudyFile is the path of the study as the user gave it.
	StudyFile string
	// ReportPath is the HTML report's path relative to the results folder
	// ("report.html"), named by the summary; "" when no HTML report is
	// written. Relative, so that the summary is the same wherever the
	// folder is (a merged run's folder equals the single run's).
	ReportPath string
	// StudyText is the study file byte for byte (the bytes of
	// Doc.InputSHA256): the HTML report embeds it, collapsed.
	StudyText []byte
	// Inputs lists every input of the study, random or not.
	Inputs []Input
	// Check is the deterministic check at nominal values.
	Check []CheckRow
	// Defaults lists the defaults that applied (each one line).
	Defaults []string
	// Capacity, Demand and Margin summarise the sampled capacity, demand and
	// limit state g (N); NominalCapacity is marked on the histogram.
	Capacity, Demand, Margin *sim.OutputStats
	NominalCapacity          float64
	// Governs says what governs the nominal capacity and by which limit
	// ("the minor axis, first-yield"); NominalDemand is the demand at the
	// mean loads (N) and Utilisation their ratio (the summary's first line).
	Governs       string
	NominalDemand float64
	Utilisation   float64
	// MethodReason says why the method was chosen or how it worked.
	MethodReason string
	// Cases are the sweep and variants as the summary tabulates them.
	Cases *CaseTable
	// InventoryColumns are the inventory's columns (key paths), written
	// after the results in inventory.csv.
	InventoryColumns []string
	// InventoryShared are the key paths of the inputs the inventory's
	// members share and the columns that group them: the picture of beta
	// against a column does not choose them.
	InventoryShared []string
	// InventoryAgainst is the column [inventory] plot_against names, ""
	// when the picture chooses one.
	InventoryAgainst string
	// InventoryUnits are the units the inventory's header gives its
	// columns, by column (the cells then hold bare numbers).
	InventoryUnits map[string]string
	// Convergence traces pf and its band against evaluations; TraceKind says
	// (TraceKind) what its points are (subset simulation's levels are not estimates).
	Convergence []sim.ConvergencePoint
	TraceKind   sim.Trace
	// Replicates are independent estimates of pf whose mean is the
	// estimate (sim.Result.Replicates); ReplicateName names one, e.g.
	// "randomisation" or "run". With a trace of fewer than four points
	// the convergence picture draws them instead.
	Replicates    []float64
	ReplicateName string
	// Samples is the kept sample table, written as samples.csv.
	Samples *sim.Samples
	// Diagnostics are method facts (evaluations, CoV, FORM status, why the
	// method was chosen), shown as a two-column table.
	Diagnostics []KV
	// TornadoOutput names the output of the tornado chart, e.g.
	// "capacity (kN)"; TornadoBase is its value with every input at median.
	TornadoOutput string
	TornadoBase   float64
	// SobolOutput says what the Sobol indices are of, e.g. "indicator of
	// failure" or "capacity"; SobolNote carries caveats (correlations).
	SobolOutput, SobolNote string
	// Spearman holds the rank correlation of each input with the margin.
	Spearman []KV
	// Slenderness is the capacity-against-relative-slenderness picture.
	Slenderness *SlendernessChart
	// Interaction is the axial force against bending moment picture of a
	// study with bending (plot_interaction.go); with it the capacity,
	// demand and margin are load factors (dimensionless).
	Interaction *InteractionChart
	// Series are curves of beta against a swept parameter, one per variant
	// (a single unnamed series for a plain sweep); SweepLabel names the axis.
	Series     []Series
	SweepLabel string
	// SweepLambda, when the swept values change it, is the study's nominal
	// relative slenderness at each swept value (by value), about the axis
	// SweepLambdaAxis ("major" or "minor", the one governing the study).
	SweepLambda     map[float64]float64
	SweepLambdaAxis string
	// Updates are prior and updated distributions from measurements.
	Updates []Update
	// Trace is the beam-column load-deflection path at the design point.
	Trace *Trace
	// TornadoBeta, when not empty, holds the rows of sim.Tornado run with
	// FORM set: the reliability index with each input fixed at its low and
	// high value. It is drawn about Doc.FORM.Beta and tabulated beside the
	// tornado of TornadoOutput.
	TornadoBeta []sim.TornadoRow
	// SobolCapacity, when not empty, holds the Sobol indices of the
	// capacity, drawn and tabulated beside those of SobolOutput.
	SobolCapacity []sim.SobolIndex
	// ByMagnitude names the inputs that act by their magnitude (a bow or an
	// eccentricity, either side of the member): both of their fractiles
	// can move a result the same way, and the tornado captions say so.
	ByMagnitude []string
	// StudyModel and VariantModels (by variant name) are the capacity
	// models of the study and of its variants: they style the variants
	// picture as every other (modelStyle).
	StudyModel    string
	VariantModels map[string]string
}

// Input is one row of the inputs table.
type Input struct {
	Name   string // path in the study file, e.g. "material.yield"
	Dist   string // distribution name, or "fixed"
	Params string // parameters as written, e.g. "mean 300 MPa, cov 0.07"
	Mean   float64
	CoV    float64 // 0 for a fixed value
	Unit   string
}

// CheckRow is one line of the deterministic check: a quantity per axis.
type CheckRow struct {
	Quantity     string
	Major, Minor string
	Unit         string
}

// KV is a labelled value already formatted for reading.
type KV struct {
	Key, Value string
}

// SlendernessChart holds deterministic capacity curves against relative
// slenderness (capacity / squash load) and a cloud of sampled members.
type SlendernessChart struct {
	Curves []Curve
	// Cloud are sampled (relative slenderness, capacity ratio) points.
	Cloud [][2]float64
	// Member is the nominal member's point.
	Member [2]float64
}

// Curve is a named line. Model names the capacity model it is drawn with
// ("perry-robertson", "secant", "curve", "beam-column", "euler"): every
// line of one model has one colour and line style in every picture (see
// modelStyle). Axis is "major" or "minor" when the curve is about one axis.
// Note, when set, says where the curve comes from and goes in the caption.
type Curve struct {
	Name, Model, Axis, Note string
	X, Y                    []float64
}

// Series is beta (with interval) against a swept value, for one variant.
// Model is the case's capacity model: it styles the series (modelStyle).
type Series struct {
	Name, Model string
	Points      []Point
}

// Update shows the prior and updated (predictive) densities of a variable.
type Update struct {
	Variable     string
	Unit         string
	Prior, After sim.Dist
	Data         []float64
}

// Trace is a load-deflection path and a deflected shape.
type Trace struct {
	Deflection, Load []float64 // path: lateral deflection (mm), load (N)
	Position, Shape  []float64 // deflected shape at the limit: x (mm), v (mm)
}
