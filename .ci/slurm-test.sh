#!/usr/bin/env bash
# Integration test of `hunch slurm` against a real single-node Slurm cluster on this machine:
# install slurm-wlm and munge, start munged, slurmctld and slurmd for localhost, submit the job array
# that `hunch slurm` writes for test/slurm/permutations.yaml, wait for it and its merge job, and check
# that `hunch status` shows the whole range verified with the counts of a single-process run.
# Needs root (it installs packages and runs the daemons as root). Prints SKIPPED with the reason and
# exits 0 only when the packages cannot be installed; any other problem fails.
set -euo pipefail
cd "$(dirname "$0")/.."
ROOT=$(pwd)
HUNCH="node $ROOT/bin/hunch"
SHARDS=4
TIMEOUT=${SLURM_TEST_TIMEOUT:-240}

skip() { echo "SKIPPED slurm integration test: $*"; exit 0; }
say() { echo "[slurm-test] $*"; }

[ "$(id -u)" = 0 ] || skip "it must run as root (to install slurm-wlm and munge and start their daemons)"
if ! command -v slurmctld >/dev/null || ! command -v munged >/dev/null; then
  export DEBIAN_FRONTEND=noninteractive
  apt-get update -qq >/tmp/slurm-test-apt.log 2>&1 || skip "apt-get update failed: $(tail -1 /tmp/slurm-test-apt.log)"
  apt-get install -y -qq --no-install-recommends slurm-wlm munge >>/tmp/slurm-test-apt.log 2>&1 \
    || skip "apt-get could not install slurm-wlm and munge: $(tail -1 /tmp/slurm-test-apt.log)"
fi
[ -f dist/cli/main.js ] || npx tsc -p .

WORK=$(mktemp -d /tmp/hunch-slurm-XXXXXX)
HOST=$(hostname -s)
CONF=$WORK/slurm.conf
export SLURM_CONF=$CONF
mkdir -p "$WORK/state" "$WORK/spool" "$WORK/log" "$WORK/project/conjectures" "$WORK/munge"

cleanup() {
  set +e
  [ -f "$WORK/slurmd.pid" ] && kill "$(cat "$WORK/slurmd.pid")" 2>/dev/null
  [ -f "$WORK/slurmctld.pid" ] && kill "$(cat "$WORK/slurmctld.pid")" 2>/dev/null
  [ -f "$WORK/munge/munged.pid" ] && kill "$(cat "$WORK/munge/munged.pid")" 2>/dev/null
  sleep 1
}
trap cleanup EXIT
fail() {
  echo "FAILED slurm integration test: $*"
  for f in "$WORK"/log/*.log "$WORK"/project/ledgers/*.out; do [ -f "$f" ] && { echo "--- $f"; tail -20 "$f"; }; done
  exit 1
}

# --- munge: a fresh key and a daemon of our own (its socket under $WORK) ---
dd if=/dev/urandom of="$WORK/munge/munge.key" bs=1024 count=1 status=none
chmod 400 "$WORK/munge/munge.key"
SOCKET=$WORK/munge/munge.socket
munged --force --key-file="$WORK/munge/munge.key" --socket="$SOCKET" --pid-file="$WORK/munge/munged.pid" \
  --log-file="$WORK/log/munged.log" --seed-file="$WORK/munge/munged.seed" || fail "munged did not start"

# --- slurm.conf for one node, this machine, as root ---
cat >"$CONF" <<CONF
ClusterName=hunchci
SlurmctldHost=$HOST
SlurmUser=root
SlurmdUser=root
AuthType=auth/munge
AuthInfo=socket=$SOCKET
CredType=cred/munge
ProctrackType=proctrack/linuxproc
TaskPlugin=task/none
SwitchType=switch/none
MpiDefault=none
SchedulerType=sched/backfill
SelectType=select/cons_tres
SelectTypeParameters=CR_Core
ReturnToService=2
StateSaveLocation=$WORK/state
SlurmdSpoolDir=$WORK/spool
SlurmctldPidFile=$WORK/slurmctld.pid
SlurmdPidFile=$WORK/slurmd.pid
SlurmctldLogFile=$WORK/log/slurmctld.log
SlurmdLogFile=$WORK/log/slurmd.log
SlurmctldPort=6917
SlurmdPort=6918
JobAcctGatherType=jobacct_gather/none
AccountingStorageType=accounting_storage/none
MinJobAge=600
NodeName=$HOST NodeAddr=127.0.0.1 CPUs=2 State=UNKNOWN
PartitionName=ci Nodes=$HOST Default=YES MaxTime=INFINITE State=UP
CONF

slurmctld -f "$CONF" || fail "slurmctld did not start"
slurmd -f "$CONF" || fail "slurmd did not start"
for _ in $(seq 1 60); do
  state=$(sinfo -h -N -o %t 2>/dev/null | head -1 || true)
  [ "$state" = idle ] && break
  sleep 1
done
[ "$state" = idle ] || fail "the node did not become idle (state: ${state:-none})"
say "cluster up: node $HOST idle"

# --- the project, the reference run, the generated scripts ---
P=$WORK/project
cp test/slurm/permutations.yaml "$P/conjectures/"
touch "$P/hunch.yaml"
(cd "$P" && $HUNCH check conjectures --no-ledger --workers 1 --json >"$WORK/single.json") || fail "the single-process run failed"
(cd "$P" && $HUNCH slurm conjectures --shards $SHARDS --cpus 1 --partition ci --time 10:00 -o jobs/check.sbatch) || fail "hunch slurm failed"
out=$(cd "$P" && sh jobs/check-submit.sh) || fail "submitting failed: $out"
say "$out"

# --- wait for the array and the merge job ---
deadline=$((SECONDS + TIMEOUT))
while squeue -h -o %i 2>/dev/null | grep -q .; do
  [ $SECONDS -lt $deadline ] || { squeue; fail "jobs still queued after ${TIMEOUT}s"; }
  sleep 2
done
say "all jobs finished"
n=$(ls "$P"/ledgers/shard-*.jsonl 2>/dev/null | wc -l)
[ "$n" = $SHARDS ] || fail "expected $SHARDS shard ledgers, found $n"
[ -s "$P/hunch-ledger.jsonl" ] || fail "the merge job wrote no project ledger"

# --- the ledger must prove the whole range, with the single-process counts ---
(cd "$P" && $HUNCH status conjectures --json >"$WORK/status.json") || fail "hunch status failed"
node - "$WORK/single.json" "$WORK/status.json" "$P/hunch-ledger.jsonl" "$SHARDS" <<'JS' || fail "the merged ledger does not match the single-process run"
const fs = require('fs');
const [single, status, ledger, shards] = process.argv.slice(2);
const want = JSON.parse(fs.readFileSync(single, 'utf8')).results[0];
const st = JSON.parse(fs.readFileSync(status, 'utf8'));
const recs = fs.readFileSync(ledger, 'utf8').split('\n').filter(Boolean).map((l) => JSON.parse(l));
const bySize = {};
for (const r of recs) {
  const k = `${r.phase} ${JSON.stringify(r.size)}`;
  (bySize[k] ??= { cases: 0, shards: new Set() }).cases += r.cases;
  bySize[k].shards.add(r.shard);
}
let bad = 0;
for (const p of want.checked) {
  const k = `${p.phase} ${JSON.stringify(p.size)}`;
  const got = bySize[k];
  const ok = got && got.cases === p.cases && got.shards.size === Number(shards);
  console.log(`${ok ? 'ok ' : 'BAD'} ${k}: single ${p.cases}, shards ${got ? got.cases : 'none'} from ${got ? got.shards.size : 0} slices`);
  if (!ok) bad++;
}
// hunch status must count every exhaustive size as verified, with the single-process counts.
const c = st.conjectures.find((x) => x.id === want.id);
const verified = new Map((c ? c.exhaustive : []).map((e) => [JSON.stringify(e.size), e.cases]));
for (const p of want.checked.filter((q) => q.phase === 'exhaustive')) {
  const got = verified.get(JSON.stringify(p.size));
  if (got !== p.cases) { console.log(`BAD status: size ${JSON.stringify(p.size)} verified with ${got ?? 'nothing'}, single run ${p.cases}`); bad++; }
}
if (!c || c.unfinished.length > 0 || c.stale) { console.log(`BAD status: unfinished or stale records: ${JSON.stringify(c)}`); bad++; }
else console.log(`ok  status: n = ${[...verified.keys()].map((k) => JSON.parse(k).n).join(',')} verified, nothing unfinished`);
process.exit(bad ? 1 : 0);
JS
(cd "$P" && $HUNCH status conjectures)
say "PASSED: $SHARDS array tasks and the merge job cover exactly the single-process run"
