#!/usr/bin/env bash
# Paired whole-process timing of `strutrisk run` against the numpy baseline
# script on the same seven-variable reference strut (see reference-strut.toml).
# Run from the repository root on a quiet machine:
#   studies/bench/measure.sh [path/to/numpy_baseline.py]
# Needs hyperfine and Debian's python3-numpy. Prints hyperfine's table; the
# README quotes the ratios of mean times (same sample count, so the ratio of
# samples per second).
set -euo pipefail
cd "$(dirname "$0")/../.."
script=${1:-../shared/bench/numpy_baseline.py}
n=${N:-10000000}
bin=$(mktemp -d)/strutrisk
go build -o "$bin" ./cmd/strutrisk
out=$(mktemp -d)
study=studies/bench/reference-strut.toml
hyperfine --warmup 1 --runs "${RUNS:-5}" --export-markdown "$out/table.md" \
  -n "numpy, 1 process" "/usr/bin/python3 $script --n $n --runs 1" \
  -n "strutrisk run, 1 worker" "$bin run $study --samples $n --workers 1 --out $out/w1" \
  -n "strutrisk run, all cores" "$bin run $study --samples $n --out $out/wall"
cat "$out/table.md"
