#!/usr/bin/env bash
# Submits a study split into N shards as a Slurm job array and its merge
# as a job that runs once every shard succeeded. Prints the two job ids.
#   submit.sh STUDY.toml N SHARDS_DIR OUT_DIR [run flags...]
# e.g. submit.sh study.toml 64 /shared/shards /shared/results --method monte-carlo
# The study, SHARDS_DIR and OUT_DIR must be on a file system every node
# sees; set STRUTRISK to the binary's path if it is not on PATH there.
set -euo pipefail
if [ $# -lt 4 ]; then
	echo "usage: submit.sh STUDY.toml N SHARDS_DIR OUT_DIR [run flags...]" >&2
	exit 2
fi
here=$(cd "$(dirname "$0")" && pwd)
study=$1 n=$2 shards=$3 out=$4
shift 4
mkdir -p "$shards"
array=$(sbatch --parsable --export=ALL --array=0-$((n - 1)) "$here/shards.sbatch" "$study" "$shards" "$@")
array=${array%%;*}
merge=$(sbatch --parsable --export=ALL --dependency=afterok:"$array" "$here/merge.sbatch" "$shards" "$out")
echo "$array ${merge%%;*}"
