#!/usr/bin/env bash
# Runrate's own PostgreSQL: Debian's server binaries, a cluster of the project's own, listening on
# 127.0.0.1 only, on a port of its own. Trust authentication is acceptable only because of that: loopback,
# a private folder, a port nobody else uses.
#
#   scripts/pg.sh start   install if missing, create the cluster if missing, start it, create the database
#   scripts/pg.sh stop    stop the cluster (the data stays)
#   scripts/pg.sh drop    stop the cluster and remove its folders (throwaway clusters: npm test, npm run load)
#   scripts/pg.sh status
#   scripts/pg.sh where   print the cluster's folder
#
# Environment: PGDATA (default .data/pg), PGPORT (default 5544), PGDATABASE (default runrate).
#
# Where the cluster lives: run as root, the server runs as Debian's postgres user, which must be able to
# enter every folder above PGDATA. A clone in a private folder (mode 0700, as root's home is) is out of
# its reach, and loosening a person's home folder is not ours to do. Then the cluster lives in the
# postgres user's own home instead, one folder per checkout: ~postgres/runrate/<name>-<hash>/, where the
# hash is of the checkout path (or of PGDATA when it is given). Start says so.
set -euo pipefail

root=$(cd "$(dirname "$0")/.." && pwd)
PGPORT=${PGPORT:-5544}
PGDATABASE=${PGDATABASE:-runrate}

log() { printf '[postgres] %s\n' "$*" >&2; }

find_bindir() {
	local dir
	dir=$(ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V | tail -n 1 || true)
	[ -n "$dir" ] && [ -x "$dir/initdb" ] && echo "$dir"
}

as_owner() {
	# initdb refuses to run as root: as root, run the server tools as Debian's postgres user, from a
	# folder it can enter (the caller's folder may be private to root).
	if [ "$(id -u)" = 0 ]; then su postgres -s /bin/sh -c "cd / && $*"; else sh -c "$*"; fi
}

# True when the server's user can enter the nearest existing folder at or above $1 (a missing folder is
# created by root below it with mode 0755, which the server's user can enter).
server_can_reach() {
	local dir=$1
	[ "$(id -u)" = 0 ] || return 0
	while [ ! -e "$dir" ]; do dir=$(dirname "$dir"); done
	su postgres -s /bin/sh -c "cd '$dir'" >/dev/null 2>&1
}

# Sets PGDATA, PGSOCK and RELOCATED (the folder kept in ~postgres, or empty) from the environment.
resolve_cluster() {
	local wanted=${PGDATA:-$root/.data/pg} named=$root key home
	case $wanted in /*) ;; *) wanted=$PWD/$wanted ;; esac
	[ -n "${PGDATA:-}" ] && named=$wanted
	RELOCATED=
	WANTED=$wanted
	if server_can_reach "$wanted"; then
		PGDATA=$wanted
	else
		home=$(getent passwd postgres | cut -d: -f6)
		# One folder per checkout: the hash of the checkout path, or of PGDATA when it was chosen.
		key=$(printf '%s' "$named" | sha256sum | cut -c1-12)
		RELOCATED=$home/runrate/$(basename "$root")-$key
		PGDATA=$RELOCATED/pg
	fi
	PGSOCK=${PGSOCK:-$PGDATA.sock}
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
	local bin; bin=$(find_bindir) || return 1
	as_owner "'$bin/pg_ctl' -D '$PGDATA' status" >/dev/null 2>&1
}

make_folders() {
	if [ "$(id -u)" = 0 ]; then
		if [ -n "$RELOCATED" ]; then
			install -d -o postgres -g postgres -m 755 "$(dirname "$RELOCATED")" "$RELOCATED"
			# Whose cluster this is, for whoever finds the folder later.
			printf 'checkout %s\ncluster wanted at %s\n' "$root" "$WANTED" >"$RELOCATED/CHECKOUT"
			chown postgres:postgres "$RELOCATED/CHECKOUT"
		fi
		install -d -o postgres -g postgres -m 700 "$PGDATA"
		install -d -o postgres -g postgres -m 755 "$PGSOCK"
	else
		install -d -m 700 "$PGDATA"
		install -d -m 755 "$PGSOCK"
	fi
}

start() {
	install_if_missing
	resolve_cluster
	local bin; bin=$(find_bindir)
	if [ -n "$RELOCATED" ]; then
		log "the postgres user cannot enter $WANTED (it is inside a private folder);"
		log "keeping this checkout's cluster in $PGDATA instead (no folder's permissions were changed)"
	fi
	make_folders
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
	resolve_cluster
	local bin; bin=$(find_bindir) || return 0
	if is_running; then
		as_owner "'$bin/pg_ctl' -D '$PGDATA' -m fast -w stop" >/dev/null
		log "stopped"
	fi
}

drop() {
	stop
	rm -rf -- "$PGDATA" "$PGSOCK"
	if [ -n "$RELOCATED" ]; then
		rm -rf -- "$RELOCATED"
		rmdir --ignore-fail-on-non-empty "$(dirname "$RELOCATED")"
	fi
	log "removed $PGDATA"
}

case "${1:-start}" in
start) start ;;
stop) stop ;;
drop) drop ;;
status) resolve_cluster; if is_running; then echo running; else echo stopped; exit 3; fi ;;
where) resolve_cluster; echo "$PGDATA" ;;
*) echo "usage: $0 start|stop|drop|status|where" >&2; exit 2 ;;
esac
