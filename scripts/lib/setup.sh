# Shared set-up for scripts/start and scripts/test: installs what is missing and manages a PostgreSQL
# cluster in a folder of our own, run as the `postgres` system user when we are root.
# Source this file; it defines functions only.

LW_ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/../.." && pwd)"

log() { printf '\033[1m[lobewright]\033[0m %s\n' "$*" >&2; }

apt_install() {
  # apt_install PKG... : installs the Debian packages that are not installed yet.
  local missing=()
  for p in "$@"; do
    dpkg-query -W -f='${Status}' "$p" 2>/dev/null | grep -q 'install ok installed' || missing+=("$p")
  done
  [ ${#missing[@]} -eq 0 ] && return 0
  log "installing Debian packages: ${missing[*]}"
  local sudo=""
  [ "$(id -u)" -ne 0 ] && sudo="sudo"
  $sudo apt-get update -qq
  DEBIAN_FRONTEND=noninteractive $sudo apt-get install -y -qq --no-install-recommends "${missing[@]}" >/dev/null
}

ensure_postgres() {
  if ! ls -d /usr/lib/postgresql/*/bin/initdb >/dev/null 2>&1; then
    apt_install postgresql
  fi
  PG_BIN="$(ls -d /usr/lib/postgresql/*/bin | sort -V | tail -n 1)"
  export PG_BIN
}

ensure_node_modules() {
  local stamp="$LW_ROOT/node_modules/.lobewright-lock"
  if [ ! -d "$LW_ROOT/node_modules" ] || ! cmp -s "$LW_ROOT/package-lock.json" "$stamp"; then
    log "installing npm packages (npm ci)"
    (cd "$LW_ROOT" && npm ci --no-audit --no-fund --loglevel=error)
    cp "$LW_ROOT/package-lock.json" "$stamp"
  fi
}

as_pg() {
  # Runs a PostgreSQL binary as the postgres system user when we are root (PostgreSQL refuses root).
  if [ "$(id -u)" -eq 0 ]; then
    runuser -u postgres -- "$@"
  else
    "$@"
  fi
}

free_port() {
  node -e 'const s=require("net").createServer();s.listen(0,"127.0.0.1",()=>{console.log(s.address().port);s.close()})'
}

pg_init() {
  # pg_init DIR : creates a cluster in DIR (superuser "lobewright", trust on loopback only) unless one exists.
  local dir="$1"
  if [ -f "$dir/PG_VERSION" ]; then return 0; fi
  mkdir -p "$dir"
  [ "$(id -u)" -eq 0 ] && chown postgres:postgres "$dir"
  chmod 700 "$dir"
  as_pg "$PG_BIN/initdb" -D "$dir" -U lobewright --auth=trust --encoding=UTF8 --locale=C.UTF-8 >/dev/null
}

pg_start() {
  # pg_start DIR PORT : starts the cluster on 127.0.0.1:PORT and waits until it accepts connections.
  local dir="$1" port="$2"
  as_pg "$PG_BIN/pg_ctl" -D "$dir" -l "$dir/server.log" -w -t 60 \
    -o "-c listen_addresses=127.0.0.1 -p $port -c unix_socket_directories='$dir' -c fsync=${PG_FSYNC:-on}" start >/dev/null
}

pg_stop() {
  local dir="$1"
  [ -f "$dir/postmaster.pid" ] && as_pg "$PG_BIN/pg_ctl" -D "$dir" -m fast -w stop >/dev/null 2>&1 || true
}

pg_create_db() {
  # pg_create_db PORT NAME : creates the database unless it exists.
  local port="$1" name="$2"
  if ! as_pg "$PG_BIN/psql" -h 127.0.0.1 -p "$port" -U lobewright -d postgres -tAc \
    "select 1 from pg_database where datname = '$name'" | grep -q 1; then
    as_pg "$PG_BIN/createdb" -h 127.0.0.1 -p "$port" -U lobewright "$name"
  fi
}
