package study

import (
	"slices"
	"strings"
	"testing"
)

// TestByMagnitude: the bow and the eccentricity act by their magnitude
// (the study-file contract: "Bow and eccentricity act by their magnitude"),
// the yield strength and the loads by their value.
func TestByMagnitude(t *testing.T) {
	text := strings.NewReplacer(
		`bow = "L/1000"`, `bow = { dist = "normal", mean = 0, sd = 3 }`+"\neccentricity = { dist = \"normal\", mean = 0, sd = 2 }",
		"yield = 355", `yield = { dist = "lognormal", mean = 355, cov = 0.07 }`,
		"dead = 300000", `dead = { dist = "normal", mean = 300000, cov = 0.1 }`,
	).Replace(base)
	md, err := Build(parse(t, text))
	if err != nil {
		t.Fatal(err)
	}
	got := md.ByMagnitude()
	slices.Sort(got)
	want := []string{"imperfection.bow", "imperfection.eccentricity"}
	if !slices.Equal(got, want) {
		t.Errorf("ByMagnitude = %v, want %v", got, want)
	}
}
