#!/usr/bin/env bash
# Runrate's own PostgreSQL: Debian's server binaries, a cluster in a folder of the project, listening on
# 127.0.0.1 only, on a port of its own. Trust authentication is acceptable only because of that: loopback,
# a private folder, a port nobody else uses.
#
#   scripts/pg.sh start   install if missing, create the cluster if missing, start it, create the database
#   scripts/pg.sh stop    stop the cluster (the data stays)
#   scripts/pg.sh status
#
# Environment: PGDATA (default .data/pg), PGPORT (default 5544), PGDATABASE (default runrate).
set -euo pipefail

root=$(cd "$(dirname "$0")/.." && pwd)
PGDATA=${PGDATA:-$root/.data/pg}
PGPORT=${PGPORT:-5544}
PGDATABASE=${PGDATABASE:-runrate}
PGSOCK=${PGSOCK:-$PGDATA.sock}

log() { printf '[postgres] %s\n' "$*" >&2; }

find_bindir() {
	local dir
	dir=$(ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V | tail -n 1 || true)
	[ -n "$dir" ] && [ -x "$dir/initdb" ] && echo "$dir"
}

as_owner() {
	# initdb refuses to run as root: as root, run the server tools as Debian's postgres user.
	if [ "$(id -u)" = 0 ]; then su postgres -s /bin/sh -c "$*"; else sh -c "$*"; fi
}

install_if_missing() {
	[ -n "$(find_bindir)" ] && return 0
	log "PostgreSQL server binaries not found: installing Debian's postgresql package"
	if [ "$(id -u)" != 0 ]; then log "need root (or sudo) to apt-get install postgresql"; exit 1; fi
	export DEBIAN_FRONTEND=noninteractive
	apt-get update -qq
	apt-get install -y -qq postgresql >/dev/null
	# Debian's package starts its own cluster on 5432; Runrate never uses it.
	command -v pg_ctlcluster >/dev/null && pg_lsclusters -h 2>/dev/null | while read -r ver name _; do
		pg_ctlcluster "$ver" "$name" stop 2>/dev/null || true
	done
}

is_running() {
	local bin; bin=$(find_bindir)
	as_owner "'$bin/pg_ctl' -D '$PGDATA' status" >/dev/null 2>&1
}

start() {
	install_if_missing
	local bin; bin=$(find_bindir)
	if [ "$(id -u)" = 0 ]; then
		install -d -o postgres -g postgres -m 700 "$PGDATA"
		install -d -o postgres -g postgres -m 755 "$PGSOCK"
	else
		install -d -m 700 "$PGDATA"
		install -d -m 755 "$PGSOCK"
	fi
	if [ ! -f "$PGDATA/PG_VERSION" ]; then
		log "creating a cluster in $PGDATA"
		as_owner "'$bin/initdb' -D '$PGDATA' -U postgres --auth=trust --encoding=UTF8 --locale=C.UTF-8" >/dev/null
	fi
	if is_running; then
		log "already running on 127.0.0.1:$PGPORT"
	else
		as_owner "'$bin/pg_ctl' -D '$PGDATA' -l '$PGDATA/server.log' -w -t 60 -o \"-h 127.0.0.1 -p $PGPORT -k $PGSOCK\" start" >/dev/null
		log "started on 127.0.0.1:$PGPORT"
	fi
	if ! psql -h 127.0.0.1 -p "$PGPORT" -U postgres -d postgres -tAc "select 1 from pg_database where datname = '$PGDATABASE'" | grep -q 1; then
		psql -h 127.0.0.1 -p "$PGPORT" -U postgres -d postgres -qc "create database \"$PGDATABASE\"" >/dev/null
		log "created database $PGDATABASE"
	fi
}

stop() {
	local bin; bin=$(find_bindir)
	[ -n "$bin" ] || return 0
	if is_running; then
		as_owner "'$bin/pg_ctl' -D '$PGDATA' -m fast -w stop" >/dev/null
		log "stopped"
	fi
}

case "${1:-start}" in
start) start ;;
stop) stop ;;
status) if is_running; then echo running; else echo stopped; exit 3; fi ;;
*) echo "usage: $0 start|stop|status" >&2; exit 2 ;;
esac
