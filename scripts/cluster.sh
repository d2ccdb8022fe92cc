#!/usr/bin/env bash
# npm run cluster [-- --galera] [-- --check | --bench]
#   npm run test:cluster = --check, npm run bench:cluster = --bench
#
# More than one server, on loopback: two app replicas behind nginx (Debian's package) as the
# load balancer, on either the project's single MariaDB or, with --galera, a three-node MariaDB
# Galera cluster (Debian's galera-4 and mariadb-backup), each node with its own data directory
# and ports under $CLUSTER_DIR (.data/cluster/). Without --check it runs until Ctrl-C; with
# --check it runs scripts/cluster-check.ts against the balancer and stops everything again.
#
#   balancer     http://127.0.0.1:$LB_PORT        (round robin, passive health checks)
#   replicas     127.0.0.1:$A_PORT, 127.0.0.1:$B_PORT
#   database     single: 127.0.0.1:$DB_PORT (the project's MariaDB, database specbench_cluster)
#                galera: nodes on 3321-3323; replica A reaches them through nginx's stream proxy
#                on 3320 (node 1 first, the others as backups), replica B through 3330 (node 2 first)
source "$(dirname "${BASH_SOURCE[0]}")/lib.sh"

GALERA=0 CHECK=0 BENCH=0
for arg in "$@"; do
  case "$arg" in
    --galera) GALERA=1 ;;
    --check) CHECK=1 ;;
    --bench) BENCH=1 ;;
    *) echo "usage: npm run cluster -- [--galera] [--check | --bench]" >&2; exit 2 ;;
  esac
done

CLUSTER_DIR="${CLUSTER_DIR:-$DATA_DIR/cluster}"
LB_PORT="${CLUSTER_LB_PORT:-8180}" A_PORT="${CLUSTER_A_PORT:-8181}" B_PORT="${CLUSTER_B_PORT:-8182}"
NODE_SQL=(0 3321 3322 3323) NODE_GCOMM=(0 4571 4572 4573) NODE_IST=(0 4581 4582 4583) NODE_SST=(0 4591 4592 4593)
GCOMM_ADDRESS="gcomm://127.0.0.1:4571,127.0.0.1:4572,127.0.0.1:4573"
export DB_NAME=specbench_cluster

ensure_apt nginx nginx
if [ "$GALERA" = 1 ]; then
  ensure_apt mariabackup mariadb-backup
  [ -f /usr/lib/galera/libgalera_smm.so ] || { DEBIAN_FRONTEND=noninteractive apt-get install -y -q galera-4 >/dev/null; }
  [ -f /usr/lib/nginx/modules/ngx_stream_module.so ] ||
    DEBIAN_FRONTEND=noninteractive apt-get install -y -q libnginx-mod-stream >/dev/null
fi

# --- shutdown -------------------------------------------------------------------------------
stop_pidfile() { # stop_pidfile <file> [signal]
  [ -f "$1" ] || return 0
  local pid; pid="$(cat "$1")"
  kill "-${2:-TERM}" "$pid" 2>/dev/null || true
  for _ in $(seq 1 150); do kill -0 "$pid" 2>/dev/null || break; sleep 0.1; done
  rm -f "$1"
}
cleanup() {
  log "cluster: stopping the replicas, the balancer$([ "$GALERA" = 1 ] && echo ' and the Galera nodes')"
  stop_pidfile "$CLUSTER_DIR/replica-a.pid"
  stop_pidfile "$CLUSTER_DIR/replica-b.pid"
  stop_pidfile "$CLUSTER_DIR/nginx.pid" QUIT
  if [ "$GALERA" = 1 ]; then
    for n in 3 2 1; do stop_pidfile "$CLUSTER_DIR/node$n/pid"; done
    rm -rf "$CLUSTER_DIR"/node{1,2,3}/data # ~200 MB each; logs stay for a look
  else
    db_sql "DROP DATABASE IF EXISTS specbench_cluster;" 2>/dev/null || true
    if [ "$DB_STARTED_HERE" = 1 ]; then db_stop; fi
  fi
}

# --- Galera ---------------------------------------------------------------------------------
node_sql() { mariadb --no-defaults --protocol=socket -S "$CLUSTER_DIR/node$1/s" -u "$(id -un)" -Nse "$2"; }

# Writes node<n>/start.sh (so the check can restart a node the same way) and runs it.
galera_node_start() { # galera_node_start <n> [extra mariadbd flags]
  local n="$1"; shift
  local d="$CLUSTER_DIR/node$n"
  mkdir -p "$d/tmp" "$d/sst_log_archive"
  if [ ! -d "$d/data/mysql" ]; then
    mariadb-install-db --no-defaults --user="$(id -un)" --datadir="$d/data" \
      --auth-root-authentication-method=socket --skip-test-db --skip-name-resolve >/dev/null
  fi
  # A private defaults file: the SST scripts read option files themselves (STACK.md, Galera).
  # wsrep-sync-wait=1: a read waits until its node has applied what the cluster committed, so an
  # edit through one node is read back through another (the version a 409 compares with).
  printf '[mysqld]\ninnodb_buffer_pool_size=64M\n[sst]\nsst-log-archive-dir=%s\nsockopt=bind=127.0.0.1\n' \
    "$d/sst_log_archive" >"$d/my.cnf"
  cat >"$d/start.sh" <<EOF
#!/usr/bin/env bash
exec mariadbd --defaults-file="$d/my.cnf" --user="$(id -un)" --datadir="$d/data" --socket="$d/s" \\
  --pid-file="$d/pid" --log-error="$d/mysqld.log" --tmpdir="$d/tmp" --port=${NODE_SQL[$n]} --bind-address=127.0.0.1 \\
  --skip-name-resolve --local-infile=0 --character-set-server=utf8mb4 --collation-server=utf8mb4_unicode_ci \\
  --max-connections=200 --binlog-format=ROW --default-storage-engine=InnoDB --innodb-autoinc-lock-mode=2 \\
  --wsrep-on=ON --wsrep-provider=/usr/lib/galera/libgalera_smm.so --wsrep-cluster-name=specbench --wsrep-sync-wait=1 \\
  --wsrep-node-name=node$n --wsrep-cluster-address=$GCOMM_ADDRESS --wsrep-node-address=127.0.0.1:${NODE_GCOMM[$n]} \\
  --wsrep-provider-options="gmcast.listen_addr=tcp://127.0.0.1:${NODE_GCOMM[$n]};ist.recv_addr=127.0.0.1:${NODE_IST[$n]};gcache.size=64M" \\
  --wsrep-sst-method=mariabackup --wsrep-sst-receive-address=127.0.0.1:${NODE_SST[$n]} "\$@"
EOF
  setsid bash "$d/start.sh" "$@" </dev/null >/dev/null 2>&1 &
  galera_wait_synced "$n"
}

galera_wait_synced() {
  for _ in $(seq 1 600); do
    [ "$(node_sql "$1" "SHOW STATUS LIKE 'wsrep_local_state_comment'" 2>/dev/null | cut -f2)" = Synced ] && return 0
    sleep 0.2
  done
  echo "Galera node $1 did not reach Synced; see $CLUSTER_DIR/node$1/mysqld.log" >&2
  tail -20 "$CLUSTER_DIR/node$1/mysqld.log" >&2
  return 1
}

galera_start() {
  for n in 1 2 3; do
    if [ -f "$CLUSTER_DIR/node$n/pid" ] && kill -0 "$(cat "$CLUSTER_DIR/node$n/pid")" 2>/dev/null; then
      echo "Galera node $n already runs (pid $(cat "$CLUSTER_DIR/node$n/pid")): stop it first" >&2; exit 1
    fi
  done
  # Every run bootstraps a fresh cluster: no stale grastate.dat to reason about.
  rm -rf "$CLUSTER_DIR"/node{1,2,3}
  log "cluster: bootstrapping Galera node 1 (127.0.0.1:${NODE_SQL[1]})"
  galera_node_start 1 --wsrep-new-cluster
  # The app's account is created on node 1; Galera replicates it.
  node_sql 1 "CREATE USER IF NOT EXISTS '$DB_USER'@'127.0.0.1' IDENTIFIED BY '$DB_PASSWORD';
              GRANT ALL PRIVILEGES ON \`specbench%\`.* TO '$DB_USER'@'127.0.0.1';"
  for n in 2 3; do
    log "cluster: joining Galera node $n (127.0.0.1:${NODE_SQL[$n]}; state transfer by mariabackup)"
    galera_node_start "$n"
  done
  log "cluster: Galera size $(node_sql 1 "SHOW STATUS LIKE 'wsrep_cluster_size'" | cut -f2)"
}

# --- nginx ----------------------------------------------------------------------------------
nginx_start() {
  mkdir -p "$CLUSTER_DIR/nginx-tmp"
  local stream_module="" stream=""
  if [ "$GALERA" = 1 ]; then
    stream_module="load_module /usr/lib/nginx/modules/ngx_stream_module.so;"
    # One writer node per replica (fewer certification conflicts), the others as fail-over.
    stream="stream {
  upstream galera_a { server 127.0.0.1:${NODE_SQL[1]} max_fails=1 fail_timeout=5s; server 127.0.0.1:${NODE_SQL[3]} backup; server 127.0.0.1:${NODE_SQL[2]} backup; }
  upstream galera_b { server 127.0.0.1:${NODE_SQL[2]} max_fails=1 fail_timeout=5s; server 127.0.0.1:${NODE_SQL[3]} backup; server 127.0.0.1:${NODE_SQL[1]} backup; }
  server { listen 127.0.0.1:3320; proxy_pass galera_a; proxy_connect_timeout 1s; }
  server { listen 127.0.0.1:3330; proxy_pass galera_b; proxy_connect_timeout 1s; }
}"
  fi
  cat >"$CLUSTER_DIR/nginx.conf" <<EOF
$stream_module
$( [ "$(id -u)" -eq 0 ] && echo "user root;" )
worker_processes 1;
pid $CLUSTER_DIR/nginx.pid;
error_log $CLUSTER_DIR/nginx-error.log warn;
events { worker_connections 1024; }
http {
  access_log $CLUSTER_DIR/nginx-access.log;
  client_body_temp_path $CLUSTER_DIR/nginx-tmp/body;
  proxy_temp_path $CLUSTER_DIR/nginx-tmp/proxy;
  fastcgi_temp_path $CLUSTER_DIR/nginx-tmp/fastcgi;
  uwsgi_temp_path $CLUSTER_DIR/nginx-tmp/uwsgi;
  scgi_temp_path $CLUSTER_DIR/nginx-tmp/scgi;
  # The app compresses and sets its own caching headers: nginx passes them through untouched.
  gzip off;
  client_max_body_size 11m;
  upstream specbench {
    # Round robin; a replica that fails twice is left out for 2 s (passive health checks). A
    # rolling restart waits that long after a replica is ready before stopping the next one.
    server 127.0.0.1:$A_PORT max_fails=2 fail_timeout=2s;
    server 127.0.0.1:$B_PORT max_fails=2 fail_timeout=2s;
  }
  server {
    listen 127.0.0.1:$LB_PORT;
    # Operator-only pages stay on the replicas' own loopback ports.
    location = /metrics { return 404; }
    location /dev/ { return 404; }
    location / {
      proxy_pass http://specbench;
      proxy_http_version 1.1;
      proxy_set_header Host \$host;
      proxy_set_header X-Forwarded-For \$proxy_add_x_forwarded_for;
      proxy_set_header X-Forwarded-Proto \$scheme;
      proxy_set_header X-Request-Id \$request_id;
      # Which replica answered (loopback addresses only): a rolling restart waits until the
      # restarted replica answers through the balancer again before stopping the next.
      add_header X-Upstream \$upstream_addr always;
      # Retried on the other replica: refused or failed connections (any method: nothing was
      # sent), and 502/503/504 answers for idempotent methods only (no non_idempotent flag).
      proxy_next_upstream error timeout http_502 http_503 http_504;
      proxy_next_upstream_tries 2;
      proxy_connect_timeout 2s;
      proxy_read_timeout 30s;
      # An upload answers when its preview is ready: 30 s or more for the largest file
      # accepted (200 000 rows), longer when it waits behind the two a replica previews at
      # once; its commit is as long. Not retried (POST), whatever the timeout.
      location ~ ^/api/imports(/[0-9]+/commit)?\$ {
        proxy_pass http://specbench;
        proxy_read_timeout 180s;
      }
    }
  }
}
$stream
EOF
  nginx -t -c "$CLUSTER_DIR/nginx.conf" -p "$CLUSTER_DIR" >/dev/null 2>&1 || nginx -t -c "$CLUSTER_DIR/nginx.conf" -p "$CLUSTER_DIR"
  nginx -c "$CLUSTER_DIR/nginx.conf" -p "$CLUSTER_DIR"
  log "cluster: nginx balancing http://127.0.0.1:$LB_PORT → :$A_PORT, :$B_PORT"
}

# --- replicas -------------------------------------------------------------------------------
# Writes replica-<name>.sh (so the check can restart a replica the same way) and runs it.
replica_start() { # replica_start <name> <port> <db port> <smtp port>
  cat >"$CLUSTER_DIR/replica-$1.sh" <<EOF
#!/usr/bin/env bash
cd "$ROOT"
export PORT=$2 HOST=127.0.0.1 DB_HOST=127.0.0.1 DB_PORT=$3 DB_NAME=$DB_NAME DB_USER=$DB_USER DB_PASSWORD=$DB_PASSWORD
export FAKE_SMTP_PORT=$4 NODE_ENV=development LOG_LEVEL=info DATA_DIR="$DATA_DIR" OUTBOX_POLL_MS=500
echo \$\$ >"$CLUSTER_DIR/replica-$1.pid"
exec node dist-server/server/index.js >>"$CLUSTER_DIR/replica-$1.log" 2>&1
EOF
  setsid bash "$CLUSTER_DIR/replica-$1.sh" </dev/null >/dev/null 2>&1 &
}
wait_ready() { # wait_ready <port>
  for _ in $(seq 1 150); do curl -sf "http://127.0.0.1:$1/api/health/ready" >/dev/null && return 0; sleep 0.2; done
  echo "replica on :$1 did not become ready; see $CLUSTER_DIR/replica-*.log" >&2
  return 1
}

# --- run ------------------------------------------------------------------------------------
mkdir -p "$CLUSTER_DIR"
trap cleanup EXIT
trap 'exit 130' INT TERM
ensure_npm
build_server

if [ "$GALERA" = 1 ]; then
  galera_start
  DB_A=3320 DB_B=3330
else
  db_start
  DB_A="$DB_PORT" DB_B="$DB_PORT"
fi
nginx_start
# Migrations and the demo data run once, from one node (through replica A's entry point).
log "cluster: migrating $DB_NAME once"
DB_PORT="$DB_A" node dist-server/server/cli/setup.js >"$CLUSTER_DIR/setup.log" 2>&1 || { cat "$CLUSTER_DIR/setup.log" >&2; exit 1; }
replica_start a "$A_PORT" "$DB_A" 2631
replica_start b "$B_PORT" "$DB_B" 2632
wait_ready "$A_PORT"
wait_ready "$B_PORT"
log "cluster: replicas ready: http://127.0.0.1:$LB_PORT (logs in $CLUSTER_DIR)"

bench_reads() { # bench_reads <label> <port>
  log "bench: $1"
  BENCH_URL="http://127.0.0.1:$2" BENCH_SECONDS="${BENCH_SECONDS:-15}" \
    npx tsx --tsconfig server/tsconfig.json scripts/bench-api.ts
}

if [ "$BENCH" = 1 ]; then
  # Spec reads at 50 connections (scripts/bench-api.ts), the load generator on the same 2 cores.
  bench_reads "one replica directly, no balancer" "$A_PORT"
  bench_reads "balancer, two replicas" "$LB_PORT"
  stop_pidfile "$CLUSTER_DIR/replica-b.pid"
  sleep 3 # past nginx's fail_timeout: B is simply gone
  bench_reads "balancer, one replica" "$LB_PORT"
elif [ "$CHECK" = 1 ]; then
  CLUSTER_DIR="$CLUSTER_DIR" LB_PORT="$LB_PORT" A_PORT="$A_PORT" B_PORT="$B_PORT" GALERA="$GALERA" \
    DB_A="$DB_A" DB_B="$DB_B" npx tsx --tsconfig server/tsconfig.json scripts/cluster-check.ts
else
  log "cluster: Ctrl-C stops everything"
  while true; do sleep 3600; done
fi
