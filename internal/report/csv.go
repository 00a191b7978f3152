package report

import (
	"bytes"
	"encoding/csv"
	"fmt"
	"slices"
	"strconv"

	"strutrisk/sim"
)

// samplesCSV writes the kept sample table as CSV: a header of the column
// names, then one row per point with values in N, mm, MPa at full
// precision. Values that are not finite are written as empty fields.
func samplesCSV(s *sim.Samples) ([]byte, error) {
	var buf bytes.Buffer
	w := csv.NewWriter(&buf)
	if err := w.Write(csvCells(slices.Clone(s.Names))[0]); err != nil {
		return nil, err
	}
	rec := make([]string, len(s.Names))
	for i, row := range s.Rows {
		if len(row) != len(s.Names) {
			return nil, fmt.Errorf("report: sample row %d has %d values for %d columns", i, len(row), len(s.Names))
		}
		for j, v := range row {
			if finite(v) {
				rec[j] = strconv.FormatFloat(v, 'g', -1, 64)
			} else {
				rec[j] = ""
			}
		}
		if err := w.Write(rec); err != nil {
			return nil, err
		}
	}
	w.Flush()
	return buf.Bytes(), w.Error()
}
