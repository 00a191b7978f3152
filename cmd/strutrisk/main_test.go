package main

import (
	"bytes"
	"encoding/json"
	"math"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"strutrisk/internal/fixture"
	"strutrisk/internal/report"
)

// invoke runs the command in-process and returns its status and output.
func invoke(t *testing.T, args ...string) (code int, stdout, stderr string) {
	t.Helper()
	var o, e bytes.Buffer
	code = run(args, &o, &e)
	return code, o.String(), e.String()
}

// writeStudy writes a study file into a fresh folder and returns its path.
func writeStudy(t *testing.T, text string) string {
	t.Helper()
	p := filepath.Join(t.TempDir(), "study.toml")
	if err := os.WriteFile(p, []byte(text), 0o644); err != nil {
		t.Fatal(err)
	}
	return p
}

// good is fixture.Good.
const good = fixture.Good

// sec replaces the rect section of good by the lines of another shape
// (from line 6 on).
func sec(lines string) string {
	return strings.Replace(good, "shape = \"rect\"\ndepth = 100\nwidth = 50\n", lines, 1)
}

// edit replaces line n (1-based) of good by repl (which may hold several
// lines, or none to delete it).
func edit(n int, repl string) string {
	lines := strings.Split(good, "\n")
	lines[n-1] = repl
	return strings.Join(lines, "\n")
}

func TestGoodStudyChecks(t *testing.T) {
	code, out, errs := invoke(t, "check", writeStudy(t, good))
	if code != 0 {
		t.Fatalf("check exit %d, stderr:\n%s", code, errs)
	}
	for _, want := range []string{"test strut", "minor axis governs", "utilisation", "Caution"} {
		if !strings.Contains(out, want) {
			t.Errorf("check output lacks %q:\n%s", want, out)
		}
	}
}

// TestBadStudies: each broken study exits 2 and names the key and its line.
func TestBadStudies(t *testing.T) {
	for _, c := range []struct {
		name, study string
		want        []string // fragments of stderr, e.g. "study.toml:11: material.yield:"
	}{
		{"fabrication for the shape", edit(8, "width = 50\nfabrication = \"welded\""), []string{"study.toml:9: member.section.fabrication: a rect section cannot be \"welded\": use \"hot-rolled\""}},
		{"effective_area above the area", strings.Replace(good, "shape = \"rect\"\ndepth = 100\nwidth = 50", "shape = \"custom\"\narea = 5000\ni_major = 4e6\ni_minor = 1e6\nc_major = 50\nc_minor = 25\neffective_area = 6000", 1), []string{"study.toml:12: member.section.effective_area: effective_area 6000 mm2 is larger than area 5000 mm2"}},
		{"effective_area on a rect", edit(8, "width = 50\neffective_area = 4000"), []string{"study.toml:9: member.section.effective_area: shape rect does not take effective_area"}},
		{"fabrication unknown", edit(8, "width = 50\nfabrication = \"rolled\""), []string{"study.toml:9: member.section.fabrication: \"rolled\" is not a choice"}},
		{"radius on a rect", edit(8, "width = 50\nradius = 5"), []string{"study.toml:9: member.section.radius: shape rect does not take radius"}},
		{"radius negative", edit(6, "shape = \"RHS\"\nthickness = 5\nradius = -1"), []string{"study.toml:8: member.section.radius:"}},
		{"radius too large", edit(6, "shape = \"RHS\"\nthickness = 5\nradius = 30"), []string{"member.section: section: corner radius 30 mm must be zero or positive and at most half the smaller side"}},
		{"class 4 CHS", strings.Replace(good, "shape = \"rect\"\ndepth = 100\nwidth = 50", "shape = \"CHS\"\ndiameter = 1000\nthickness = 5", 1), []string{"study.toml:5: member.section: the CHS is class 4", "give capacity.model_factor"}},
		{"class 4 ultimate", strings.Replace(edit(6, "shape = \"RHS\"\nthickness = 1.5"), "[loads]", "[capacity]\nmodel = \"beam-column\"\nlimit = \"ultimate\"\n[loads]", 1), []string{"study.toml:17: capacity.limit: the section is class 4"}},
		{"repetitions not whole", edit(16, `imposed = { dist = "gumbel", mean = "80 kN", cov = 0.3, repetitions = 2.5 }`), []string{"study.toml:16: loads.imposed: repetitions = 2.5 must be a whole number"}},
		{"companion on a permanent load", edit(15, `dead = { dist = "normal", mean = "100 kN", cov = 0.1, companion = "50 kN" }`), []string{"study.toml:15: loads.dead: companion: a companion applies to a random variable load"}},
		{"ferry-borges without repetitions", edit(16, `imposed = { dist = "gumbel", mean = "80 kN", cov = 0.3 }`+"\nwind = { dist = \"gumbel\", mean = \"8 kN\", cov = 0.3, repetitions = 10 }\n[combination]\nrule = \"ferry-borges-castanheta\""),
			[]string{"study.toml:16: loads.imposed: combination.rule = \"ferry-borges-castanheta\" needs repetitions"}},
		{"bending on a round section without axis", sec("shape = \"round\"\ndiameter = 80\n") + "[bending]\nlateral = \"1 kN/m\"\n", []string{"study.toml:18: bending: a round section has no major or minor axis of its own"}},
		{"bending tied to an unknown load", good + "[bending]\ntop = { load = \"imposd\", ratio = \"0.1 m\" }\n", []string{"study.toml:20: bending.top.load: \"imposd\" is not a load in [loads]; did you mean \"imposed\"?"}},
		{"bending axis misspelt", good + "[bending]\naxis = \"majr\"\nlateral = 1\n", []string{"study.toml:20: bending.axis: \"majr\" is not a choice; did you mean \"major\"?"}},
		{"bending without a moment", good + "[bending]\naxis = \"major\"\n", []string{"study.toml:19: bending: no moment and no lateral load"}},
		{"bending tied without ratio", good + "[bending]\ntop = { load = \"dead\" }\n", []string{"study.toml:20: bending.top: a moment tied to a load needs ratio"}},
		{"bending lateral as a force", good + "[bending]\nlateral = \"1 kN\"\n", []string{"study.toml:20: bending.lateral: \"1 kN\" is a force but this key takes a force per length"}},
		{"bending misspelt key", good + "[bending]\nlaterl = \"1 kN/m\"\n", []string{"study.toml:20: bending.laterl: unknown key in [bending]; did you mean bending.lateral?"}},
		{"bending curve on an angle", sec("shape = \"angle\"\ndepth = 80\nwidth = 80\nthickness = 8\n") + "[capacity]\nmodel = \"curve\"\n[bending]\nlateral = 1\n", []string{"study.toml:21: capacity.model: model \"curve\" with [bending] is the EN 1993-1-1 6.3.3 interaction", "for this angle section"}},
		{"bending about the axis not checked", good + "[capacity]\naxis = \"minor\"\n[bending]\nlateral = 1\n", []string{"study.toml:20: capacity.axis: \"minor\" checks one axis, but [bending] bends the member about its major axis"}},
		{"calibration without normalised loads", good + "[calibration]\nfactor = \"gamma_m1\"\nrange = [1.0, 1.3]\ntarget_beta = 3.8\n", []string{"study.toml:20: calibration.factor: calibrating gamma_m1 needs code_check.normalise = \"design\""}},
		{"typo key", edit(11, `yeild = 250`), []string{"study.toml:11: material.yeild: unknown key", "did you mean material.yield?", "1 problem in"}}, // the typo, not also a missing yield
		{"unknown table", good + "[materail]\nx = 1\n", []string{"study.toml:19: materail: unknown key", "did you mean material?"}},
		{"negative cov", edit(11, `yield = { dist = "lognormal", mean = 250, cov = -0.1 }`), []string{"study.toml:11: material.yield: cov = -0.1 must be between 0 and 1"}},
		{"negative sd", edit(15, `dead = { dist = "normal", mean = "100 kN", sd = "-5 kN" }`), []string{"study.toml:15: loads.dead: sd = -5000 N must be positive"}},
		{"zero cov", edit(11, `yield = { dist = "lognormal", mean = 250, cov = 0 }`), []string{"study.toml:11: material.yield: cov = 0 is no spread"}},
		{"uniform below zero", edit(4, `k = { dist = "uniform", min = -0.1, max = 1.0 }`), []string{"study.toml:4: member.k: min = -0.1 lets member.k take values that are not positive"}},
		{"gumbel below zero", edit(10, `modulus = { dist = "gumbel", mean = 200000, cov = 0.6 }`), []string{"study.toml:10: material.modulus: this gumbel distribution goes negative"}},
		{"wrong unit in a distribution", edit(11, `yield = { dist = "lognormal", mean = "250 kN", cov = 0.1 }`), []string{"study.toml:11: material.yield: mean: \"250 kN\" is a force but this key takes a stress"}},
		{"zero sd", edit(15, `dead = { dist = "normal", mean = "100 kN", sd = 0 }`), []string{"study.toml:15: loads.dead: sd = 0 is no spread"}},
		{"wrong dimension", edit(3, `length = "2 kN"`), []string{"study.toml:3: member.length: \"2 kN\" is a force but this key takes a length"}},
		{"unknown unit", edit(10, `modulus = "200 GPas"`), []string{"study.toml:10: material.modulus: unknown unit \"GPas\""}},
		{"missing length", edit(3, ``), []string{"study.toml:2: member.length: missing"}},
		{"missing table", strings.Replace(good, "[loads]\ndead = { dist = \"normal\", mean = \"100 kN\", cov = 0.1 }\nimposed = { dist = \"gumbel\", mean = \"80 kN\", cov = 0.3 }\n", "", 1), []string{"study.toml: loads: missing table [loads]"}},
		{"fractile", edit(11, `yield = { dist = "lognormal", characteristic = 235, fractile = 1.5, cov = 0.07 }`), []string{"study.toml:11: material.yield: fractile = 1.5 must be between 0 and 1"}},
		{"min above max", edit(4, `k_major = 1.0`+"\n"+`k_minor = { dist = "uniform", min = 1.0, max = 0.7 }`), []string{"study.toml:5: member.k_minor: min = 1 must be less than max = 0.7"}},
		{"two end specs", edit(4, `ends = "pinned-pinned"`+"\n"+`k_minor = 0.7`), []string{"study.toml:5: member.k_minor: the minor axis has two end specifications"}},
		{"unknown dist", edit(11, `yield = { dist = "lognormel", mean = 250, cov = 0.1 }`), []string{"study.toml:11: material.yield: dist: unknown distribution \"lognormel\"; did you mean \"lognormal\"?"}},
		{"incomplete set", edit(11, `yield = { dist = "lognormal", mean = 250 }`), []string{"study.toml:11: material.yield: lognormal needs mean + sd or mean + cov"}},
		{"unknown parameter", edit(11, `yield = { dist = "lognormal", mean = 250, sdd = 20 }`), []string{"study.toml:11: material.yield: sdd: unknown parameter; did you mean \"sd\"?"}},
		{"sub-table form", edit(11, "[material.yield]\ndist = \"lognormal\"\nmean = 250\ncov = 1.5"), []string{"study.toml:14: material.yield: cov = 1.5 must be between 0 and 1"}},
		{"two sets", edit(11, `yield = { dist = "lognormal", mean = 250, cov = 0.1, sd = 20 }`), []string{"study.toml:11: material.yield: give one set of parameters"}},
		{"L/n outside imperfection", edit(3, `length = "L/2"`), []string{"study.toml:3: member.length: \"L/2\": the form L/n is only for imperfections"}},
		{"corr unknown variable", good + "[[correlation]]\npair = [\"material.yeild\", \"loads.dead\"]\nrho = 0.3\n", []string{"study.toml:20: correlation[0].pair: \"material.yeild\" is not a random variable of this study; did you mean \"material.yield\"?"}},
		{"corr fixed quantity", good + "[[correlation]]\npair = [\"material.modulus\", \"material.yield\"]\nrho = 0.3\n", []string{"study.toml:20: correlation[0].pair: \"material.modulus\" is a fixed quantity"}},
		{"corr not pd", good + "[[correlation]]\npair = [\"material.yield\", \"loads.dead\"]\nrho = 0.9\n[[correlation]]\npair = [\"loads.dead\", \"loads.imposed\"]\nrho = 0.9\n[[correlation]]\npair = [\"material.yield\", \"loads.imposed\"]\nrho = -0.9\n", []string{"correlation: the correlation coefficients do not form a positive definite matrix"}},
		{"rho out of range", good + "[[correlation]]\npair = [\"material.yield\", \"loads.dead\"]\nrho = 1.2\n", []string{"study.toml:21: correlation[0].rho: rho = 1.2 must lie strictly between -1 and 1"}},
		{"huge samples", good + "[analysis]\nsamples = 1e12\n", []string{"study.toml:20: analysis.samples: 1e+12 is more than 1e+10"}},
		{"nan", edit(10, `modulus = nan`), []string{"study.toml:10: material.modulus: NaN is not a usable number"}},
		{"negative length", edit(3, `length = -2000`), []string{"study.toml:3: member.length: a length must be positive"}},
		{"negative lower", edit(13, `bow = 2`+"\n"+`eccentricity = 0`) + "[capacity]\nmodel_factor = { dist = \"normal\", mean = 1, sd = 0.1, lower = -1 }\n", []string{"study.toml:21: capacity.model_factor: lower = -1 lets capacity.model_factor take negative values"}},
		{"custom i_minor > i_major", strings.Replace(good, "shape = \"rect\"\ndepth = 100\nwidth = 50\n", "shape = \"custom\"\narea = 5000\ni_major = 1e6\ni_minor = 4e6\nc_major = 50\nc_minor = 25\n", 1), []string{"study.toml:9: member.section.i_minor: i_minor is larger than i_major"}},
		{"thickness loss custom", strings.Replace(good, "shape = \"rect\"\ndepth = 100\nwidth = 50\n", "shape = \"custom\"\narea = 5000\ni_major = 4e6\ni_minor = 1e6\nc_major = 50\nc_minor = 25\nthickness_loss = 1\n", 1), []string{"study.toml:12: member.section.thickness_loss: a custom section has no faces"}},
		{"perry needs bow", edit(13, ``), []string{"imperfection.bow: missing: model perry-robertson needs an initial bow"}},
		{"unknown model", good + "[capacity]\nmodel = \"perry\"\n", []string{"study.toml:20: capacity.model: \"perry\" is not a choice; did you mean \"perry-robertson\"?"}},
		{"bad shape key", edit(8, `width = 50`+"\n"+`flange = 8`), []string{"study.toml:9: member.section.flange: shape rect does not take flange"}},
		{"bad toml", edit(11, `yield = { dist = "lognormal", mean = 250, cov = 0.1`), []string{"study.toml:12:", "not valid TOML"}}, // the parser sees the error on the next line
		{"bad toml value", edit(3, `length = 2 m`), []string{"study.toml:3:", "not valid TOML"}},
		{"effect factor typo", edit(16, `imposed = 80000`+"\neffect_facter = 1.1"), []string{"study.toml:17: loads.effect_facter: unknown key in [loads]; did you mean loads.effect_factor?"}},
		{"units", "units = \"kN-mm\"\n" + good, []string{"study.toml:1: units: \"kN-mm\" is not a choice"}},
		{"beta and consequence", edit(18, "beta = 3.8\nconsequence = \"medium\""), []string{"study.toml:18: target.beta: give the target either as beta or by consequence"}},
		{"cost without consequence", edit(18, `cost_of_safety = "normal"`), []string{"study.toml:18: target.cost_of_safety: cost_of_safety needs a consequence too"}},
		{"unknown consequence", edit(18, `consequence = "CC2"`), []string{"study.toml:18: target.consequence: \"CC2\" is not a choice"}},
		{"angle zero leg", sec("shape = \"angle\"\ndepth = 100\nwidth = 100\nthickness = 0\n"), []string{"study.toml:9: member.section.thickness: a length must be positive"}},
		{"angle leg too thick", sec("shape = \"angle\"\ndepth = 100\nwidth = 10\nthickness = 10\n"), []string{"study.toml:5: member.section: section: leg thickness 10 mm leaves no leg"}},
		{"angle flange", sec("shape = \"angle\"\ndepth = 100\nwidth = 100\nthickness = 10\nflange = 8\n"), []string{"study.toml:10: member.section.flange: shape angle does not take flange"}},
		{"tee without web", sec("shape = \"tee\"\ndepth = 12\nwidth = 150\nflange = 12\nweb = 8\n"), []string{"study.toml:5: member.section: section: flange thickness 12 mm leaves no web"}},
		{"channel missing web", sec("shape = \"channel\"\ndepth = 200\nwidth = 75\nflange = 11\n"), []string{"member.section.web: missing: shape channel needs depth, width, flange, web"}},
		{"custom iw unit", sec("shape = \"custom\"\narea = 5000\ni_major = 4e6\ni_minor = 1e6\nc_major = 50\nc_minor = 25\nit = 1e5\niw = \"5 cm4\"\n"), []string{"study.toml:13: member.section.iw: \"5 cm4\" is a second moment of area but this key takes a warping constant"}},
		{"custom iw without it", sec("shape = \"custom\"\narea = 5000\ni_major = 4e6\ni_minor = 1e6\nc_major = 50\nc_minor = 25\niw = 1e9\n"), []string{"study.toml:5: member.section: section: a warping constant or shear-centre position needs the torsion constant it too"}},
		{"negative it", sec("shape = \"custom\"\narea = 5000\ni_major = 4e6\ni_minor = 1e6\nc_major = 50\nc_minor = 25\nit = -1\n"), []string{"study.toml:12: member.section.it:", "must be zero or positive"}},
		{"negative shear modulus", edit(10, "modulus = 200000\nshear_modulus = -80000"), []string{"study.toml:11: material.shear_modulus: a stress must be positive"}},
		{"ultimate beam-column on a tee", sec("shape = \"tee\"\ndepth = 150\nwidth = 150\nflange = 12\nweb = 12\n") + "[capacity]\nmodel = \"beam-column\"\nlimit = \"ultimate\"\n",
			[]string{"study.toml:23: capacity.limit: the ultimate beam-column has no fibre section for a tee", "1 problem in"}},
		{"beam-column on a twisting angle", strings.Replace(sec("shape = \"angle\"\ndepth = 100\nwidth = 100\nthickness = 10\n"), "length = 2000", "length = 600", 1) + "[capacity]\nmodel = \"beam-column\"\n",
			[]string{"study.toml:21: capacity.model: the lowest elastic critical load is flexural-torsional buckling", "use model \"curve\""}},
		// Imperfections in the buckling mode, sway and the equivalent imperfection (lcr.go, imperfections.go).
		{"Lcr/n outside imperfection", edit(3, `length = "Lcr/2"`), []string{"study.toml:3: member.length: \"Lcr/2\": the form Lcr/n is only for imperfections"}},
		{"Lcr/0", edit(13, `bow = "Lcr/0"`), []string{"study.toml:13: imperfection.bow: \"Lcr/0\": write Lcr/n with a non-zero number n"}},
		{"Lcr mixed", edit(13, `bow = { dist = "normal", mean = "Lcr/1000", sd = "1 mm" }`), []string{"study.toml:13: imperfection.bow: mixes Lcr/n with L/n or lengths with a unit"}},
		{"measured bow not Lcr", edit(13, `bow = { dist = "lognormal", mean = "Lcr/1000", cov = 0.5 }`) + "[measurements]\nbow = { values = [\"3 mm\", \"2 mm\"], cov = 0.3 }\n", []string{"study.toml:20: measurements.bow.values[0]: imperfection.bow is written as Lcr/n", "write the measured bows as Lcr/n too"}},
		{"sway on a braced member", edit(13, "bow = 2\nsway = \"1/200\""), []string{"study.toml:14: imperfection.sway: the member is braced about the axes checked (major (K = 1) and minor (K = 1))", "ends = \"fixed-free\""}},
		{"sway not a fraction", edit(13, "bow = 2\nsway = \"1/0\""), []string{"study.toml:14: imperfection.sway: \"1/0\": write an angle as a fraction of two numbers"}},
		{"sway with the curve", strings.Replace(edit(13, "sway = \"1/200\""), `ends = "pinned-pinned"`, `ends = "fixed-free"`, 1) + "[capacity]\nmodel = \"curve\"\ncurve = \"c\"\n", []string{"study.toml:13: imperfection.sway: a sway imperfection needs a first-yield model"}},
		{"imperfection choice", good + "[capacity]\nimperfection = \"equivalant\"\n", []string{"study.toml:20: capacity.imperfection: \"equivalant\" is not a choice; did you mean \"equivalent\"?"}},
		{"equivalent with the curve", good + "[capacity]\nmodel = \"curve\"\ncurve = \"b\"\nimperfection = \"equivalent\"\n", []string{"study.toml:22: capacity.imperfection: the buckling curve already carries its equivalent imperfection"}},
		{"equivalent ultimate", good + "[capacity]\nmodel = \"beam-column\"\nlimit = \"ultimate\"\nimperfection = \"equivalent\"\n", []string{"study.toml:22: capacity.imperfection: the equivalent imperfection stands for the bow and the residual stresses in a first-yield check"}},
		// Materials (materials.go, materialcheck.go).
		{"timber with a steel curve", edit(11, "kind = \"timber\"\nstrength = 21") + "[capacity]\nmodel = \"curve\"\ncurve = \"b\"\n", []string{"study.toml:22: capacity.curve: \"b\" is a steel curve; material.kind = \"timber\" takes", "\"solid\", \"glulam\""}},
		{"timber duration misspelt", strings.Replace(edit(11, "kind = \"timber\"\nstrength = 21"), `cov = 0.1 }
imposed`, `cov = 0.1, duration = "permanant" }
imposed`, 1), []string{"study.toml:16: loads.dead: duration: \"permanant\" is not a load-duration class; did you mean \"permanent\"?"}},
		{"timber with yield", edit(11, "kind = \"timber\"\nyield = 21"), []string{"study.toml:12: material.yield: timber takes strength (compression parallel to the grain"}},
		{"steel with a duration", strings.Replace(good, `cov = 0.1 }
imposed`, `cov = 0.1, duration = "permanent" }
imposed`, 1), []string{"study.toml:15: loads.dead: duration is the load-duration class of timber"}},
		{"timber service class", edit(11, "kind = \"timber\"\nstrength = 21\nservice_class = 4"), []string{"study.toml:13: material.service_class: service_class = 4: give 1 (heated indoors), 2 (covered, unheated) or 3 (exposed)"}},
		{"timber I section", strings.Replace(sec("shape = \"I\"\ndepth = 200\nwidth = 100\nflange = 8\nweb = 6\n"), "yield = {", "kind = \"timber\"\nstrength = {", 1), []string{"study.toml:6: member.section.shape: timber takes a rect or round section"}},
		{"welded aluminium without its HAZ", strings.Replace(sec("shape = \"I\"\ndepth = 200\nwidth = 100\nflange = 8\nweb = 6\nfabrication = \"welded\"\n"), "modulus = 200000", "kind = \"aluminium\"\nmodulus = 70000", 1), []string{"study.toml:12: material.haz_factor: missing: a welded aluminium section needs the strength ratio rho_o,haz"}},
		{"stainless curve misspelt", edit(11, "kind = \"stainless\"\nyield = 250") + "[capacity]\nmodel = \"curve\"\ncurve = \"holow\"\n", []string{"study.toml:22: capacity.curve: \"holow\" is not a buckling curve of stainless; did you mean \"hollow\"?"}},
		{"equivalent custom", strings.Replace(edit(13, ``), "shape = \"rect\"\ndepth = 100\nwidth = 50\n", "shape = \"custom\"\narea = 5000\ni_major = 4e6\ni_minor = 1e6\nc_major = 50\nc_minor = 25\n", 1) + "[capacity]\nimperfection = \"equivalent\"\n", []string{"capacity.curve: missing: capacity.imperfection = \"equivalent\" needs the buckling curve of a custom section"}},
	} {
		t.Run(c.name, func(t *testing.T) {
			code, out, errs := invoke(t, "check", writeStudy(t, c.study))
			if code != 2 {
				t.Errorf("exit %d, want 2; stderr:\n%s", code, errs)
			}
			if out != "" {
				t.Errorf("stdout not empty: %s", out)
			}
			for _, w := range c.want {
				if !strings.Contains(errs, w) {
					t.Errorf("stderr lacks %q:\n%s", w, errs)
				}
			}
			// run refuses the same file with the same status.
			if code, _, _ := invoke(t, "run", "--out", t.TempDir(), writeStudy(t, c.study)); code != 2 {
				t.Errorf("run exit %d, want 2", code)
			}
		})
	}
}

// TestAllProblemsListed: problems in different tables are all reported.
func TestAllProblemsListed(t *testing.T) {
	s := strings.Replace(good, "length = 2000", "length = \"2 kN\"", 1)
	s = strings.Replace(s, "cov = 0.1 }\n[imperfection]", "cov = -1 }\n[imperfection]", 1)
	s += "[analysis]\nmethdo = \"auto\"\n"
	code, _, errs := invoke(t, "check", writeStudy(t, s))
	if code != 2 {
		t.Fatalf("exit %d, want 2", code)
	}
	for _, w := range []string{"study.toml:3: member.length", "study.toml:11: material.yield: cov = -1", "study.toml:20: analysis.methdo: unknown key", "did you mean analysis.method?", "3 problems"} {
		if !strings.Contains(errs, w) {
			t.Errorf("stderr lacks %q:\n%s", w, errs)
		}
	}
}

func TestUsageErrors(t *testing.T) {
	for _, args := range [][]string{
		{},
		{"frobnicate"},
		{"run"},
		{"check"},
		{"run", "--bogus", "x.toml"},
		{"check", filepath.Join(t.TempDir(), "missing.toml")},
		{"run", "--method", "magic", "x.toml"},
		{"new", "a", "b"},
	} {
		if code, _, errs := invoke(t, args...); code != 2 || !strings.Contains(errs, "strutrisk") {
			t.Errorf("%q: exit %d, stderr %q; want 2 and a message", args, code, errs)
		}
	}
}

func TestHelp(t *testing.T) {
	for _, args := range [][]string{{"--help"}, {"run", "--help"}, {"check", "--help"}, {"new", "--help"}, {"run", "x.toml", "-h"}} {
		code, out, _ := invoke(t, args...)
		if code != 0 || !strings.Contains(out, "licensed") || !strings.Contains(out, "engineer") {
			t.Errorf("%q: exit %d, output lacks the caution:\n%s", args, code, out)
		}
	}
}

// TestNewPassesCheck: the starter study is valid as printed.
func TestNewPassesCheck(t *testing.T) {
	code, out, _ := invoke(t, "new", `Bay 7 "A" column`)
	if code != 0 {
		t.Fatalf("new exit %d", code)
	}
	code, chk, errs := invoke(t, "check", writeStudy(t, out))
	if code != 0 {
		t.Fatalf("check of the starter: exit %d\n%s", code, errs)
	}
	if !strings.Contains(chk, `Bay 7 "A" column`) {
		t.Errorf("title not carried:\n%s", chk)
	}
}

// TestDemoStudiesCheck: every study in studies/ (and the benchmark input
// in studies/bench/) passes check.
func TestDemoStudiesCheck(t *testing.T) {
	files, _ := filepath.Glob(filepath.Join("..", "..", "studies", "*.toml"))
	bench, _ := filepath.Glob(filepath.Join("..", "..", "studies", "bench", "*.toml"))
	if len(files) == 0 || len(bench) == 0 {
		t.Fatal("no demo studies found")
	}
	for _, f := range append(files, bench...) {
		if code, _, errs := invoke(t, "check", f); code != 0 {
			t.Errorf("%s: exit %d\n%s", f, code, errs)
		}
	}
}

// TestCheckJSONHand: check --json against a hand calculation of a pinned
// solid rectangle 100 x 50 mm, L = 2000 mm, E = 200000 MPa, bow 2 mm.
// Minor axis: I = 100*50^3/12, r = 50/sqrt(12) = 14.4338 mm,
// L/r = 138.564, PE = pi^2 E I / L^2 = 514041.9 N (Euler; Timoshenko &
// Gere, Theory of Elastic Stability, 2nd ed., §2.1), relative slenderness
// (L/r)/(pi sqrt(E/fy)) = 1.55939 at the yield's mean 250 MPa (EN
// 1993-1-1:2005 eq. 6.50), and the Perry-Robertson first-yield load: the
// smaller root of (fy - s)(sE - s) = eta s sE, eta = e0 c / r^2 = 0.24,
// s = 89.1363 MPa, N = 445681.3 N (Ayrton & Perry 1886; computed by hand
// from the closed form). The major axis gives 1011222.6 N, so minor
// governs. The lognormal yield's mean is 250 exactly.
func TestCheckJSONHand(t *testing.T) {
	code, out, errs := invoke(t, "check", "--json", writeStudy(t, good))
	if code != 0 {
		t.Fatalf("exit %d: %s", code, errs)
	}
	var d report.Document
	if err := json.Unmarshal([]byte(out), &d); err != nil {
		t.Fatalf("stdout is not the JSON document: %v\n%s", err, out)
	}
	n := d.Nominal
	if n == nil {
		t.Fatal("no nominal section")
	}
	for _, c := range []struct {
		name      string
		got, want float64
	}{
		{"capacity", n.Capacity, 445681.2790},
		{"euler_load", n.EulerLoad, 514041.8959},
		{"slenderness", n.Slenderness, 138.5640646},
		{"relative_slenderness", n.RelativeSlenderness, 1.559393602},
		{"k", n.K, 1},
	} {
		if math.Abs(c.got-c.want) > 1e-6*c.want {
			t.Errorf("%s = %.10g, want %.10g", c.name, c.got, c.want)
		}
	}
	if n.Axis != "minor" || d.GoverningAxis != "minor" {
		t.Errorf("axis %q / %q, want minor", n.Axis, d.GoverningAxis)
	}
	if d.Units != "N-mm-MPa" || d.ToolVersion == "" || len(d.InputSHA256) != 64 || d.Title != "test strut" {
		t.Errorf("header fields: %+v", d)
	}
	if d.TargetBeta == nil || *d.TargetBeta != 3.8 {
		t.Errorf("target_beta %v, want 3.8", d.TargetBeta)
	}
	// Sampling fields are absent, not null or zero.
	var raw map[string]any
	json.Unmarshal([]byte(out), &raw)
	for _, k := range []string{"pf", "pf_ci", "beta", "beta_ci", "method", "seed", "evaluations", "meets_target", "capacity", "demand", "form", "tornado", "sobol"} {
		if _, ok := raw[k]; ok {
			t.Errorf("check --json carries sampling field %q", k)
		}
	}
}

// TestCheckBeamColumnSprings: a beam-column study with end springs
// checks; a rigid top and pinned bottom give K = 0.699156 (tan u = u,
// Timoshenko & Gere, Theory of Elastic Stability, 2nd ed., §2.5).
func TestCheckBeamColumnSprings(t *testing.T) {
	s := strings.Replace(good, `ends = "pinned-pinned"`, "spring_top = \"rigid\"\nspring_bottom = 0", 1)
	s += "[capacity]\nmodel = \"beam-column\"\nlimit = \"ultimate\"\nresidual_stress = \"none\"\n"
	code, out, errs := invoke(t, "check", "--json", writeStudy(t, s))
	if code != 0 {
		t.Fatalf("exit %d\n%s", code, errs)
	}
	var d report.Document
	if err := json.Unmarshal([]byte(out), &d); err != nil {
		t.Fatal(err)
	}
	if math.Abs(d.Nominal.K-0.6991556596) > 1e-6 {
		t.Errorf("K %.8f, want 0.69915566", d.Nominal.K)
	}
	// The elastic-plastic member cannot carry more than its Euler load
	// about the weaker axis nor more than the squash load A fy.
	if c := d.Nominal.Capacity; !(c > 0 && c <= d.Nominal.EulerLoad && c <= 5000*250) {
		t.Errorf("capacity %g outside (0, min(Euler %g, squash 1.25e6)]", c, d.Nominal.EulerLoad)
	}
}

// TestCheckKipInchSecant: a W12x87 pinned column, L = 216 in, P at
// e = 1.471 in, E = 29000 ksi, yield 36 ksi, entered in kip-in units: the
// secant formula's first-yield load is 664.7 kips (Gere, Mechanics of
// Materials, solution to Problem 11.6-11: A = 25.6 in2, I = 740 in4,
// c = 6.265 in; published P_Y = 664.7 k).
func TestCheckKipInchSecant(t *testing.T) {
	s := `units = "kip-in"
[member]
length = 216
ends = "pinned-pinned"
[member.section]
shape = "custom"
area = 25.6
i_major = 740
i_minor = 241
c_major = 6.265
c_minor = 6.155
[material]
modulus = 29000
yield = 36
[imperfection]
eccentricity = 1.471
[capacity]
model = "secant"
axis = "major"
[loads]
p = { dist = "normal", mean = 255, cov = 0.1 }
`
	code, out, errs := invoke(t, "check", "--json", writeStudy(t, s))
	if code != 0 {
		t.Fatalf("exit %d\n%s", code, errs)
	}
	var d report.Document
	if err := json.Unmarshal([]byte(out), &d); err != nil {
		t.Fatal(err)
	}
	const kip = 4448.2216152605 // N, exact (NIST SP 811, Appendix B)
	if got := d.Nominal.Capacity / kip; math.Abs(got-664.7) > 0.05 {
		t.Errorf("P_Y = %.2f kip, want 664.7", got)
	}
	if d.Nominal.Axis != "major" {
		t.Errorf("axis %q, want major (asked for)", d.Nominal.Axis)
	}
}
