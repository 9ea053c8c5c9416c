# Shared first steps of `npm start` and `npm test` on a fresh machine:
# Node dependencies, PostgreSQL from Debian's packages, and (for tests) Chromium.
set -euo pipefail

apt_updated=0
apt_install() {
  if [ "$(id -u)" != "0" ]; then
    echo "Portwright needs the Debian package(s) $* — install them (sudo apt-get install -y $*) and run again." >&2
    exit 1
  fi
  if [ "$apt_updated" = 0 ]; then apt-get update -qq; apt_updated=1; fi
  DEBIAN_FRONTEND=noninteractive apt-get install -y -qq "$@" >/dev/null
}

ensure_node_modules() {
  # Reinstall when node_modules was not installed from this exact lock file. The check and the
  # install hold one lock, so two starts at once cannot run `npm ci` over each other.
  mkdir -p .data
  (
    flock 9
    local want have=""
    want=$(sha256sum package-lock.json | cut -d' ' -f1)
    [ -f node_modules/.portwright-lock ] && have=$(cat node_modules/.portwright-lock)
    if [ ! -d node_modules ] || [ "$want" != "$have" ]; then
      echo "Installing Node dependencies (npm ci)…"
      npm ci --no-audit --no-fund --loglevel=error
      echo "$want" > node_modules/.portwright-lock
    fi
  ) 9>.data/.npm-install.lock
}

ensure_postgres() {
  if ! ls /usr/lib/postgresql/*/bin/pg_ctl >/dev/null 2>&1; then
    echo "Installing PostgreSQL from Debian's packages…"
    apt_install postgresql
  fi
}

ensure_chromium() {
  if [ ! -x /usr/bin/chromium ]; then
    echo "Installing Chromium from Debian's packages (browser tests)…"
    apt_install chromium
  fi
  # The report test turns printed PDFs into page images and reads their text.
  if ! command -v pdftoppm >/dev/null 2>&1; then
    echo "Installing poppler-utils from Debian's packages (PDF pages of the report test)…"
    apt_install poppler-utils
  fi
}
