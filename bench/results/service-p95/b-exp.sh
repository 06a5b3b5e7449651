#!/bin/bash
# exp.sh <worktree> <port> <label> [node flags...]: start serve.mjs with flags, warm up, measure 30 batches of 8 previews
d=$1; p=$2; label=$3; shift 3
rm -rf /tmp/s2/data-$p; mkdir -p /tmp/s2/data-$p
(cd $d && OZONE_DATA_DIR=/tmp/s2/data-$p NEXT_TELEMETRY_DISABLED=1 OZONE_RATE_LIMIT=100000 NODE_ENV=production exec node "$@" ${SERVE:-scripts/serve.mjs} $p > /tmp/s2/exp-$p.log 2>&1) &
pid=$!
for i in $(seq 1 60); do curl -sf localhost:$p/api/health >/dev/null && break; sleep 0.5; done
node /tmp/s2/load.mjs $p ${ROUTE:-/api/analyses/preview} 10 8 "gzip, deflate" > /dev/null
echo "$label $(SERVER_PID=$pid node /tmp/s2/load.mjs $p ${ROUTE:-/api/analyses/preview} ${BATCHES:-30} ${CONC:-8} "gzip, deflate" $SAME)" | tee -a /tmp/s2/exp.txt
kill $pid; wait $pid 2>/dev/null
