package main

import (
	"flag"
	"fmt"
	"io"

	"strutrisk/internal/analysis"
	"strutrisk/internal/modelerror"
	"strutrisk/internal/outdir"
	"strutrisk/internal/report"
)

const modelFactorHelp = `Usage: strutrisk model-factor STUDY.toml TESTS.csv [--design] [--out DIR] [--json]

Evaluates the study's capacity model against a database of tests, as
EN 1990 Annex D, D.8 sets out: the theoretical resistance r_t of each test
(the study's model at the test's measured inputs, every other input at its
nominal value, the study's model factor left out), the mean-value
correction b and the coefficient of variation V_delta of the error term,
and the model_factor line (lognormal, mean b, CoV V_delta) to write in the
study's [capacity]. --design adds the characteristic and design values of
D.8.2.2 step 7 and D.8.3 for the study's member at its nominal values.

TESTS.csv: a header row naming the columns, then one row per test:
"resistance" (the measured resistance, a force), optionally "name", and
study key paths such as "material.yield" or "member.length". A unit may
follow a column name in brackets ("resistance (kN)") or stand in a cell
("312 MPa"); a bare number without either is in the study's units.

With --out, writes model-factor.json, model-factor.csv (r_e, r_t and
delta per test), model-factor.png (r_e against r_t) and summary.txt.

Flags:
`

func modelFactorCmd(args []string, stdout, stderr io.Writer) int {
	fs := flag.NewFlagSet("model-factor", flag.ContinueOnError)
	design := fs.Bool("design", false, "also give the characteristic and design resistance of D.8.2.2 step 7 and D.8.3")
	out := fs.String("out", "", "write the evaluation into this folder")
	asJSON := fs.Bool("json", false, "print the evaluation as JSON on standard output")
	pos, help, err := parseArgs(fs, args)
	if help {
		fmt.Fprint(stdout, modelFactorHelp+flagHelp(fs)+"\n"+report.CautionText+"\n")
		return exitOK
	}
	if err == nil && len(pos) != 2 {
		err = fmt.Errorf("give a study file and a tests file")
	}
	if err != nil {
		fmt.Fprintf(stderr, "strutrisk model-factor: %v (strutrisk model-factor --help)\n", err)
		return exitInput
	}
	l, code := load(pos[0], stderr)
	if code != exitOK {
		return code
	}
	tests, err := modelerror.ReadTestsFile(pos[1], l.Study.Units)
	if err != nil {
		fmt.Fprintf(stderr, "strutrisk: %v\n", err)
		return exitInput
	}
	var folder *outdir.Folder
	if *out != "" {
		if folder, err = outdir.Prepare(*out); err != nil {
			fmt.Fprintf(stderr, "strutrisk: %v; nothing was run\n", err)
			return exitInput
		}
		defer folder.Close()
	}
	ev, err := modelerror.Assess(l.Study, pos[1], tests, *design)
	if err != nil {
		fmt.Fprintf(stderr, "strutrisk: %v\n", err)
		return exitInput
	}
	o, err := analysis.ModelFactor(ev)
	if err == nil && folder != nil {
		var files []outdir.File
		if files, err = o.Files(); err == nil {
			_, err = folder.Commit(files)
		}
	}
	if err != nil {
		fmt.Fprintf(stderr, "strutrisk: %v\n", err)
		return exitInternal
	}
	if *asJSON {
		stdout.Write(o.JSON)
	} else {
		fmt.Fprint(stdout, o.Text)
	}
	return exitOK
}
