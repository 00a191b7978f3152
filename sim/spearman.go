package sim

import (
	"fmt"
	"math"
	"sort"

	"gonum.org/v1/gonum/stat"
)

// Spearman returns Spearman's rank correlation coefficient of x and y: the
// Pearson correlation of their ranks, tied values taking the average of the
// ranks they span (Spearman, 1904; the average-rank rule for ties is common
// practice). It returns NaN when fewer than two pairs are given, when either
// sample is constant or when any value is NaN. Spearman panics if the
// lengths of x and y differ.
func Spearman(x, y []float64) float64 {
	if len(x) != len(y) {
		panic("sim: Spearman: slices of different length")
	}
	if len(x) < 2 {
		return math.NaN()
	}
	for i := range x {
		if math.IsNaN(x[i]) || math.IsNaN(y[i]) {
			return math.NaN()
		}
	}
	return stat.Correlation(ranks(x), ranks(y), nil)
}

// ranks returns the ranks 1..n of x, ties taking their average rank.
func ranks(x []float64) []float64 {
	idx := make([]int, len(x))
	for i := range idx {
		idx[i] = i
	}
	sort.SliceStable(idx, func(a, b int) bool { return x[idx[a]] < x[idx[b]] })
	r := make([]float64, len(x))
	for i := 0; i < len(idx); {
		j := i
		for j+1 < len(idx) && x[idx[j+1]] == x[idx[i]] {
			j++
		}
		avg := float64(i+j)/2 + 1
		for k := i; k <= j; k++ {
			r[idx[k]] = avg
		}
		i = j + 1
	}
	return r
}

// RankCorrelation holds the Spearman rank correlation of one column of a
// sample table with a chosen column.
type RankCorrelation struct {
	Name string
	Rho  float64
}

// SpearmanTable returns the Spearman rank correlation of every other column
// of s with the column named against (for example "g", the margin), in the
// order of s.Names. It returns an error naming the column when against is
// not in the table. Columns that are constant (fixed inputs) give NaN.
func SpearmanTable(s *Samples, against string) ([]RankCorrelation, error) {
	if s == nil {
		return nil, fmt.Errorf("sim: SpearmanTable: no sample table")
	}
	col := -1
	for i, n := range s.Names {
		if n == against {
			col = i
			break
		}
	}
	if col < 0 {
		return nil, fmt.Errorf("sim: SpearmanTable: no column %q in the sample table (columns: %v)", against, s.Names)
	}
	y := make([]float64, len(s.Rows))
	x := make([]float64, len(s.Rows))
	for r, row := range s.Rows {
		if len(row) != len(s.Names) {
			return nil, fmt.Errorf("sim: SpearmanTable: row %d has %d values, want %d", r, len(row), len(s.Names))
		}
		y[r] = row[col]
	}
	var out []RankCorrelation
	for j, n := range s.Names {
		if j == col {
			continue
		}
		for r, row := range s.Rows {
			x[r] = row[j]
		}
		out = append(out, RankCorrelation{Name: n, Rho: Spearman(x, y)})
	}
	return out, nil
}
