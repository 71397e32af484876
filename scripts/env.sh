# Shared settings for the shell scripts. Source it; do not run it.
# Every value can be overridden from the environment.
ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
export BAYWALK_DATA_DIR="${BAYWALK_DATA_DIR:-$ROOT/.data}"
export BAYWALK_DB_HOST="${BAYWALK_DB_HOST:-127.0.0.1}"
export BAYWALK_DB_PORT="${BAYWALK_DB_PORT:-3307}"
export BAYWALK_DB_NAME="${BAYWALK_DB_NAME:-baywalk}"
export BAYWALK_DB_USER="${BAYWALK_DB_USER:-baywalk}"
export BAYWALK_DB_PASSWORD="${BAYWALK_DB_PASSWORD:-baywalk-local}"
export PATH="$PATH:/usr/sbin:/usr/local/sbin:/sbin"

say() { printf 'baywalk: %s\n' "$*"; }
die() { printf 'baywalk: %s\n' "$*" >&2; exit 1; }

# Installs Debian packages when missing: as root through apt, otherwise it
# names the exact command and stops.
ensure_apt() {
  local missing=()
  local cmd pkg
  while [ $# -gt 0 ]; do
    cmd="$1"; pkg="$2"; shift 2
    command -v "$cmd" >/dev/null 2>&1 || missing+=("$pkg")
  done
  [ ${#missing[@]} -eq 0 ] && return 0
  if [ "$(id -u)" != 0 ]; then
    die "missing packages: run 'sudo apt-get install -y --no-install-recommends ${missing[*]}' and try again"
  fi
  say "installing ${missing[*]} through apt"
  if ! apt-get install -y -qq --no-install-recommends "${missing[@]}" >/dev/null 2>&1; then
    apt-get update -qq >/dev/null 2>&1 || die "apt-get update failed; install ${missing[*]} by hand"
    apt-get install -y -qq --no-install-recommends "${missing[@]}" >/dev/null || die "apt-get could not install ${missing[*]}"
  fi
}

# npm ci when node_modules is missing or older than the lockfile.
ensure_node_modules() {
  if [ ! -d "$ROOT/node_modules" ] || [ "$ROOT/package-lock.json" -nt "$ROOT/node_modules/.package-lock.json" ]; then
    say "installing npm packages (npm ci)"
    (cd "$ROOT" && npm ci --no-audit --no-fund --loglevel=error) || die "npm ci failed"
  fi
}

# Runs SQL as the database's root user over the private socket.
db_root_sql() {
  local sock
  sock=$(cat "$BAYWALK_DATA_DIR/run/socket-path")
  mariadb --no-defaults -S "$sock" -uroot -e "$1"
}

# Exports the web app when dist/ is missing or older than any client source.
ensure_web_build() {
  local stamp="$ROOT/dist/index.html"
  if [ -f "$stamp" ] && [ -z "$(cd "$ROOT" && find app components hooks shared trees assets app.json package-lock.json metro.config.js -newer "$stamp" -print -quit 2>/dev/null)" ]; then
    return 0
  fi
  say "building the web app (about 30 s the first time)"
  bash "$ROOT/scripts/build-web.sh" >/dev/null || die "the web build failed; run 'npm run build:web' to see why"
}
