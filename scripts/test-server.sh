#!/usr/bin/env bash
# A throwaway PostgreSQL server on loopback for the tests (never a clinic's server).
#   scripts/test-server.sh start <folder>   makes a new cluster in <folder>, starts it on a free port of 127.0.0.1 and
#                                           writes the administrator's connection string to <folder>/connection
#   scripts/test-server.sh stop <folder>    stops it and deletes <folder>
# The cluster runs as the current user, or as the 'postgres' system user when the current user is root (PostgreSQL
# refuses to run as root). It listens on 127.0.0.1 only and asks for a password (scram-sha-256), as a clinic's server
# would. If it cannot start, the script says why and exits non-zero: the tests never fall back to SQLite silently.
set -euo pipefail
action=${1:?usage: test-server.sh start|stop <folder>}
folder=${2:?usage: test-server.sh start|stop <folder>}

bindir=$(ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V | tail -n 1 || true)
[ -n "$bindir" ] && [ -x "$bindir/initdb" ] || {
  echo "test-server.sh: no PostgreSQL server binaries under /usr/lib/postgresql (scripts/bootstrap.sh installs Debian's postgresql)" >&2
  exit 1
}

as_owner=()
owner=$(id -un)
if [ "$(id -u)" -eq 0 ]; then
  owner=postgres
  as_owner=(runuser -u postgres --)
fi

case "$action" in
  start)
    mkdir -p "$folder"
    [ -z "$(ls -A "$folder")" ] || { echo "test-server.sh: $folder is not empty" >&2; exit 1; }
    [ ${#as_owner[@]} -eq 0 ] || chown "$owner" "$folder"
    password=$(head -c 24 /dev/urandom | od -An -tx1 | tr -d ' \n')
    printf '%s\n' "$password" > "$folder/pwfile"
    chmod 600 "$folder/pwfile"
    [ ${#as_owner[@]} -eq 0 ] || chown "$owner" "$folder/pwfile"
    "${as_owner[@]}" "$bindir/initdb" -D "$folder/cluster" -U "$owner" --auth=scram-sha-256 --pwfile="$folder/pwfile" \
      --encoding=UTF8 --locale=C.UTF-8 >"$folder/initdb.log" 2>&1 || {
      echo "test-server.sh: initdb failed:" >&2; cat "$folder/initdb.log" >&2; exit 1; }
    rm -f "$folder/pwfile"
    for attempt in 1 2 3 4 5 6 7 8; do
      port=$((20000 + RANDOM % 30000))
      if (exec 3<>"/dev/tcp/127.0.0.1/$port") 2>/dev/null; then continue; fi
      # Small buffers and few connections: the test hosts share a 2-core machine. The socket folder is the cluster's own.
      if "${as_owner[@]}" "$bindir/pg_ctl" -D "$folder/cluster" -l "$folder/server.log" -w -t 60 start \
        -o "-c listen_addresses=127.0.0.1 -p $port -k $folder/cluster -c max_connections=300 -c shared_buffers=64MB -c fsync=off -c synchronous_commit=off -c full_page_writes=off" >/dev/null; then
        printf 'Host=127.0.0.1;Port=%s;Username=%s;Password=%s;Database=postgres\n' "$port" "$owner" "$password" > "$folder/connection"
        echo "test-server.sh: PostgreSQL $("$bindir/postgres" --version | awk '{print $3}') on 127.0.0.1:$port ($folder)"
        exit 0
      fi
    done
    echo "test-server.sh: the server did not start; its log:" >&2
    cat "$folder/server.log" >&2 || true
    exit 1
    ;;
  stop)
    if [ -d "$folder/cluster" ]; then
      "${as_owner[@]}" "$bindir/pg_ctl" -D "$folder/cluster" -m immediate -w stop >/dev/null 2>&1 || true
    fi
    rm -rf "$folder"
    ;;
  *)
    echo "usage: test-server.sh start|stop <folder>" >&2
    exit 2
    ;;
esac
