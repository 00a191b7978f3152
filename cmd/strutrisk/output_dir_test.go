package main

import (
	"context"
	"encoding/json"
	"os"
	"path/filepath"
	"slices"
	"strings"
	"testing"

	"strutrisk/internal/outdir"
	"strutrisk/internal/report"
)

// quick is the stocky strut (run_test.go) on FORM without sensitivities:
// a run of a fraction of a second.
var quick = strings.Replace(stocky, "sobol = { samples = 1000 }", "sobol = false\ntornado = false", 1)

// noRun makes a test fail if the run gets as far as sampling: the signal
// handlers are set up just before the estimate starts.
func noRun(t *testing.T) {
	signalHook = func(context.Context) { t.Error("the run started though its output folder is refused") }
	t.Cleanup(func() { signalHook = nil })
}

func listDir(t *testing.T, dir string) []string {
	t.Helper()
	entries, err := os.ReadDir(dir)
	if err != nil {
		t.Fatal(err)
	}
	var out []string
	for _, e := range entries {
		out = append(out, e.Name())
	}
	return out
}

// TestRunOutputRefused: a folder that cannot take the run is found before
// any sampling; the command exits 2 naming the folder (or the key and
// line of [output] dir) and leaves the folder as it was.
func TestRunOutputRefused(t *testing.T) {
	for _, c := range []struct {
		name  string
		dir   string // --out, relative to a fresh folder; "" none
		extra string // added to the study
		setup func(t *testing.T, base string)
		want  string
	}{
		{"a file in place of the folder", "res", "", func(t *testing.T, base string) {
			os.WriteFile(filepath.Join(base, "res"), []byte("x"), 0o644)
		}, "res: is a file"},
		{"a file in place of the parent", "res/a", "", func(t *testing.T, base string) {
			os.WriteFile(filepath.Join(base, "res"), []byte("x"), 0o644)
		}, "cannot create the folder that holds it"},
		{"a user's files", "res", "", func(t *testing.T, base string) {
			os.MkdirAll(filepath.Join(base, "res"), 0o755)
			os.WriteFile(filepath.Join(base, "res", "thesis.tex"), []byte("mine"), 0o644)
		}, "thesis.tex"},
		{"the study's folder", ".", "", nil, "working folder"},
		{"dir escaping the study's folder", "", "[output]\ndir = \"../../x\"\n", nil, "study.toml:28: output.dir: \"../../x\" leaves the study's folder"},
		{"absolute dir", "", "[output]\ndir = \"/x\"\n", nil, "study.toml:28: output.dir: \"/x\" is an absolute path"},
	} {
		t.Run(c.name, func(t *testing.T) {
			base := t.TempDir()
			t.Chdir(base)
			study := filepath.Join(base, "study.toml")
			os.WriteFile(study, []byte(quick+c.extra), 0o644)
			if c.setup != nil {
				c.setup(t, base)
			}
			noRun(t)
			args := []string{"run", "study.toml", "--method", "form"}
			if c.dir != "" {
				args = append(args, "--out", c.dir)
			}
			code, out, errs := invoke(t, args...)
			if code != exitInput || !strings.Contains(errs, c.want) {
				t.Errorf("exit %d, stderr:\n%s\nwant exit 2 saying %q", code, errs, c.want)
			}
			if out != "" {
				t.Errorf("standard output not empty: %s", out)
			}
			if got := listDir(t, base); slices.Contains(got, "out") {
				t.Errorf("files written: %v", got)
			}
		})
	}
}

// TestRunOutputReadOnly: a read-only folder is refused before sampling.
// The superuser ignores permission bits, so this cannot fail as root and
// is skipped there (TestRunOutputRefused covers the other cases).
func TestRunOutputReadOnly(t *testing.T) {
	if os.Geteuid() == 0 {
		t.Skip("permission bits do not bind the superuser")
	}
	dir := t.TempDir()
	os.Chmod(dir, 0o555)
	defer os.Chmod(dir, 0o755)
	noRun(t)
	code, _, errs := invoke(t, "run", writeStudy(t, quick), "--method", "form", "--out", dir)
	if code != exitInput || !strings.Contains(errs, dir) {
		t.Errorf("exit %d, stderr %s; want 2 naming %s", code, errs, dir)
	}
}

// TestRunOutputBusy: a second run into a folder in use is refused at once.
func TestRunOutputBusy(t *testing.T) {
	dir := filepath.Join(t.TempDir(), "res")
	f, err := outdir.Prepare(dir)
	if err != nil {
		t.Fatal(err)
	}
	defer f.Close()
	noRun(t)
	code, _, errs := invoke(t, "run", writeStudy(t, quick), "--method", "form", "--out", dir)
	if code != exitInput || !strings.Contains(errs, "another strutrisk run is writing it") {
		t.Errorf("exit %d, stderr %s; want 2 and a refusal naming the other run", code, errs)
	}
}

// TestRunWriteFailsAtEnd: when the files cannot be written after the run
// (here a user's file appears in the folder during it, which strutrisk
// will not delete; a full disk takes the same path), the summary or the
// document still reaches standard output and the exit status is 3.
func TestRunWriteFailsAtEnd(t *testing.T) {
	for _, asJSON := range []bool{false, true} {
		dir := filepath.Join(t.TempDir(), "res")
		signalHook = func(context.Context) {
			os.MkdirAll(dir, 0o755)
			os.WriteFile(filepath.Join(dir, "notes.txt"), []byte("mine"), 0o644)
		}
		args := []string{"run", writeStudy(t, quick), "--method", "form", "--out", dir}
		if asJSON {
			args = append(args, "--json")
		}
		code, out, errs := invoke(t, args...)
		signalHook = nil
		if code != exitInternal || !strings.Contains(errs, "not written to "+dir) {
			t.Errorf("json %v: exit %d, stderr %s; want 3 saying the results were not written", asJSON, code, errs)
		}
		if asJSON {
			var d report.Document
			if err := json.Unmarshal([]byte(out), &d); err != nil || d.Beta == nil {
				t.Errorf("standard output is not the document: %v\n%s", err, out)
			}
		} else if !strings.Contains(out, "reliability beta") || strings.Contains(out, "results in") {
			t.Errorf("summary missing or claims files:\n%s", out)
		}
		if got := listDir(t, dir); !slices.Equal(got, []string{"notes.txt"}) {
			t.Errorf("folder holds %v, want the user's file alone", got)
		}
	}
}

// TestRunNoStaleFiles: a run replaces the previous run's files as a whole:
// a run without a sweep leaves no sweep.csv or sweep.png of the one
// before, and nothing hidden is left beside the folder.
func TestRunNoStaleFiles(t *testing.T) {
	base := t.TempDir()
	dir := filepath.Join(base, "res")
	sweep := "[sweep]\nparameter = \"loads.axial.mean\"\nvalues = [\"1200 kN\", \"1500 kN\"]\n"
	for _, text := range []string{quick + sweep, quick} {
		code, _, errs := invoke(t, "run", writeStudy(t, text), "--method", "form", "--out", dir)
		if code != 0 {
			t.Fatalf("exit %d\n%s", code, errs)
		}
	}
	got := listDir(t, dir)
	for _, stale := range []string{"sweep.csv", "sweep.png", "sweep.svg"} {
		if slices.Contains(got, stale) {
			t.Errorf("%s of the previous run left beside the new run: %v", stale, got)
		}
	}
	if !slices.Contains(got, "results.json") || !slices.Contains(got, outdir.Marker) {
		t.Errorf("folder holds %v", got)
	}
	if got := listDir(t, base); !slices.Equal(got, []string{"res"}) {
		t.Errorf("beside the folder: %v", got)
	}
}

// TestRunOutputWhere: [output] dir is taken from the study file's folder,
// not the working folder; without it the folder is out/<safe name> in the
// working folder, even for a study file named "...toml" or ".toml".
func TestRunOutputWhere(t *testing.T) {
	studies, work := t.TempDir(), t.TempDir()
	t.Chdir(work)
	write := func(name, text string) string {
		p := filepath.Join(studies, name)
		if err := os.WriteFile(p, []byte(text), 0o644); err != nil {
			t.Fatal(err)
		}
		return p
	}
	for _, c := range []struct {
		file, extra string
		want        string // folder that must hold results.json
	}{
		{"bay3.toml", "[output]\ndir = \"res/bay3\"\n", filepath.Join(studies, "res", "bay3")},
		{"...toml", "", filepath.Join(work, "out", "study")},
		{".toml", "", filepath.Join(work, "out", "study")},
		{"Bay 3 (rev).toml", "", filepath.Join(work, "out", "Bay-3--rev-")},
	} {
		code, _, errs := invoke(t, "run", write(c.file, quick+c.extra), "--method", "form")
		if code != 0 {
			t.Fatalf("%s: exit %d\n%s", c.file, code, errs)
		}
		if _, err := os.Stat(filepath.Join(c.want, "results.json")); err != nil {
			t.Errorf("%s: no results.json in %s: %v", c.file, c.want, err)
		}
	}
	if got := listDir(t, work); !slices.Equal(got, []string{"out"}) {
		t.Errorf("working folder holds %v, want out/ alone", got)
	}
	if got := listDir(t, filepath.Join(work, "out")); !slices.Equal(got, []string{"Bay-3--rev-", "study"}) {
		t.Errorf("out/ holds %v", got)
	}
}

// TestRunHostileText: a title with HTML reaches summary.md as text, and
// a variant's name a spreadsheet would run as a formula is neutralised in
// sweep.csv (names in samples.csv begin with their table, "loads.").
func TestRunHostileText(t *testing.T) {
	text := strings.Replace(quick, `title = "stocky strut, lognormal R and S"`, `title = "<script>alert(1)</script>"`, 1)
	text += "[sweep]\nparameter = \"material.yield.mean\"\nvalues = [290, 310]\n[[variant]]\nname = \"=HYPERLINK(1)\"\nset = { \"capacity.model_factor\" = 1.0 }\n"
	dir := filepath.Join(t.TempDir(), "res")
	code, _, errs := invoke(t, "run", writeStudy(t, text), "--method", "monte-carlo", "--samples", "20000", "--out", dir)
	if code != 0 {
		t.Fatalf("exit %d\n%s", code, errs)
	}
	read := func(name string) string {
		b, err := os.ReadFile(filepath.Join(dir, name))
		if err != nil {
			t.Fatal(err)
		}
		return string(b)
	}
	if md := read("summary.md"); !strings.Contains(md, `# \<script\>alert(1)\</script\>`) {
		t.Errorf("summary.md does not escape the title:\n%.300s", md)
	}
	if s := read("sweep.csv"); !strings.Contains(s, "'=HYPERLINK(1)") || strings.Contains(s, "\n=HYPERLINK") {
		t.Errorf("sweep.csv does not neutralise the variant's name:\n%s", s)
	}
}

// TestCheckOutputDir: check warns, naming key and line, of an [output] dir
// that run would refuse (--out can stand in for it, so it is no error).
func TestCheckOutputDir(t *testing.T) {
	code, out, errs := invoke(t, "check", writeStudy(t, quick+"[output]\ndir = \"../../x\"\n"))
	if code != 0 {
		t.Fatalf("exit %d\n%s", code, errs)
	}
	if !strings.Contains(out, "output.dir (line 28): \"../../x\" leaves the study's folder") {
		t.Errorf("check does not warn of the escaping dir:\n%s", out)
	}
}
