# Shared helpers for the project's shell scripts. Source it; do not run it.
# Every failure ends in one line that says what to do, not a stack trace.

ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
export TMPDIR="$ROOT/.tmp"   # drizzle-kit, tsx and Playwright write caches here, not in /tmp
mkdir -p "$TMPDIR"

say()  { printf '\033[1m==>\033[0m %s\n' "$*"; }
fail() { printf 'thawline: %s\n' "$*" >&2; exit 1; }

APT_UPDATED=0
# ensure_debian_packages PKG... — install Debian packages that are missing (needs root).
ensure_debian_packages() {
  local missing=()
  for p in "$@"; do dpkg-query -W -f='${Status}' "$p" 2>/dev/null | grep -q "install ok installed" || missing+=("$p"); done
  [ ${#missing[@]} -eq 0 ] && return 0
  [ "$(id -u)" -eq 0 ] || fail "missing Debian packages (${missing[*]}); run as root or install them: apt-get install ${missing[*]}"
  say "Installing Debian packages: ${missing[*]}"
  if [ "$APT_UPDATED" -eq 0 ]; then
    apt-get update -qq >"$TMPDIR/apt-update.log" 2>&1 || fail "apt-get update failed (no package access?); see $TMPDIR/apt-update.log"
    APT_UPDATED=1
  fi
  DEBIAN_FRONTEND=noninteractive apt-get install -y -qq --no-install-recommends "${missing[@]}" >"$TMPDIR/apt-install.log" 2>&1 \
    || fail "apt-get install ${missing[*]} failed (no package access?); see $TMPDIR/apt-install.log"
}

# ensure_node_modules — npm ci when node_modules is missing or older than the lockfile.
ensure_node_modules() {
  cd "$ROOT"
  if [ ! -f node_modules/.package-lock.json ] || [ package-lock.json -nt node_modules/.package-lock.json ]; then
    say "Installing npm packages (npm ci)"
    npm ci --no-audit --no-fund --loglevel=error >"$TMPDIR/npm-ci.log" 2>&1 \
      || fail "npm ci failed (no registry access?); see $TMPDIR/npm-ci.log"
  fi
}

# port_in_use PORT — true if something listens on 127.0.0.1:PORT.
port_in_use() {
  (exec 3<>"/dev/tcp/127.0.0.1/$1") 2>/dev/null
}

# check_port NAME VALUE — a port number, or one line naming the variable.
check_port() {
  [[ "$2" =~ ^[0-9]+$ ]] && [ "$2" -ge 1 ] && [ "$2" -le 65535 ] || fail "$1 must be a port number from 1 to 65535, got '$2'"
}
