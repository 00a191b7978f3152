#!/usr/bin/env bash
# End-to-end test of a split run on a real (one-node) Slurm: starts a
# cluster in a temporary folder (ci-cluster.sh), submits the reference
# strut study (1e7 samples) as an array of N shards and the dependent
# merge (submit.sh), waits, and checks that the merged folder equals a
# single-machine run byte for byte. Stops the daemons it started.
#   e2e.sh [N]   (default 4; run as root from the repository)
set -euo pipefail
n=${1:-4}
here=$(cd "$(dirname "$0")" && pwd)
repo=$(cd "$here/../.." && pwd)
tmp=$(mktemp -d)
cleanup() {
	"$here/ci-cluster.sh" stop "$tmp/cluster" || true
	rm -rf "$tmp"
}
trap cleanup EXIT
go build -o "$tmp/strutrisk" "$repo/cmd/strutrisk"
"$here/ci-cluster.sh" start "$tmp/cluster"
export SLURM_CONF=$tmp/cluster/slurm.conf STRUTRISK=$tmp/strutrisk
study=$repo/studies/bench/reference-strut.toml
cd "$tmp"
read -r array merge < <("$here/submit.sh" "$study" "$n" "$tmp/shards" "$tmp/merged")
echo "e2e: array job $array ($n shards), merge job $merge"
for _ in $(seq 1200); do
	[ -z "$(squeue -h -j "$array,$merge" 2>/dev/null)" ] && break
	sleep 0.5
done
if [ -n "$(squeue -h -j "$array,$merge" 2>/dev/null)" ]; then
	echo "e2e: the jobs did not finish in 10 minutes" >&2
	squeue >&2
	exit 1
fi
if [ ! -f "$tmp/merged/results.json" ]; then
	echo "e2e: the merge job wrote no results" >&2
	cat "$tmp"/strutrisk-*.log >&2 || true
	exit 1
fi
"$tmp/strutrisk" run "$study" --out "$tmp/single" 2>/dev/null
if ! diff -r "$tmp/single" "$tmp/merged"; then
	echo "e2e: the merged results differ from the single run" >&2
	exit 1
fi
echo "e2e: $n Slurm shards merged equal the single run, byte for byte"
