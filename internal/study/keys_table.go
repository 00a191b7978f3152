package study

// keyTables is the registry of the study file's tables and keys: the one
// list the parser checks names and choices against and `strutrisk help
// keys` prints. A new key is a row here and its reading in the parser.
// "quantity" means a bare number in the study's units, a string with a
// unit or a distribution table { dist = ... }.
var keyTables = []*TableInfo{
	{Path: "", Meaning: "The top of the file.", Keys: []KeyInfo{
		{Name: "title", Takes: "text", Default: "the file name", Meaning: "The study's title, shown in every report."},
		{Name: "units", Takes: "text", Choices: []string{"N-mm", "kN-m", "kip-in"}, Default: "N-mm",
			Meaning: "The unit system of bare numbers: N-mm (N, mm, MPa), kN-m (kN, m, kPa), kip-in (kip, in, ksi)."},
	}},
	{Path: "member", Meaning: "The member: its length and end conditions, one specification per axis.", Keys: []KeyInfo{
		{Name: "length", Takes: "quantity (length)", Required: true, Meaning: "The member length between its ends."},
		{Name: "k", Takes: "quantity (number), once or { major, minor }", Default: "1 (pinned-pinned) with a warning, when an axis has no k, ends or springs",
			Meaning: "The effective length factor K."},
		{Name: "k_major", Takes: "quantity (number)", Meaning: "K of the major axis alone."},
		{Name: "k_minor", Takes: "quantity (number)", Meaning: "K of the minor axis alone."},
		{Name: "ends", Takes: "text", Choices: []string{"pinned-pinned", "fixed-free", "free-fixed", "fixed-fixed", "fixed-pinned", "pinned-fixed"},
			Meaning: "Classic end conditions of both axes."},
		{Name: "spring_top", Takes: "quantity (rotational stiffness, moment per radian), once or { major, minor }",
			Meaning: "The rotational restraint of the top end: 0 pinned, \"rigid\" fixed; needs spring_bottom."},
		{Name: "spring_bottom", Takes: "quantity (rotational stiffness, moment per radian), once or { major, minor }",
			Meaning: "The rotational restraint of the bottom end: 0 pinned, \"rigid\" fixed; needs spring_top."},
	}},
	{Path: "member.section", Meaning: "The cross-section: a shape and the dimensions that shape takes.", Keys: []KeyInfo{
		{Name: "shape", Takes: "text", Choices: []string{"I", "RHS", "CHS", "rect", "round", "custom"}, Required: true,
			Meaning: "I: depth width flange web (root); RHS: depth width thickness; CHS: diameter thickness; rect: depth width; round: diameter; custom: area i_major i_minor c_major c_minor."},
		{Name: "depth", Takes: "quantity (length)", Meaning: "Overall depth (I, RHS, rect)."},
		{Name: "width", Takes: "quantity (length)", Meaning: "Overall width (I, RHS, rect)."},
		{Name: "flange", Takes: "quantity (length)", Meaning: "Flange thickness (I)."},
		{Name: "web", Takes: "quantity (length)", Meaning: "Web thickness (I)."},
		{Name: "root", Takes: "quantity (length)", Default: "0", Meaning: "Root radius between web and flanges (I)."},
		{Name: "thickness", Takes: "quantity (length)", Meaning: "Wall thickness (RHS, CHS)."},
		{Name: "diameter", Takes: "quantity (length)", Meaning: "Outside diameter (CHS, round)."},
		{Name: "area", Takes: "quantity (area)", Meaning: "Area (custom)."},
		{Name: "i_major", Takes: "quantity (second moment of area)", Meaning: "Second moment of area about the major axis (custom)."},
		{Name: "i_minor", Takes: "quantity (second moment of area)", Meaning: "Second moment of area about the minor axis (custom)."},
		{Name: "c_major", Takes: "quantity (length)", Meaning: "Distance from the major axis to the extreme fibre (custom)."},
		{Name: "c_minor", Takes: "quantity (length)", Meaning: "Distance from the minor axis to the extreme fibre (custom)."},
		{Name: "thickness_loss", Takes: "quantity (length)", Default: "0",
			Meaning: "Corrosion loss from every face (not on custom): I sections lose it on both faces of flanges and web, RHS and CHS on the outside."},
	}},
	{Path: "material", Meaning: "The material.", Keys: []KeyInfo{
		{Name: "modulus", Takes: "quantity (stress)", Required: true, Meaning: "The elastic modulus."},
		{Name: "yield", Takes: "quantity (stress)", Required: true, Meaning: "The yield strength."},
	}},
	{Path: "imperfection", Meaning: "Geometric imperfections; both act by their magnitude.", Keys: []KeyInfo{
		{Name: "bow", Takes: "quantity (length, or \"L/n\")", Default: "none", Meaning: "The out-of-straightness at mid-length."},
		{Name: "eccentricity", Takes: "quantity (length, or \"L/n\")", Default: "none", Meaning: "The load eccentricity at both ends."},
	}},
	{Path: "capacity", Meaning: "The capacity model.", Keys: []KeyInfo{
		{Name: "model", Takes: "text", Choices: []string{"perry-robertson", "secant", "curve", "beam-column"}, Default: "perry-robertson",
			Meaning: "How the capacity is computed."},
		{Name: "axis", Takes: "text", Choices: []string{"both", "major", "minor"}, Default: "both",
			Meaning: "The axes checked; with both each sample takes the weaker."},
		{Name: "curve", Takes: "text (a0 a b c d), once or { major, minor }", Meaning: "The buckling curve of EN 1993-1-1 Table 6.1 (model curve)."},
		{Name: "alpha", Takes: "quantity (number), once or { major, minor }", Meaning: "The imperfection factor, instead of curve (model curve)."},
		{Name: "limit", Takes: "text", Choices: []string{"first-yield", "ultimate"}, Default: "first-yield",
			Meaning: "Where the beam-column stops (model beam-column)."},
		{Name: "residual_stress", Takes: "text", Choices: []string{"none", "hot-rolled", "welded", "cold-formed"}, Default: "none",
			Meaning: "The residual stress pattern (model beam-column, limit ultimate)."},
		{Name: "profile", Takes: "list of lengths (3 or more)", Meaning: "Measured bow offsets at equal spacing along the member (model beam-column)."},
		{Name: "model_factor", Takes: "quantity (number)", Default: "1", Meaning: "Multiplies the capacity: the model's uncertainty."},
	}},
	{Path: "loads", Meaning: "Axial loads, summed; compression positive.", Keys: []KeyInfo{
		{Name: "effect_factor", Takes: "quantity (number)", Default: "1", Meaning: "Multiplies the sum of the loads: the uncertainty of the load effect."},
		{Name: "<name>", Takes: "quantity (force)", Required: true, Meaning: "An axial load under a name of your choice (at least one), e.g. dead, imposed."},
	}},
	{Path: "correlation", Array: true, Meaning: "A correlation between two random variables (Nataf).", Keys: []KeyInfo{
		{Name: "pair", Takes: "list of two variable paths", Required: true, Meaning: "The two random variables, by path, e.g. [\"material.yield\", \"material.modulus\"]."},
		{Name: "rho", Takes: "number", Required: true, Meaning: "The correlation coefficient, strictly between -1 and 1."},
	}},
	{Path: "target", Meaning: "The target reliability and the reserve factor.", Keys: []KeyInfo{
		{Name: "beta", Takes: "number (0 to 10)", Required: true, Meaning: "The target reliability index, e.g. 3.8."},
		{Name: "reference_period", Takes: "text", Meaning: "A note for the report, e.g. \"50 years\"."},
		{Name: "reserve_on", Takes: "text", Choices: []string{"variable", "all"}, Default: "variable", Meaning: "The loads the reserve factor multiplies."},
		{Name: "permanent", Takes: "list of load names", Default: "the loads named dead, permanent, self_weight, superimposed_dead",
			Meaning: "The permanent loads; every other load is variable."},
	}},
	{Path: "measurements", Meaning: "Test results that update a distribution of the study (EN 1990 Annex D).", Keys: []KeyInfo{
		{Name: "yield", Takes: "table", Meaning: "Updates material.yield."},
		{Name: "modulus", Takes: "table", Meaning: "Updates material.modulus."},
		{Name: "bow", Takes: "table", Meaning: "Updates imperfection.bow."},
		{Name: "thickness_loss", Takes: "table", Meaning: "Updates member.section.thickness_loss."},
	}},
	{Path: "measurements.*", Meaning: "One set of test results (yield, modulus, bow or thickness_loss).", Keys: []KeyInfo{
		{Name: "values", Takes: "list of quantities", Required: true, Meaning: "The test results, each positive."},
		{Name: "prior_tests", Takes: "number", Default: "0", Meaning: "How many tests the study's distribution weighs for the mean."},
		{Name: "prior_dof", Takes: "number", Default: "0", Meaning: "How many degrees of freedom the study's distribution weighs for the spread."},
		{Name: "cov", Takes: "number", Meaning: "A known coefficient of variation (instead of prior_dof)."},
	}},
	{Path: "analysis", Meaning: "The estimator and its budget.", Keys: []KeyInfo{
		{Name: "method", Takes: "text", Choices: []string{"auto", "monte-carlo", "latin-hypercube", "form", "importance", "subset", "conditional-qmc"},
			Default: "auto", Meaning: "The estimator of the probability of failure."},
		{Name: "samples", Takes: "whole number (1 to 1e10)", Default: "1000000", Meaning: "At most this many evaluations."},
		{Name: "target_cov", Takes: "number (0 to 1)", Default: "0.05", Meaning: "Sampling stops once the coefficient of variation of pf is this."},
		{Name: "seed", Takes: "whole number", Default: "1", Meaning: "The seed of the random numbers: same seed, same numbers."},
	}},
	{Path: "sensitivity", Meaning: "Sensitivity studies.", Keys: []KeyInfo{
		{Name: "tornado", Takes: "true/false or { low, high }", Default: "true, between the 0.05 and 0.95 fractiles",
			Meaning: "Moves each input to a low and a high fractile."},
		{Name: "sobol", Takes: "true/false or { samples }", Default: "true, 2048 samples (off for model beam-column)",
			Meaning: "Sobol indices of the margin and of the capacity."},
	}},
	{Path: "sweep", Meaning: "Repeats the study over the values of one key.", Keys: []KeyInfo{
		{Name: "parameter", Takes: "text (a key path)", Required: true, Meaning: "A quantity's path, or a distribution's parameter such as \"loads.imposed.mean\"."},
		{Name: "values", Takes: "list of quantities", Meaning: "The swept values (or from, to and steps)."},
		{Name: "from", Takes: "quantity", Meaning: "The first value of a range."},
		{Name: "to", Takes: "quantity", Meaning: "The last value of a range."},
		{Name: "steps", Takes: "whole number (2 to 200)", Meaning: "The number of values of a range."},
		{Name: "scale", Takes: "text", Choices: []string{"linear", "log"}, Default: "linear", Meaning: "The spacing of a range; log needs positive ends."},
	}},
	{Path: "variant", Array: true, Meaning: "A named alternative of the study: keys set to other values.", Keys: []KeyInfo{
		{Name: "name", Takes: "text", Required: true, Meaning: "The variant's name, unique."},
		{Name: "set", Takes: "table of key paths and values", Required: true,
			Meaning: "The keys the variant changes, e.g. { \"imperfection.bow\" = \"L/500\" }; \"unset\" removes a key."},
	}},
	{Path: "output", Meaning: "Where the results go.", Keys: []KeyInfo{
		{Name: "dir", Takes: "text (a folder)", Default: "out/<study name>", Meaning: "The output folder."},
		{Name: "formats", Takes: "list of text", Choices: []string{"html", "json", "csv", "svg", "png", "txt"}, Default: "html, json, csv, svg, png",
			Meaning: "The files written."},
	}},
}
