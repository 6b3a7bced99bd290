# Where a checkout keeps its PostgreSQL data folder. Sourced by scripts/lib.sh; run it directly to
# print the choice for a checkout path:  bash scripts/data-dir.sh /path/to/checkout [--create]
#
# 1. BW_DATA_DIR, when set.
# 2. <checkout>/.data, when the database user can reach it: always when we are not root (the
#    server then runs as us), and as root when the postgres user can enter the checkout.
# 3. Otherwise (a checkout under a mode-700 folder such as /root, or a fresh `mktemp -d`) a folder
#    of its own under /var/lib/benchwright (or /var/tmp/benchwright), named after the checkout and
#    a hash of its full path, so two clones never share one and the same clone finds it again.

# can_enter USER PATH: true when USER may enter PATH (every folder on the way must be searchable).
can_enter() {
  if [ "$(id -u)" != 0 ]; then [ -x "$2" ]; return; fi
  id -u "$1" >/dev/null 2>&1 && runuser -u "$1" -- test -x "$2" 2>/dev/null
}

# choose_data_dir CHECKOUT [DB_USER]: prints the data folder for that checkout (creates nothing but
# the shared /var/lib/benchwright parent when option 3 applies).
choose_data_dir() {
  local root="$1" user="${2:-${BW_PG_USER:-postgres}}" key base
  if [ -n "${BW_DATA_DIR:-}" ]; then echo "$BW_DATA_DIR"; return; fi
  if [ "$(id -u)" != 0 ] || can_enter "$user" "$root"; then echo "$root/.data"; return; fi
  key="$(printf "%s" "${root##*/}" | tr -c 'A-Za-z0-9._-' '_' | cut -c1-40)-$(printf '%s' "$root" | sha1sum | cut -c1-12)"
  for base in /var/lib/benchwright /var/tmp/benchwright; do
    if mkdir -p "$base" 2>/dev/null && chmod 755 "$base" 2>/dev/null && can_enter "$user" "$base"; then
      echo "$base/$key"
      return
    fi
  done
  return 1
}

# make_data_dir DIR CHECKOUT [DB_USER]: creates DIR for the database user and notes whose it is.
make_data_dir() {
  local dir="$1" root="$2" user="${3:-${BW_PG_USER:-postgres}}"
  mkdir -p "$dir"
  [ -f "$dir/checkout" ] || printf '%s\n' "$root" >"$dir/checkout"
  if [ "$(id -u)" = 0 ] && id -u "$user" >/dev/null 2>&1; then chown "$user:" "$dir"; fi
}

if [ "${BASH_SOURCE[0]}" = "$0" ]; then
  set -euo pipefail
  dir="$(choose_data_dir "$1")" || { echo "no folder the database user can reach" >&2; exit 1; }
  if [ "${2:-}" = --create ]; then make_data_dir "$dir" "$1"; fi
  echo "$dir"
fi
