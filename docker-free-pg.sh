#!/usr/bin/env bash
# A private PostgreSQL cluster for Betasift on 127.0.0.1, from Debian's packages, no Docker.
#   ./docker-free-pg.sh up       install when missing, create the cluster once, start it, create role and databases
#   ./docker-free-pg.sh down     stop it
#   ./docker-free-pg.sh status   say whether it runs
#   ./docker-free-pg.sh url [dev|test]   print the connection URL
# Environment: BETASIFT_PG_PORT (default 55432), BETASIFT_PG_DIR (cluster folder; default .pgdata here).
# When the default port is taken by another checkout's cluster, `up` takes the next free one and remembers it
# in the cluster folder, so `url` and `status` keep naming the port this checkout's cluster really uses.
set -euo pipefail

here="$(cd "$(dirname "${BASH_SOURCE[0]}")" && pwd)"
default_port=55432
app_role="betasift"
app_password="betasift"
dev_db="betasift_dev"
test_db="betasift_test"

log() { printf 'docker-free-pg: %s\n' "$*" >&2; }

pg_bin_dir() {
  local dir
  for dir in /usr/lib/postgresql/*/bin; do
    [ -x "$dir/initdb" ] && { printf '%s\n' "$dir"; return 0; }
  done
  return 1
}

# Only install when the server binaries are missing: installing over an existing one upgrades it in place.
ensure_installed() {
  pg_bin_dir >/dev/null && return 0
  [ "$(id -u)" -eq 0 ] || { log "PostgreSQL server binaries are missing; run as root once, or: apt-get install postgresql"; exit 1; }
  log "installing PostgreSQL from Debian's packages"
  mkdir -p /etc/postgresql-common/createcluster.d
  # Keep Debian from creating and starting its own cluster on 5432.
  printf 'create_main_cluster = false\n' > /etc/postgresql-common/createcluster.d/betasift.conf
  DEBIAN_FRONTEND=noninteractive apt-get update -qq
  DEBIAN_FRONTEND=noninteractive apt-get install -y -qq postgresql >/dev/null
  pg_bin_dir >/dev/null || { log "PostgreSQL installed but no initdb found"; exit 1; }
}

# As root, the server runs as the postgres system user, which refuses to run as root.
as_owner() {
  # From / so that a checkout the postgres user cannot enter does not trouble it.
  if [ "$(id -u)" -eq 0 ]; then (cd / && runuser -u postgres -- "$@"); else "$@"; fi
}

choose_data_dir() {
  if [ -n "${BETASIFT_PG_DIR:-}" ]; then printf '%s\n' "$BETASIFT_PG_DIR"; return; fi
  local local_dir="$here/.pgdata"
  if [ "$(id -u)" -ne 0 ] || runuser -u postgres -- test -x "$here"; then
    printf '%s\n' "$local_dir"
  else
    # The postgres user cannot reach this checkout (e.g. under a mode-700 home): keep the cluster under /tmp.
    local hash
    hash="$(printf '%s' "$here" | sha1sum | cut -c1-12)"
    printf '/tmp/betasift-pg-%s\n' "$hash"
  fi
}

data_dir="$(choose_data_dir)"
cluster="$data_dir/cluster"
socket_dir="$data_dir/socket"
port_file="$data_dir/port"

# The port: an explicit BETASIFT_PG_PORT, else the one this cluster last started on, else the default.
if [ -n "${BETASIFT_PG_PORT:-}" ]; then
  port="$BETASIFT_PG_PORT"
elif [ -f "$port_file" ]; then
  port="$(cat "$port_file")"
else
  port="$default_port"
fi

port_is_taken() { (exec 3<>"/dev/tcp/127.0.0.1/$1") 2>/dev/null; }

pg() { "$(pg_bin_dir)/$1" "${@:2}"; }

is_running() {
  [ -f "$cluster/PG_VERSION" ] || return 1
  as_owner "$(pg_bin_dir)/pg_ctl" -D "$cluster" status >/dev/null 2>&1
}

init_cluster() {
  [ -f "$cluster/PG_VERSION" ] && return 0
  log "creating a private cluster in $data_dir"
  mkdir -p "$cluster" "$socket_dir"
  [ "$(id -u)" -eq 0 ] && chown -R postgres:postgres "$data_dir"
  chmod 700 "$cluster"
  as_owner "$(pg_bin_dir)/initdb" -D "$cluster" -U postgres --auth-local=trust --auth-host=scram-sha-256 \
    --encoding=UTF8 --locale=C.UTF-8 >/dev/null
  cat >> "$cluster/postgresql.conf" <<CONF
listen_addresses = '127.0.0.1'
unix_socket_directories = '$socket_dir'
fsync = off
synchronous_commit = off
full_page_writes = off
max_connections = 200
CONF
}

# A crash can leave postmaster.pid behind; remove it only when no postgres process holds that pid.
clear_stale_pid() {
  local pid_file="$cluster/postmaster.pid" pid
  [ -f "$pid_file" ] || return 0
  pid="$(head -n 1 "$pid_file")"
  if [ -n "$pid" ] && kill -0 "$pid" 2>/dev/null && grep -q postgres "/proc/$pid/comm" 2>/dev/null; then return 0; fi
  log "removing a stale pid file left by an earlier run"
  rm -f "$pid_file"
}

psql_admin() { as_owner "$(pg_bin_dir)/psql" -h "$socket_dir" -p "$port" -U postgres -d postgres -v ON_ERROR_STOP=1 -qAt "$@"; }

wait_until_ready() {
  local i
  for i in $(seq 1 60); do
    pg pg_isready -h 127.0.0.1 -p "$port" -q && return 0
    sleep 0.5
  done
  log "PostgreSQL did not accept connections on 127.0.0.1:$port; see $data_dir/server.log"
  exit 1
}

ensure_role_and_databases() {
  psql_admin -c "DO \$\$ BEGIN
      IF NOT EXISTS (SELECT FROM pg_roles WHERE rolname = '$app_role') THEN
        CREATE ROLE $app_role LOGIN CREATEDB PASSWORD '$app_password';
      END IF;
    END \$\$;"
  local db
  for db in "$dev_db" "$test_db"; do
    if [ -z "$(psql_admin -c "SELECT 1 FROM pg_database WHERE datname = '$db'")" ]; then
      psql_admin -c "CREATE DATABASE $db OWNER $app_role"
    fi
  done
}

cmd_up() {
  ensure_installed
  init_cluster
  if ! is_running; then
    clear_stale_pid
    port="${BETASIFT_PG_PORT:-$default_port}"
    if [ -z "${BETASIFT_PG_PORT:-}" ] && port_is_taken "$port"; then
      local wanted="$port"
      port=$((default_port + 1))
      while port_is_taken "$port"; do
        port=$((port + 1))
        [ "$port" -le $((default_port + 200)) ] || { log "no free port from $default_port on"; exit 1; }
      done
      log "127.0.0.1:$wanted is taken (another checkout's cluster?); using $port"
    fi
    log "starting PostgreSQL on 127.0.0.1:$port"
    as_owner "$(pg_bin_dir)/pg_ctl" -D "$cluster" -l "$data_dir/server.log" -o "-p $port" -w -t 60 start >/dev/null
    printf '%s\n' "$port" > "$port_file"
  fi
  wait_until_ready
  ensure_role_and_databases
  log "ready: $(cmd_url dev)"
}

cmd_down() {
  if is_running; then
    as_owner "$(pg_bin_dir)/pg_ctl" -D "$cluster" -m fast -w stop >/dev/null
    log "stopped"
  else
    log "not running"
  fi
}

cmd_status() {
  if is_running; then echo "running on 127.0.0.1:$port ($data_dir)"; else echo "stopped ($data_dir)"; return 3; fi
}

cmd_url() {
  local which="${1:-dev}" db
  case "$which" in
    dev) db="$dev_db" ;;
    test) db="$test_db" ;;
    *) log "url takes dev or test"; exit 2 ;;
  esac
  printf 'postgres://%s:%s@127.0.0.1:%s/%s\n' "$app_role" "$app_password" "$port" "$db"
}

case "${1:-}" in
  up) cmd_up ;;
  down) cmd_down ;;
  status) cmd_status ;;
  url) cmd_url "${2:-dev}" ;;
  *) echo "usage: $0 up|down|status|url [dev|test]" >&2; exit 2 ;;
esac
