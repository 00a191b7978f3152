#!/usr/bin/env bash
# A one-node Slurm cluster for tests, run as root, every file of it under
# DIR (configuration, state, spool, logs, pid files).
#   ci-cluster.sh start DIR   start munged (unless running), slurmctld, slurmd
#   ci-cluster.sh stop DIR    stop, by their pid files, the daemons start started
# Needs Debian's slurm-wlm and munge packages.
set -euo pipefail
cmd=${1:-} d=${2:-}
if [ -z "$cmd" ] || [ -z "$d" ]; then
	echo "usage: ci-cluster.sh start|stop DIR" >&2
	exit 2
fi

stop_pid() { # stop_pid PIDFILE: end the process named in it, if alive
	[ -f "$1" ] || return 0
	local pid
	pid=$(cat "$1")
	if [ -n "$pid" ] && kill -0 "$pid" 2>/dev/null; then
		kill "$pid" 2>/dev/null || true
		for _ in $(seq 50); do kill -0 "$pid" 2>/dev/null || break; sleep 0.1; done
	fi
	rm -f "$1"
}

if [ "$cmd" = stop ]; then
	stop_pid "$d/run/slurmd.pid"
	stop_pid "$d/run/slurmctld.pid"
	stop_pid "$d/run/munged.started"
	exit 0
fi
[ "$cmd" = start ] || { echo "ci-cluster.sh: unknown command $cmd" >&2; exit 2; }

d=$(mkdir -p "$d" && cd "$d" && pwd)
mkdir -p "$d/state" "$d/spool" "$d/log" "$d/run"
if [ ! -f /etc/munge/munge.key ]; then mungekey --create; fi
chown munge:munge /etc/munge/munge.key
chmod 400 /etc/munge/munge.key
mkdir -p /run/munge /var/log/munge /var/lib/munge
chown munge:munge /run/munge /var/log/munge /var/lib/munge
if ! munge -n >/dev/null 2>&1; then
	# No munged answers: start one and remember it as ours.
	su -s /bin/sh munge -c /usr/sbin/munged
	for _ in $(seq 50); do [ -s /run/munge/munged.pid ] && break; sleep 0.1; done
	cp /run/munge/munged.pid "$d/run/munged.started"
fi
h=$(hostname)
mem=$(($(free -m | awk '/Mem:/{print $2}') / 2))
cat >"$d/slurm.conf" <<C
ClusterName=ci
SlurmctldHost=$h
SlurmUser=root
AuthType=auth/munge
ProctrackType=proctrack/linuxproc
TaskPlugin=task/none
SelectType=select/cons_tres
SelectTypeParameters=CR_Core
JobAcctGatherType=jobacct_gather/none
StateSaveLocation=$d/state
SlurmdSpoolDir=$d/spool
SlurmctldPidFile=$d/run/slurmctld.pid
SlurmdPidFile=$d/run/slurmd.pid
SlurmctldLogFile=$d/log/slurmctld.log
SlurmdLogFile=$d/log/slurmd.log
ReturnToService=2
MpiDefault=none
NodeName=$h CPUs=$(nproc) RealMemory=$mem State=UNKNOWN
PartitionName=ci Nodes=$h Default=YES MaxTime=INFINITE State=UP
C
export SLURM_CONF=$d/slurm.conf
slurmctld -f "$d/slurm.conf"
slurmd -f "$d/slurm.conf"
for _ in $(seq 60); do
	if sinfo -h -o %T 2>/dev/null | grep -q idle; then
		echo "ci-cluster: one node idle (SLURM_CONF=$d/slurm.conf)"
		exit 0
	fi
	sleep 0.5
done
echo "ci-cluster: the node did not become idle; see $d/log" >&2
exit 1
