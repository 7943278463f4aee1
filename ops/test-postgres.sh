#!/usr/bin/env bash
# The whole test suite, the crash test and the two-instance test on PostgreSQL, on fresh databases created here and dropped afterwards.
# Needs a PostgreSQL server that lets the superuser in without a password (trust), by default postgres at
# 127.0.0.1:5432 (PGHOST, PGPORT, PGUSER change it). Without one it says the PostgreSQL run was skipped and exits 0,
# so a machine without PostgreSQL still passes on H2 alone.
# It leaves target/quarkus-app built for PostgreSQL: run `mvn -B -DskipTests package` again for the H2 jar.
set -euo pipefail
cd "$(dirname "$0")/.."
host=${PGHOST:-127.0.0.1}
port=${PGPORT:-5432}
user=${PGUSER:-postgres}
psql_admin() { psql -h "$host" -p "$port" -U "$user" -d postgres -v ON_ERROR_STOP=1 -Atq "$@"; }

if ! command -v psql >/dev/null 2>&1 || ! psql_admin -c 'select 1' >/dev/null 2>&1; then
    echo "=== PostgreSQL run SKIPPED: no PostgreSQL server lets '$user' in at $host:$port (only the H2 run counted) ==="
    exit 0
fi

suffix=$(date -u +%Y%m%d%H%M%S)_$$
suite_db=depotcast_test_$suffix
empty_db=depotcast_empty_$suffix
crash_db=depotcast_crash_$suffix
cluster_db=depotcast_cluster_$suffix
drop_all() {
    for db in "$suite_db" "$empty_db" "$crash_db" "$cluster_db"; do
        psql_admin -c "drop database if exists $db with (force)" || true
    done
}
trap drop_all EXIT
for db in "$suite_db" "$empty_db" "$crash_db" "$cluster_db"; do
    psql_admin -c "create database $db"
done
echo "=== PostgreSQL run on $host:$port: $(psql_admin -c 'show server_version'), databases *_$suffix ==="

base="jdbc:postgresql://$host:$port"
DEPOTCAST_TEST_JDBC_URL="$base/$suite_db" DEPOTCAST_TEST_DB_USER="$user" \
DEPOTCAST_TEST_EMPTY_JDBC_URL="$base/$empty_db" DEPOTCAST_CRASH_JDBC_URL="$base/$crash_db" DEPOTCAST_CRASH_DB_USER="$user" \
DEPOTCAST_CLUSTER_JDBC_URL="$base/$cluster_db" DEPOTCAST_CLUSTER_DB_USER="$user" \
    mvn -B verify -Ppostgres
echo "=== PostgreSQL run passed ==="
