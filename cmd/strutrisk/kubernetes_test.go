package main

import (
	"encoding/json"
	"errors"
	"fmt"
	"os"
	"os/exec"
	"path/filepath"
	"regexp"
	"strconv"
	"strings"
	"sync"
	"sync/atomic"
	"testing"
)

// beMain is the variable under which the test binary runs as strutrisk
// itself (TestMain), so that a test can give a shell a strutrisk command
// without building the binary.
const beMain = "STRUTRISK_TEST_BE_MAIN"

// TestMain runs the tests, or strutrisk when beMain is set.
func TestMain(m *testing.M) {
	if os.Getenv(beMain) == "1" {
		os.Exit(run(os.Args[1:], os.Stdout, os.Stderr))
	}
	os.Exit(m.Run())
}

// job is what the emulation reads of a Kubernetes Job manifest.
type job struct {
	kind, completionMode     string
	completions, parallelism int
	command                  []string
	env                      [][2]string       // name, value
	mounts                   map[string]string // volume name -> mount path
	claims                   map[string]string // volume name -> claim
}

// pairRE matches "key: value" (value may be empty) in a block line or in a
// flow map.
var pairRE = regexp.MustCompile(`^([A-Za-z][A-Za-z0-9]*):\s*(.*)$`)

// readJob reads a Job manifest by a focused reader of the YAML the
// manifests use: block maps and lists, one-line flow maps ({ a: b }), the
// command as a one-line flow sequence of double-quoted strings. Anything
// it would misread (args, valueFrom, a multi-line command) is an error.
func readJob(text string) (*job, error) {
	j := &job{mounts: map[string]string{}, claims: map[string]string{}}
	section, name := "", ""
	for n, line := range strings.Split(text, "\n") {
		t := strings.TrimSpace(line)
		if t == "" || strings.HasPrefix(t, "#") || t == "---" {
			continue
		}
		t = strings.TrimSpace(strings.TrimPrefix(t, "- "))
		var pairs [][2]string
		if strings.HasPrefix(t, "{") && strings.HasSuffix(t, "}") {
			for _, p := range strings.Split(strings.Trim(t, "{}"), ",") {
				m := pairRE.FindStringSubmatch(strings.TrimSpace(p))
				if m == nil {
					return nil, fmt.Errorf("line %d: cannot read %q", n+1, t)
				}
				pairs = append(pairs, [2]string{m[1], m[2]})
			}
		} else if m := pairRE.FindStringSubmatch(t); m != nil {
			pairs = append(pairs, [2]string{m[1], m[2]})
		} else {
			return nil, fmt.Errorf("line %d: cannot read %q", n+1, t)
		}
		for _, p := range pairs {
			k, v := p[0], strings.Trim(p[1], `"`)
			switch {
			case v == "":
				section = k
			case k == "kind":
				j.kind = v
			case k == "completionMode":
				j.completionMode = v
			case k == "completions" || k == "parallelism":
				x, err := strconv.Atoi(v)
				if err != nil {
					return nil, fmt.Errorf("line %d: %s %q", n+1, k, v)
				}
				if k == "completions" {
					j.completions = x
				} else {
					j.parallelism = x
				}
			case k == "command":
				if err := json.Unmarshal([]byte(p[1]), &j.command); err != nil {
					return nil, fmt.Errorf("line %d: the command must be a one-line sequence of double-quoted strings: %v", n+1, err)
				}
			case k == "args" || k == "valueFrom" || k == "envFrom":
				return nil, fmt.Errorf("line %d: %s: the emulation does not read it; extend it", n+1, k)
			case k == "name":
				name = v
			case k == "value" && section == "env":
				j.env = append(j.env, [2]string{name, v})
			case k == "mountPath":
				j.mounts[name] = v
			case k == "claimName":
				j.claims[name] = v
			case k == "persistentVolumeClaim":
				// { claimName: x } on the same line is read as a flow map
				// only when alone; the manifests write it so.
				m := regexp.MustCompile(`claimName:\s*([^\s}]+)`).FindStringSubmatch(v)
				if m == nil {
					return nil, fmt.Errorf("line %d: persistentVolumeClaim %q", n+1, v)
				}
				j.claims[name] = m[1]
			}
		}
	}
	if len(j.command) == 0 {
		return nil, fmt.Errorf("no command")
	}
	return j, nil
}

// claimPath is the path at which the Job mounts claim, or "".
func (j *job) claimPath(claim string) string {
	for vol, c := range j.claims {
		if c == claim {
			return j.mounts[vol]
		}
	}
	return ""
}

// execJob runs the command of j as a pod would, once, with the
// environment the manifest sets and extra, the mount paths of j's
// volumes replaced by the folders in root (volume claim -> folder), and
// strutrisk being this test binary.
func execJob(j *job, root map[string]string, bin string, extra ...string) (string, error) {
	args := make([]string, len(j.command))
	for i, a := range j.command {
		for vol, c := range j.claims {
			if p := j.mounts[vol]; p != "" {
				a = strings.ReplaceAll(a, p, root[c])
			}
		}
		args[i] = a
	}
	cmd := exec.Command(args[0], args[1:]...)
	cmd.Env = append([]string{"PATH=" + bin + string(os.PathListSeparator) + os.Getenv("PATH")}, extra...)
	for _, e := range j.env {
		cmd.Env = append(cmd.Env, e[0]+"="+e[1])
	}
	out, err := cmd.CombinedOutput()
	return string(out), err
}

// emulateIndexedJob runs the shards Job of shards as Kubernetes runs an
// Indexed Job (the command once per completion index, with
// JOB_COMPLETION_INDEX set) and then the merge Job, on one volume claim
// holding study (as study.toml); it returns the folder the merge wrote.
func emulateIndexedJob(t *testing.T, shardsYAML, mergeYAML, study string) (string, error) {
	t.Helper()
	sj, err := readJob(shardsYAML)
	if err != nil {
		return "", fmt.Errorf("shards-job.yaml: %v", err)
	}
	mj, err := readJob(mergeYAML)
	if err != nil {
		return "", fmt.Errorf("merge-job.yaml: %v", err)
	}
	if sj.kind != "Job" || sj.completionMode != "Indexed" || sj.completions < 1 {
		return "", fmt.Errorf("shards-job.yaml: kind %q, completionMode %q, completions %d: want an Indexed Job", sj.kind, sj.completionMode, sj.completions)
	}
	if mj.kind != "Job" || mj.completionMode != "" {
		return "", fmt.Errorf("merge-job.yaml: kind %q, completionMode %q: want a plain Job", mj.kind, mj.completionMode)
	}
	if len(sj.claims) != 1 {
		return "", fmt.Errorf("shards-job.yaml: want one volume claim, have %v", sj.claims)
	}
	var claim string
	for _, c := range sj.claims {
		claim = c
	}
	if mj.claimPath(claim) == "" {
		return "", fmt.Errorf("merge-job.yaml does not mount the claim %q the shards write to", claim)
	}
	dir := t.TempDir()
	bin := filepath.Join(dir, "bin")
	data := filepath.Join(dir, "volume")
	if err := os.MkdirAll(bin, 0o755); err != nil {
		t.Fatal(err)
	}
	self, err := os.Executable()
	if err != nil {
		t.Fatal(err)
	}
	wrapper := "#!/bin/sh\n" + beMain + "=1 exec '" + self + "' \"$@\"\n"
	if err := os.WriteFile(filepath.Join(bin, "strutrisk"), []byte(wrapper), 0o755); err != nil {
		t.Fatal(err)
	}
	if err := os.MkdirAll(data, 0o755); err != nil {
		t.Fatal(err)
	}
	if err := os.WriteFile(filepath.Join(data, "study.toml"), []byte(study), 0o644); err != nil {
		t.Fatal(err)
	}
	root := map[string]string{claim: data}
	// The pods run parallelism at a time, as Kubernetes runs them, but at
	// most 4 on this machine. Once a pod has failed the Job has failed:
	// no more pods start (the rest would only cost the test time).
	errs := make([]error, sj.completions)
	next := make(chan int)
	var wg sync.WaitGroup
	var failed atomic.Bool
	for range max(1, min(sj.parallelism, 4)) {
		wg.Add(1)
		go func() {
			defer wg.Done()
			for k := range next {
				if out, err := execJob(sj, root, bin, "JOB_COMPLETION_INDEX="+itoa(k)); err != nil {
					errs[k] = fmt.Errorf("shard pod %d: %v: %s", k, err, out)
					failed.Store(true)
				}
			}
		}()
	}
	for k := range sj.completions {
		if failed.Load() {
			break
		}
		next <- k
	}
	close(next)
	wg.Wait()
	if err := errors.Join(errs...); err != nil {
		return "", err
	}
	if out, err := execJob(mj, root, bin); err != nil {
		return "", fmt.Errorf("merge pod: %v: %s", err, out)
	}
	m := regexp.MustCompile(`--out\s+(\S+)`).FindStringSubmatch(strings.Join(mj.command, " "))
	if m == nil {
		return "", fmt.Errorf("merge-job.yaml: the merge names no --out folder")
	}
	return strings.ReplaceAll(m[1], mj.claimPath(claim), data), nil
}

// TestKubernetesIndexedJob runs deploy/kubernetes as Kubernetes would (no
// cluster can run here): each completion index of the Indexed Job of the
// shards, then the merge Job, and checks that the merged folder equals a
// single run's byte for byte; and that the emulation fails when the
// manifest's completions, shard count or use of the index disagree.
func TestKubernetesIndexedJob(t *testing.T) {
	t.Parallel() // sets no hook: runs beside the other slow tests
	if _, err := exec.LookPath("sh"); err != nil {
		t.Skip("no sh to run the manifests' commands")
	}
	shards, err := os.ReadFile("../../deploy/kubernetes/shards-job.yaml")
	if err != nil {
		t.Fatal(err)
	}
	merge, err := os.ReadFile("../../deploy/kubernetes/merge-job.yaml")
	if err != nil {
		t.Fatal(err)
	}
	ref, err := os.ReadFile("../../studies/bench/reference-strut.toml")
	if err != nil {
		t.Fatal(err)
	}
	// The reference study with fewer samples: 13 blocks, so that most of
	// the 64 shards have none but block 0.
	study := strings.Replace(string(ref), "samples = 10_000_000", "samples = 100_000", 1)
	if study == string(ref) {
		t.Fatal("the reference study's samples line moved: update the test")
	}
	merged, err := emulateIndexedJob(t, string(shards), string(merge), study)
	if err != nil {
		t.Fatal(err)
	}
	// The single run reads the study where the pods read it, so that the
	// results name it alike.
	single := filepath.Join(t.TempDir(), "single")
	studyPath := filepath.Join(filepath.Dir(merged), "study.toml")
	if code, _, errs := invoke(t, "run", studyPath, "--out", single); code != exitOK {
		t.Fatalf("single run: exit %d: %s", code, errs)
	}
	if d := sameFolders(t, single, merged); d != "" {
		t.Errorf("the Indexed Job's merge and a single run: %s", d)
	}

	for _, c := range []struct{ what, old, new string }{
		{"completions below the shard count", "completions: 64", "completions: 63"},
		{"a shard count below the completions", "--shard-count 64", "--shard-count 32"},
		{"every pod writing one folder", "/data/shards/$JOB_COMPLETION_INDEX", "/data/shards/0"},
	} {
		bad := strings.Replace(string(shards), c.old, c.new, 1)
		if bad == string(shards) {
			t.Errorf("%s: the manifest has no %q any more: update the test", c.what, c.old)
			continue
		}
		_, err := emulateIndexedJob(t, bad, string(merge), study)
		if err == nil {
			t.Errorf("%s: the emulation did not fail", c.what)
			continue
		}
		t.Logf("%s: %.200s", c.what, err)
	}
}
