package modelerror

import (
	"encoding/csv"
	"errors"
	"fmt"
	"io"
	"strconv"
	"strings"

	"strutrisk/internal/study"
)

// MaxTests caps the rows of a test database.
const MaxTests = 10000

// Test is one row of a test database: the measured resistance and the
// study keys the test measured.
type Test struct {
	// Line is the row's line in the file, Name its name column ("" when
	// the file has none).
	Line int
	Name string
	// Measured is r_e, in N.
	Measured float64
	// Sets are the measured inputs, each a key path of the study.
	Sets []study.Setting
}

// column is one header cell: its key path and the unit the header gives.
type column struct{ key, unit string }

// ReadTests reads a test database: a CSV file with a header row naming
// the columns: "resistance" (the measured resistance r_e, a force), an
// optional "name", and study key paths ("material.yield",
// "member.length"); a unit may follow a name in brackets
// ("resistance (kN)", "material.yield (MPa)"), or each cell may carry its
// own ("312 MPa"). A bare number takes the header's unit, else the unit
// system sys of the study. Lines starting with # are comments. file names
// the file in messages.
func ReadTests(file string, r io.Reader, sys study.System) ([]Test, error) {
	cr := csv.NewReader(r)
	cr.TrimLeadingSpace = true
	cr.Comment = '#'
	header, err := cr.Read()
	if err != nil {
		return nil, fmt.Errorf("%s: no header row: %v (the first row names the columns: resistance, name and study key paths)", file, err)
	}
	cols := make([]column, len(header))
	res := -1
	for i, h := range header {
		cols[i] = parseHeader(h)
		switch cols[i].key {
		case "resistance":
			res = i
		case "":
			return nil, fmt.Errorf("%s:1: column %d has no name", file, i+1)
		}
	}
	if res < 0 {
		return nil, fmt.Errorf("%s:1: no \"resistance\" column: name the column of the measured resistance resistance, e.g. \"resistance (kN)\"", file)
	}
	var tests []Test
	for {
		rec, err := cr.Read()
		if errors.Is(err, io.EOF) {
			break
		}
		line, _ := cr.FieldPos(0)
		if err != nil {
			return nil, fmt.Errorf("%s: %v", file, err)
		}
		if len(tests) == MaxTests {
			return nil, fmt.Errorf("%s:%d: more than %d tests; split the database", file, line, MaxTests)
		}
		t, err := readRow(file, line, cols, rec, res, sys)
		if err != nil {
			return nil, err
		}
		tests = append(tests, t)
	}
	if len(tests) < 3 {
		return nil, fmt.Errorf("%s: %d tests; D.8 of EN 1990 needs at least 3 (more than 10 are advisable)", file, len(tests))
	}
	return tests, nil
}

// parseHeader splits "material.yield (MPa)" into its key and unit.
func parseHeader(h string) column {
	h = strings.TrimSpace(h)
	if i := strings.IndexByte(h, '('); i >= 0 && strings.HasSuffix(h, ")") {
		return column{key: strings.TrimSpace(h[:i]), unit: strings.TrimSpace(h[i+1 : len(h)-1])}
	}
	return column{key: h}
}

// readRow reads one test.
func readRow(file string, line int, cols []column, rec []string, res int, sys study.System) (Test, error) {
	t := Test{Line: line}
	for i, c := range cols {
		cell := strings.TrimSpace(rec[i])
		at := fmt.Sprintf("%s:%d: column %s", file, line, c.key)
		if cell == "" {
			return t, fmt.Errorf("%s: empty cell; every test needs every column", at)
		}
		text, err := study.CellText(cell, c.unit)
		if err != nil {
			return t, fmt.Errorf("%s: %v", at, err)
		}
		switch {
		case c.key == "name":
			t.Name = cell
		case i == res:
			v, err := sys.Convert(text, study.Force)
			if err != nil {
				return t, fmt.Errorf("%s: %v", at, err)
			}
			if !(v > 0) {
				return t, fmt.Errorf("%s: %s: a measured resistance must be positive", at, cell)
			}
			t.Measured = v
		default:
			var val any = text
			if x, err := strconv.ParseFloat(text, 64); err == nil {
				val = x
			}
			t.Sets = append(t.Sets, study.Setting{Key: c.key, Value: val, At: at})
		}
	}
	return t, nil
}
