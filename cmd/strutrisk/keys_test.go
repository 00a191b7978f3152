package main

import (
	"strings"
	"testing"

	"strutrisk/internal/study"
)

// TestHelpKeys: `strutrisk help keys` and `strutrisk keys` print every key
// of the registry the parser uses; the usage lists them and --version.
func TestHelpKeys(t *testing.T) {
	for _, args := range [][]string{{"help", "keys"}, {"keys"}} {
		code, out, errs := invoke(t, args...)
		if code != exitOK || errs != "" {
			t.Fatalf("%v: exit %d, stderr %q", args, code, errs)
		}
		for _, tab := range study.KeyTables() {
			for _, k := range tab.Keys {
				if !strings.Contains(out, "  "+k.Name+" ") {
					t.Errorf("%v: no key %s.%s", args, tab.Path, k.Name)
				}
			}
		}
		for _, want := range []string{"[member]", "[[variant]]", "conditional-qmc", "default 0.05"} {
			if !strings.Contains(out, want) {
				t.Errorf("%v: output lacks %q", args, want)
			}
		}
	}
	_, out, _ := invoke(t, "--help")
	for _, want := range []string{"help keys", "--version"} {
		if !strings.Contains(out, want) {
			t.Errorf("usage lacks %q", want)
		}
	}
	if code, _, errs := invoke(t, "help", "nonsense"); code != exitInput || !strings.Contains(errs, "help keys") {
		t.Errorf("help nonsense: exit %d, stderr %q", code, errs)
	}
}

// TestStarterListsEveryMethod: the starter study names every method the
// parser accepts, and points to the key list.
func TestStarterListsEveryMethod(t *testing.T) {
	for _, tab := range study.KeyTables() {
		if tab.Path != "analysis" {
			continue
		}
		for _, k := range tab.Keys {
			if k.Name != "method" {
				continue
			}
			for _, m := range k.Choices {
				if !strings.Contains(starter, m) {
					t.Errorf("starter study does not list method %s", m)
				}
			}
		}
	}
	if !strings.Contains(starter, "strutrisk help keys") {
		t.Error("starter study does not point to strutrisk help keys")
	}
}
