// Package column holds the deterministic mechanics of compression members:
// section properties, Euler load, effective length (classic ends and
// rotational end springs) and the capacity models (Perry-Robertson first
// yield, the secant formula, the generalised-imperfection buckling curves of
// EN 1993-1-1 and a numerical beam-column).
//
// All quantities are in N, mm and MPa. Evaluations are plain functions of
// plain numbers and do not allocate.
package column
