#!/usr/bin/env bash
# `npm run test:cluster`: brings the cluster up if it is not (scripts/cluster.sh), then runs the fault test
# (tests/cluster/fault-run.ts; CLUSTER_TEST_SECONDS changes the 60 s run). The cluster stays up afterwards:
# `npm run cluster -- stop` stops it.
set -euo pipefail
source "$(dirname "$0")/env.sh"
cd "$ROOT"
bash scripts/cluster.sh up
npx tsx tests/cluster/fault-run.ts
bash scripts/cluster-backup-check.sh
