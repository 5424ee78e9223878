#!/usr/bin/env bash
# A single-node Slurm cluster on this machine (Debian packages slurm-wlm and munge), used to run a
# sweep as a job array of shards followed by a merge job that depends on it.
#
#   cluster/slurm-localhost.sh install              apt-get install slurm-wlm munge (needs root)
#   cluster/slurm-localhost.sh start                write the configuration, start munged, slurmctld, slurmd
#   cluster/slurm-localhost.sh sweep A..B K OUT [OPTION...]
#                                                   submit K shards of "sweep --n A..B OPTION..." (e.g.
#                                                   --rank-n-cores --rank-n-time 180) and their merge; wait
#   cluster/slurm-localhost.sh stop                 stop the daemons this script started (by their pids)
#
# Everything lives under $CHIROCORE_SLURM_DIR (default /tmp/chirocore-slurm): slurm.conf, state,
# logs and pid files. The system's /etc/slurm is not touched; client commands find the
# configuration through SLURM_CONF. The jar is $CHIROCORE_JAR (default target/chirocore.jar).
set -euo pipefail
cd "$(dirname "$0")/.."

STATE=${CHIROCORE_SLURM_DIR:-/tmp/chirocore-slurm}
JAR=$(realpath "${CHIROCORE_JAR:-target/chirocore.jar}")
export SLURM_CONF=$STATE/slurm.conf
NODE=$(hostname -s)

die() { echo "slurm-localhost: $*" >&2; exit 1; }

install() {
  DEBIAN_FRONTEND=noninteractive apt-get install -y -q --no-install-recommends slurm-wlm munge
}

configure() {
  mkdir -p "$STATE/ctld" "$STATE/d" "$STATE/log"
  local cpus mem
  cpus=$(nproc)
  mem=$(( $(awk '/MemTotal/ {print $2}' /proc/meminfo) / 1024 / 2 ))
  cat > "$SLURM_CONF" <<CONF
# written by cluster/slurm-localhost.sh: one node, this machine
ClusterName=chirocore
SlurmctldHost=$NODE
SlurmUser=root
SlurmdUser=root
SlurmctldPort=6817
SlurmdPort=6818
AuthType=auth/munge
StateSaveLocation=$STATE/ctld
SlurmdSpoolDir=$STATE/d
SlurmctldPidFile=$STATE/slurmctld.pid
SlurmdPidFile=$STATE/slurmd.pid
SlurmctldLogFile=$STATE/log/slurmctld.log
SlurmdLogFile=$STATE/log/slurmd.log
ProctrackType=proctrack/linuxproc
TaskPlugin=task/none
SchedulerType=sched/backfill
SelectType=select/cons_tres
SelectTypeParameters=CR_Core
MpiDefault=none
ReturnToService=2
JobCompType=jobcomp/none
AccountingStorageType=accounting_storage/none
JobAcctGatherType=jobacct_gather/none
NodeName=$NODE CPUs=$cpus RealMemory=$mem State=UNKNOWN
PartitionName=local Nodes=$NODE Default=YES MaxTime=INFINITE State=UP OverSubscribe=NO
CONF
}

start() {
  command -v slurmctld >/dev/null && command -v munged >/dev/null || die "slurm-wlm and munge are not installed (run: $0 install)."
  if [ -f "$SLURM_CONF" ] && sinfo -h -N -o '%T' 2>/dev/null | grep -qE '^(idle|mixed|allocated)'; then
    echo "slurm-localhost: node $NODE is already up"
    return 0
  fi
  configure
  if ! munge -n </dev/null >/dev/null 2>&1; then
    mkdir -p /run/munge && chown munge:munge /run/munge
    # munged runs as the munge user, like Debian's service unit; its pid file is our record
    runuser -u munge -- /usr/sbin/munged --pid-file=/run/munge/munged.pid
    cp /run/munge/munged.pid "$STATE/munged.pid"
  fi
  munge -n </dev/null | unmunge >/dev/null || die "munge does not work."
  /usr/sbin/slurmctld -f "$SLURM_CONF"
  /usr/sbin/slurmd -f "$SLURM_CONF"
  for _ in $(seq 1 60); do
    if sinfo -h -N -o '%T' 2>/dev/null | grep -qE '^(idle|mixed|allocated)'; then
      echo "slurm-localhost: node $NODE is up"; sinfo
      return 0
    fi
    sleep 1
  done
  die "the node did not come up; see $STATE/log/."
}

stop() {
  for d in slurmd slurmctld munged; do
    if [ -f "$STATE/$d.pid" ]; then
      pid=$(cat "$STATE/$d.pid")
      if kill "$pid" 2>/dev/null; then echo "slurm-localhost: stopped $d ($pid)"; fi
      rm -f "$STATE/$d.pid"
    fi
  done
}

sweep() {
  [ $# -ge 3 ] || die "usage: $0 sweep A..B K OUT [SWEEP OPTION...]"
  local range=$1 k=$2 out options=""
  out=$(realpath -m "$3")
  shift 3
  # further arguments go to every shard's sweep command, each quoted for the job's shell
  [ $# -eq 0 ] || options=$(printf ' %q' "$@")
  [ -f "$JAR" ] || die "$JAR is missing (run: mvn -B -o package -DskipTests)."
  mkdir -p "$out"
  local array
  # shard i of k writes OUT/shard-i; its progress lines go to OUT/shard-i.log
  array=$(sbatch --parsable --job-name=sweep-shards --array=0-$((k - 1)) --cpus-per-task=1 \
    --output="$out/shard-%a.log" --wrap="java -jar '$JAR' sweep --n $range --shard \$SLURM_ARRAY_TASK_ID/$k$options --out '$out'/shard-\$SLURM_ARRAY_TASK_ID")
  echo "slurm-localhost: submitted shard array $array"
  local shards=""
  for i in $(seq 0 $((k - 1))); do shards="$shards '$out/shard-$i'"; done
  # the merge waits for every shard to succeed (afterok) and --wait blocks until it ends
  sbatch --wait --job-name=sweep-merge --dependency=afterok:"$array" --kill-on-invalid-dep=yes \
    --output="$out/merge.log" --wrap="java -jar '$JAR' sweep-merge $shards --out '$out/merged'"
  echo "slurm-localhost: merged into $out/merged"
}

case "${1:-}" in
  install) install ;;
  start) start ;;
  stop) stop ;;
  sweep) shift; sweep "$@" ;;
  *) die "usage: $0 install | start | sweep A..B K OUT [SWEEP OPTION...] | stop" ;;
esac
