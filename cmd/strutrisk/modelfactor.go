package main

import (
	"flag"
	"fmt"
	"io"

	"strutrisk/internal/analysis"
	"strutrisk/internal/cli"
	"strutrisk/internal/modelerror"
	"strutrisk/internal/outdir"
)

func modelFactorCmd(args []string, stdout, stderr io.Writer) int {
	fs := flag.NewFlagSet("model-factor", flag.ContinueOnError)
	design := fs.Bool("design", false, "also give the characteristic and design resistance of D.8.2.2 step 7 and D.8.3")
	out := fs.String("out", "", "write the evaluation into this folder")
	asJSON := fs.Bool("json", false, "print the evaluation as JSON on standard output")
	pos, help, err := cli.ParseArgs(fs, args)
	if help {
		fmt.Fprint(stdout, helpText(cli.ModelFactorHelp, fs))
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
