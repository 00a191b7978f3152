package main

import (
	"encoding/json"
	"flag"
	"fmt"
	"io"
	"os"

	"strutrisk/internal/modelerror"
	"strutrisk/internal/outdir"
	"strutrisk/internal/report"
	"strutrisk/internal/study"
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
	tests, err := readTests(pos[1], l.Study.Units)
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
	return writeModelFactor(ev, folder, *asJSON, stdout, stderr)
}

// readTests reads a test database no larger than a study file may be.
func readTests(path string, sys study.System) ([]modelerror.Test, error) {
	f, err := os.Open(path)
	if err != nil {
		return nil, err
	}
	defer f.Close()
	if fi, err := f.Stat(); err == nil && fi.Size() > study.MaxFileSize {
		return nil, fmt.Errorf("%s: %d bytes; a test database may have at most %d", path, fi.Size(), study.MaxFileSize)
	}
	return modelerror.ReadTests(path, io.LimitReader(f, study.MaxFileSize+1), sys)
}

// writeModelFactor prints the evaluation and writes its files.
func writeModelFactor(ev *modelerror.Evaluation, folder *outdir.Folder, asJSON bool, stdout, stderr io.Writer) int {
	doc, err := json.MarshalIndent(ev, "", "  ")
	if err != nil {
		fmt.Fprintf(stderr, "strutrisk: %v\n", err)
		return exitInternal
	}
	doc = append(doc, '\n')
	text := ev.Text() + "\n" + report.CautionText + "\n"
	if folder != nil {
		re, rt := make([]float64, len(ev.Rows)), make([]float64, len(ev.Rows))
		for i, r := range ev.Rows {
			re[i], rt[i] = r.Measured, r.Theory
		}
		png, err := report.TestsPicture(re, rt, ev.B)
		if err != nil {
			fmt.Fprintf(stderr, "strutrisk: %v\n", err)
			return exitInternal
		}
		files := []outdir.File{{Name: "model-factor.json", Data: doc}, {Name: "model-factor.csv", Data: ev.CSV()},
			{Name: "model-factor.png", Data: png}, {Name: "summary.txt", Data: []byte(text)}}
		if _, err := folder.Commit(files); err != nil {
			fmt.Fprintf(stderr, "strutrisk: %v\n", err)
			return exitInternal
		}
	}
	if asJSON {
		stdout.Write(doc)
		return exitOK
	}
	fmt.Fprint(stdout, text)
	return exitOK
}
